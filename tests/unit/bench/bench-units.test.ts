// The phone's preview arithmetic on the bench page, against published factors and hand arithmetic.
import { describe, expect, it } from "vitest";
import {
  formatArea,
  formatTolerance,
  fromBenchSI,
  holesArea,
  parseReading,
  toBenchSI,
  withinPlan,
} from "@/app/bench/[blockId]/bench-units";
import { M_PER_IN, PA_PER_PSI } from "../engineering/nist-factors";

describe("bench units", () => {
  it("converts gauge readings with the NIST SP 811 factors", () => {
    expect(toBenchSI(1, "in")).toBe(M_PER_IN);
    expect(toBenchSI(2.5, "mm")).toBeCloseTo(0.0025, 15);
    // NIST SP 811 lists the psi to seven digits: 6.894 757 E+03 Pa.
    expect(toBenchSI(1, "psi")).toBeCloseTo(PA_PER_PSI, 3);
    expect(toBenchSI(1, "bar")).toBe(100_000); // 1 bar = 100 kPa by definition (NIST SP 811, B.8)
    expect(toBenchSI(3.5, "kPa")).toBe(3500);
    expect(fromBenchSI(toBenchSI(0.089, "in"), "in")).toBeCloseTo(0.089, 12);
  });

  it("shows a tolerance in the chosen unit, to the decimals the shop reads", () => {
    // 0.0880 in and 0.0900 in by hand: x 0.0254 m/in.
    expect(formatTolerance(0.088 * 0.0254, 0.09 * 0.0254, "in")).toBe("0.0880–0.0900 in");
    expect(formatTolerance(0.088 * 0.0254, 0.09 * 0.0254, "mm")).toBe("2.235–2.286 mm");
    expect(formatTolerance(2.5 * 6894.757, 3.5 * 6894.757, "psi")).toBe("2.50–3.50 psi");
  });

  it("reads what a phone keyboard types, decimal comma included, and nothing for an empty box", () => {
    expect(parseReading("0.0890")).toBe(0.089);
    expect(parseReading(" 0,0890 ")).toBe(0.089);
    expect(parseReading(".089")).toBe(0.089);
    expect(parseReading("")).toBeUndefined();
    expect(parseReading("   ")).toBeUndefined();
    expect(parseReading("abc")).toBeUndefined();
  });

  it("passes a reading on the tolerance's edge and fails one beyond it", () => {
    expect(withinPlan(0.09 * 0.0254, 0.088 * 0.0254, 0.09 * 0.0254)).toBe(true);
    expect(withinPlan(0.0901 * 0.0254, 0.088 * 0.0254, 0.09 * 0.0254)).toBe(false);
    expect(withinPlan(0.0879 * 0.0254, 0.088 * 0.0254, 0.09 * 0.0254)).toBe(false);
  });

  it("adds hole areas as pi/4 d^2", () => {
    // Two 0.089 in holes: 2 x 0.785398 x 0.007921 = 0.0124419 in² (hand arithmetic).
    const area = holesArea([0.089 * 0.0254, 0.089 * 0.0254]);
    expect(area / (0.0254 * 0.0254)).toBeCloseTo(0.0124419, 6);
    expect(formatArea(area, "in")).toBe("0.01244 in²");
    // The same in mm²: 0.0124419 x 645.16 = 8.027 mm².
    expect(formatArea(area, "mm")).toBe("8.027 mm²");
    expect(holesArea([])).toBe(0);
  });
});
