// The shared unit factors against NIST SP 811 (2008), appendix B.8, as written in nist-factors.ts.
import { describe, expect, it } from "vitest";
import {
  KG_PER_LB,
  M2_PER_IN2,
  M3_PER_IN3,
  M_PER_FT,
  M_PER_IN,
  PA_PER_BAR,
  PA_PER_INHG,
  PA_PER_PSI,
  STANDARD_ATMOSPHERE_PA,
  W_PER_HP,
} from "@/lib/engineering/unit-factors";
import * as nist from "./nist-factors";

describe("unit factors", () => {
  it("match NIST SP 811, B.8", () => {
    expect(M_PER_IN).toBe(nist.M_PER_IN);
    expect(M_PER_FT).toBe(0.3048); // NIST SP 811, B.8: foot = 3.048 E-01 m exactly
    expect(KG_PER_LB).toBe(nist.KG_PER_LB);
    // SP 811 prints the psi to seven figures, 6.894 757 E+03 Pa; ours carries the exact pound-force further.
    expect(PA_PER_PSI).toBeCloseTo(nist.PA_PER_PSI, 3);
    expect(PA_PER_INHG).toBe(nist.PA_PER_INHG);
    expect(PA_PER_BAR).toBe(100_000); // NIST SP 811, B.8: bar = 1.0 E+05 Pa
    expect(STANDARD_ATMOSPHERE_PA).toBe(nist.PA_STANDARD_ATMOSPHERE);
    expect(W_PER_HP).toBeCloseTo(nist.W_PER_HP, 4);
  });

  it("square and cube the inch by hand", () => {
    // 0.0254² = 0.000 645 16 m²; 0.0254³ = 0.000 016 387 064 m³ (NIST SP 811: 1 in³ = 16.387 064 cm³).
    expect(M2_PER_IN2).toBeCloseTo(0.00064516, 15);
    expect(M3_PER_IN3).toBeCloseTo(0.000016387064, 17);
  });

  it("keeps psi per bar where the handbooks put it", () => {
    // NIST SP 811, B.8: 1 bar = 1 E+05 Pa / 6.894 757 E+03 Pa = 14.503 77 psi.
    expect(PA_PER_BAR / PA_PER_PSI).toBeCloseTo(14.50377, 5);
  });
});
