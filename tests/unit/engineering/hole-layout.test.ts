import { describe, expect, it } from "vitest";
import { ALL_DRILLS, INCH_DRILLS } from "@/lib/engineering/drills";
import { solveHoleLayout } from "@/lib/engineering/hole-layout";
import { restrictionDrillLimits } from "@/lib/engineering/restriction-limits";
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
    const [best] = solveHoleLayout({ targetEffectiveAreaM2: 4.08634e-6, drills: [D43, D52, D60, D1_16, D1_8], maxHoles: 4 }).candidates;
    // Hand: 2 x #52 = 4.08634e-6 m² (above); the nearest others: 1 x #43 = 4.01363e-6 (-1.8 %), 2 x 1/16 = 3.95865e-6 (-3.1 %).
    expect(best?.count).toBe(2);
    expect(best?.drill.label).toBe("#52");
    expect(Math.abs(best?.errorPct ?? 1)).toBeLessThan(0.01);
  });

  it("reports the signed error", () => {
    const [best] = solveHoleLayout({ targetEffectiveAreaM2: 2e-6, drills: [D1_16], maxHoles: 1 }).candidates;
    // Hand: 1.97933e-6 - 2e-6 = -2.0674e-8 m², -2.0674e-8 / 2e-6 x 100 = -1.0337 %.
    expect(best?.errorM2).toBeCloseTo(-2.0674e-8, 11);
    expect(best?.errorPct).toBeCloseTo(-1.0337, 3);
  });

  it("ranks fewer holes first when the error is the same", () => {
    // Hand: 1/8 is exactly twice 1/16, so 4 x (1/16)² = 4/256 = 1/64 = (1/8)²: one 1/8 hole and four 1/16
    // holes have the same area, and both meet a 1/8-hole target.
    const ranked = solveHoleLayout({ targetEffectiveAreaM2: AREA_1_8, drills: [D1_16, D1_8], maxHoles: 4 }).candidates;
    expect(ranked.slice(0, 2).map((c) => `${c.count}x${c.drill.label}`)).toEqual(["1x1/8", "4x1/16"]);
    expect(ranked[0]?.errorM2).toBe(ranked[1]?.errorM2);
  });

  it("orders drills of the same diameter by label", () => {
    // ASME B94.11M: letter E and 1/4 in are both 0.2500 in.
    // A shop that allows drills up to 1/4 in.
    const limits = { system: "inch", smallestDrillM: 0.028 * M_PER_IN, largestDrillM: 0.25 * M_PER_IN } as const;
    const ranked = solveHoleLayout({ targetEffectiveAreaM2: 3e-5, drills: [LETTER_E, D1_4], maxHoles: 1, limits }).candidates;
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
    }).candidates;
    expect(ranked.map((c) => [c.count, c.fits])).toEqual([
      [2, true],
      [1, true],
      [3, false],
      [4, false],
    ]);
  });

  it("flags a layout the valve window limits and combines the two in series", () => {
    const window = 7.9e-6;
    const ranked = solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [D1_16, D1_8], maxHoles: 1, valveWindowAreaM2: window }).candidates;
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
    const all = solveHoleLayout({ targetEffectiveAreaM2: 3e-6, drills, maxHoles: 3 }).candidates;
    expect(all).toHaveLength(15);
    expect(solveHoleLayout({ targetEffectiveAreaM2: 3e-6, drills, maxHoles: 3, limit: 4 }).candidates).toEqual(all.slice(0, 4));
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
    expect(solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [], maxHoles: 2 }).candidates).toEqual([]);
    const crossed = { system: "inch", smallestDrillM: 0.125 * M_PER_IN, largestDrillM: 0.028 * M_PER_IN } as const;
    expect(() => solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [D52], maxHoles: 1, limits: crossed })).toThrow(/smallestDrillM/);
    expect(() => solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [D52], maxHoles: 1, minWebM: -0.001 })).toThrow(/minWebM/);
  });
});

// Areas below are worked in square inches (pi/4 = 0.785398) and converted with 1 in² = 6.4516e-4 m² (NIST SP 811).
const M2_PER_IN2 = M_PER_IN * M_PER_IN;
/** Hand values carry six significant figures. */
function expectNear(actual: number | undefined, expected: number) {
  expect(Math.abs((actual ?? Number.NaN) / expected - 1)).toBeLessThan(1e-5);
}

describe("solveHoleLayout within the shop's limits", () => {
  it("never offers a drill under #70 and says a tiny target is out of reach", () => {
    const result = solveHoleLayout({ targetEffectiveAreaM2: 1e-4 * M2_PER_IN2, drills: ALL_DRILLS, maxHoles: 4 });
    // ASME B94.11M: #70 = 0.0280 in, the default smallest drill (common practice, no published source).
    // Hand: one #70 hole = 0.785398 x 0.028² = 0.785398 x 0.000784 = 6.15752e-4 in², 6.158 times the target:
    // +515.75 %, far beyond the 10 % a layout at the limit may miss by.
    expect(result.candidates.every((c) => c.drill.diameterM >= 0.028 * M_PER_IN - 1e-12)).toBe(true);
    expect(`${result.candidates[0]?.count}x${result.candidates[0]?.drill.label}`).toBe("1x#70");
    expect(result.candidates[0]?.errorPct).toBeCloseTo(515.75, 1);
    expect(result.limitedBy).toBe("smallest-drill");
    expect(result.unattainable).toBe(true);
    expect(result.message).toContain("#70");
    expectNear(result.reach?.smallestM2, 6.15752e-4 * M2_PER_IN2);
  });

  it("meets a target just under one #70 hole with that hole, noting the limit", () => {
    // Hand: 6.15752e-4 in² against 5.9e-4 in²: +0.25752e-4 / 5.9e-4 = +4.36 %, within 10 %.
    const result = solveHoleLayout({ targetEffectiveAreaM2: 5.9e-4 * M2_PER_IN2, drills: INCH_DRILLS, maxHoles: 4 });
    expect(result.candidates[0]?.drill.label).toBe("#70");
    expect(result.candidates[0]?.errorPct).toBeCloseTo(4.36, 2);
    expect(result.limitedBy).toBe("smallest-drill");
    expect(result.unattainable).toBe(false);
  });

  it("never offers a drill over 1/8 and says 1 in² is out of reach", () => {
    const result = solveHoleLayout({ targetEffectiveAreaM2: 1 * M2_PER_IN2, drills: ALL_DRILLS, maxHoles: 4 });
    // ASME B94.11M: 1/8 = 0.1250 in. Hand: four holes = 4 x 0.785398 x 0.015625 = 0.0490874 in², 4.9 % of 1 in².
    expect(result.candidates.every((c) => c.drill.diameterM <= 0.125 * M_PER_IN + 1e-12)).toBe(true);
    expect(`${result.candidates[0]?.count}x${result.candidates[0]?.drill.label}`).toBe("4x1/8");
    expectNear(result.reach?.largestM2, 0.0490874 * M2_PER_IN2);
    expect(result.limitedBy).toBe("largest-layout");
    expect(result.unattainable).toBe(true);
    expect(result.message).toContain("4 holes of 1/8");
  });

  it("marks a target above the valve window unattainable, not just valve-limited", () => {
    const window = 0.02 * M2_PER_IN2;
    const above = solveHoleLayout({ targetEffectiveAreaM2: 0.021 * M2_PER_IN2, drills: INCH_DRILLS, maxHoles: 4, valveWindowAreaM2: window });
    expect(above.limitedBy).toBe("valve-window");
    expect(above.unattainable).toBe(true);
    // Four 1/8 holes (0.0490874 in²) in series with a 0.02 in² window, 1/A² = 1/A_h² + 1/A_w²:
    // 1/0.0490874² = 415.01, 1/0.02² = 2500, sum 2915.01, sqrt 53.991, A = 0.0185217 in². A target of 0.019 in²
    // is beyond it by (0.019 - 0.0185217) / 0.019 = 2.5 %, still under the window: the largest layout meets it.
    const below = solveHoleLayout({ targetEffectiveAreaM2: 0.019 * M2_PER_IN2, drills: INCH_DRILLS, maxHoles: 4, valveWindowAreaM2: window });
    expectNear(below.reach?.largestM2, 0.0185217 * M2_PER_IN2);
    expect(below.limitedBy).toBe("largest-layout");
    expect(below.unattainable).toBe(false);
  });

  it("says nothing limits a target within reach", () => {
    // Hand: 2 x #52 = 4.08634e-6 m² (see above), between one #70 hole and four 1/8 holes.
    const result = solveHoleLayout({ targetEffectiveAreaM2: 4.08634e-6, drills: INCH_DRILLS, maxHoles: 4 });
    expect(result.limitedBy).toBeNull();
    expect(result.unattainable).toBe(false);
    expect(result.message).toBeNull();
  });

  it("keeps to the plan's drill system", () => {
    // Target: one 2.50 mm hole = 0.785398 x 2.5² = 4.90874 mm². On an inch plan the nearest is one #40
    // (ASME B94.11M: 0.0980 in = 2.4892 mm; 0.785398 x 0.098² = 7.54296e-3 in² = 4.86642 mm², -0.86 %).
    const target = 4.90874e-6;
    const inch = solveHoleLayout({ targetEffectiveAreaM2: target, drills: ALL_DRILLS, maxHoles: 4 });
    expect(inch.candidates.some((c) => c.drill.system === "metric")).toBe(false);
    expect(inch.candidates[0]?.drill.label).toBe("#40");
    const metricLimits = { system: "metric", smallestDrillM: 0.028 * M_PER_IN, largestDrillM: 0.125 * M_PER_IN } as const;
    const metric = solveHoleLayout({ targetEffectiveAreaM2: target, drills: ALL_DRILLS, maxHoles: 4, limits: metricLimits });
    expect(metric.candidates.every((c) => c.drill.system === "metric")).toBe(true);
    expect(metric.candidates[0]?.drill.label).toBe("2.50 mm");
    const mixed = solveHoleLayout({ targetEffectiveAreaM2: target, drills: ALL_DRILLS, maxHoles: 4, limits: { ...metricLimits, system: "mixed" } });
    expect(mixed.candidates[0]?.drill.label).toBe("2.50 mm");
    // Letter drills start at A = 0.2340 in (ASME B94.11M), above 1/8: number, fraction and metric remain.
    expect([...new Set(mixed.candidates.map((c) => c.drill.system))].sort()).toEqual(["fraction", "metric", "number"]);
  });

  it("keeps 0.020 in of web between holes unless told otherwise", () => {
    // Channel 0.260 in, two 1/8 holes: 2 x 0.125 + 0.020 = 0.270 in does not fit; touching, 0.250 in would.
    const input = { targetEffectiveAreaM2: 2 * AREA_1_8, drills: [D1_8], maxHoles: 2, channelLengthM: 0.26 * M_PER_IN };
    expect(solveHoleLayout(input).candidates.find((c) => c.count === 2)?.fits).toBe(false);
    expect(solveHoleLayout({ ...input, minWebM: 0 }).candidates.find((c) => c.count === 2)?.fits).toBe(true);
  });

  it("says when no drill in the list is allowed", () => {
    // ASME B94.11M: #80 = 0.0135 in and 1/4 = 0.2500 in, both outside #70 to 1/8.
    const result = solveHoleLayout({ targetEffectiveAreaM2: 1e-6, drills: [asmeDrill("#80", 0.0135), D1_4], maxHoles: 4 });
    expect(result).toMatchObject({ candidates: [], reach: null, limitedBy: "no-drill", unattainable: true });
  });

  it("uses the shop's own smallest and largest drill", () => {
    // ASME B94.11M: #60 = 0.0400 in, 3/32 = 0.09375 in.
    const limits = restrictionDrillLimits({ smallestDrillLabel: "#60", largestDrillLabel: "3/32" });
    const result = solveHoleLayout({ targetEffectiveAreaM2: 1e-7, drills: ALL_DRILLS, maxHoles: 4, limits });
    const inches = result.candidates.map((c) => c.drill.diameterM / M_PER_IN);
    expect(Math.min(...inches)).toBeCloseTo(0.04, 9);
    expect(Math.max(...inches)).toBeCloseTo(0.09375, 9);
    expect(result.reach?.smallestDrill.label).toBe("#60");
    expect(result.reach?.largestDrill.label).toBe("3/32");
  });
});
