import { describe, expect, it } from "vitest";
import { solveHoleLayout } from "@/lib/engineering/hole-layout";
import { asmeDrill, M_PER_IN } from "./nist-factors";

// Drill diameters in decimal inches as listed in ASME B94.11M.
const D43 = asmeDrill("#43", 0.089);
const D52 = asmeDrill("#52", 0.0635);
const D60 = asmeDrill("#60", 0.04);
const D1_16 = asmeDrill("1/16", 0.0625, "fraction");
const D1_8 = asmeDrill("1/8", 0.125, "fraction");
const D1_4 = asmeDrill("1/4", 0.25, "fraction");
const LETTER_E = asmeDrill("E", 0.25, "letter");

// Hand: hole areas, pi/4 = 0.785398163.
// #52: d = 0.0635 in = 0.0016129 m, d² = 2.60144641e-6, area = 2.04317e-6 m²; two holes 4.08634e-6 m².
// 1/8: d = 0.003175 m, d² = 1.0080625e-5, area = 7.91730e-6 m².
// 1/16: d = 0.0015875 m, d² = 2.52015625e-6, area = 1.97933e-6 m².
const AREA_1_8 = 7.9173044e-6;

describe("solveHoleLayout", () => {
  it("finds the layout that meets the target", () => {
    const [best] = solveHoleLayout({ targetEffectiveAreaM2: 4.08634e-6, drills: [D43, D52, D60, D1_16, D1_8], maxHoles: 4 });
    // Hand: 2 x #52 = 4.08634e-6 m² (above); the nearest others: 1 x #43 = 4.01363e-6 (-1.8 %), 2 x 1/16 = 3.95865e-6 (-3.1 %).
    expect(best?.count).toBe(2);
    expect(best?.drill.label).toBe("#52");
    expect(Math.abs(best?.errorPct ?? 1)).toBeLessThan(0.01);
  });

  it("reports the signed error", () => {
    const [best] = solveHoleLayout({ targetEffectiveAreaM2: 2e-6, drills: [D1_16], maxHoles: 1 });
    // Hand: 1.97933e-6 - 2e-6 = -2.0674e-8 m², -2.0674e-8 / 2e-6 x 100 = -1.0337 %.
    expect(best?.errorM2).toBeCloseTo(-2.0674e-8, 11);
    expect(best?.errorPct).toBeCloseTo(-1.0337, 3);
  });

  it("ranks fewer holes first when the error is the same", () => {
    // Hand: 1/8 is exactly twice 1/16, so 4 x (1/16)² = 4/256 = 1/64 = (1/8)²: one 1/8 hole and four 1/16
    // holes have the same area, and both meet a 1/8-hole target.
    const ranked = solveHoleLayout({ targetEffectiveAreaM2: AREA_1_8, drills: [D1_16, D1_8], maxHoles: 4 });
    expect(ranked.slice(0, 2).map((c) => `${c.count}x${c.drill.label}`)).toEqual(["1x1/8", "4x1/16"]);
    expect(ranked[0]?.errorM2).toBe(ranked[1]?.errorM2);
  });

  it("orders drills of the same diameter by label", () => {
    // ASME B94.11M: letter E and 1/4 in are both 0.2500 in.
    const ranked = solveHoleLayout({ targetEffectiveAreaM2: 3e-5, drills: [LETTER_E, D1_4], maxHoles: 1 });
    expect(ranked.map((c) => c.drill.label)).toEqual(["1/4", "E"]);
  });

  it("puts layouts that fit the channel first", () => {
    // Channel 0.300 in, web 0.030 in, 1/8 drill. Hand: 1 hole 0.125 in fits; 2 holes 0.250 + 0.030 = 0.280 in fit;
    // 3 holes 0.375 + 0.060 = 0.435 in and 4 holes 0.500 + 0.090 = 0.590 in don't.
    // Target 3 x 1/8 = 2.37519e-5 m²: errors 1 hole 1.58346e-5, 2 holes 7.9173e-6, 3 holes 0, 4 holes 7.9173e-6.
    const ranked = solveHoleLayout({
      targetEffectiveAreaM2: 3 * AREA_1_8,
      drills: [D1_8],
      maxHoles: 4,
      channelLengthM: 0.3 * M_PER_IN,
      minWebM: 0.03 * M_PER_IN,
    });
    expect(ranked.map((c) => [c.count, c.fits])).toEqual([
      [2, true],
      [1, true],
      [3, false],
      [4, false],
    ]);
  });

  it("flags a layout the valve window limits and combines the two in series", () => {
    const window = 7.9e-6;
    const ranked = solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [D1_16, D1_8], maxHoles: 1, valveWindowAreaM2: window });
    const big = ranked.find((c) => c.drill.label === "1/8");
    const small = ranked.find((c) => c.drill.label === "1/16");
    // Hand: 1/8 hole 7.91730e-6 m² against a 7.9e-6 m² window: a² = 6.26837e-11, w² = 6.24100e-11,
    // sqrt(a² + w²) = 1.118459e-5, a w = 6.254667e-11, series = 5.59225e-6 m²; holes >= window: valve-limited.
    expect(big?.effectiveAreaM2).toBeCloseTo(5.59225e-6, 10);
    expect(big?.valveLimited).toBe(true);
    // Hand: 1/16 hole 1.97933e-6 m², a/w = 0.250548, series = a / sqrt(1 + 0.062774) = 1.97933e-6 / 1.030910 = 1.91998e-6 m².
    expect(small?.effectiveAreaM2).toBeCloseTo(1.91998e-6, 10);
    expect(small?.valveLimited).toBe(false);
  });

  it("returns every count x drill, or the first `limit` of the same ranking", () => {
    const drills = [D43, D52, D60, D1_16, D1_8];
    const all = solveHoleLayout({ targetEffectiveAreaM2: 3e-6, drills, maxHoles: 3 });
    expect(all).toHaveLength(15);
    expect(solveHoleLayout({ targetEffectiveAreaM2: 3e-6, drills, maxHoles: 3, limit: 4 })).toEqual(all.slice(0, 4));
  });

  it("does not depend on the order the drills are listed in", () => {
    const input = { targetEffectiveAreaM2: 3.3e-6, maxHoles: 4, channelLengthM: 0.2 * M_PER_IN, minWebM: 0.02 * M_PER_IN };
    const sorted = solveHoleLayout({ ...input, drills: [D60, D1_16, D52, D43, D1_8] });
    const shuffled = solveHoleLayout({ ...input, drills: [D43, D1_8, D60, D52, D1_16] });
    expect(shuffled).toEqual(sorted);
  });

  it("refuses a hole count outside 1 to 4 and a non-positive target", () => {
    expect(() => solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [D52], maxHoles: 5 })).toThrow(RangeError);
    expect(() => solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [D52], maxHoles: 0 })).toThrow(RangeError);
    expect(() => solveHoleLayout({ targetEffectiveAreaM2: 0, drills: [D52], maxHoles: 1 })).toThrow(RangeError);
    expect(solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [], maxHoles: 2 })).toEqual([]);
  });
});
