import { describe, expect, it } from "vitest";
import {
  CD_SHARP_EDGED_ORIFICE,
  CD_SHORT_DRILLED_HOLE,
  areaFromMassFlow,
  circleArea,
  diameterForArea,
  effectiveRestrictionArea,
  massFlowFromArea,
  parallelArea,
  seriesArea,
} from "@/lib/engineering/orifice";
import { M_PER_IN } from "./nist-factors";

/** Relative closeness: |actual - expected| <= rel * |expected|. */
function expectNear(actual: number, expected: number, rel = 1e-6) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe("circleArea / diameterForArea", () => {
  it("gives the area of a 1/8 in hole", () => {
    // Hand: d = 0.125 in x 0.0254 = 0.003175 m; d² = 1.0080625e-5 m²; x pi/4 (0.785398163) = 7.91730436e-6 m².
    // Same in inches: 0.125² x 0.785398 = 0.0122718 in², x 6.4516e-4 m²/in² = 7.91730e-6 m².
    expectNear(circleArea(0.125 * M_PER_IN), 7.91730436e-6);
  });

  it("returns the diameter of a given area", () => {
    // Hand: the 1/8 in hole above, backwards.
    expectNear(diameterForArea(7.91730436e-6), 0.003175);
    // Hand: A = 1 mm² = 1e-6 m² -> d = sqrt(4e-6 / pi) = sqrt(1.2732395e-6) = 1.1283792e-3 m.
    expectNear(diameterForArea(1e-6), 1.1283792e-3);
  });

  it("refuses negative or non-numeric sizes", () => {
    expect(() => circleArea(-1)).toThrow(RangeError);
    expect(() => circleArea(Number.NaN)).toThrow(RangeError);
    expect(() => diameterForArea(-1e-6)).toThrow(RangeError);
  });
});

describe("areaFromMassFlow / massFlowFromArea", () => {
  it("sizes an orifice for a fuel flow", () => {
    // Hand: m = 0.01 kg/s, Cd = 0.61, rho = 740 kg/m³, dP = 10 000 Pa.
    // 2 x 740 x 10 000 = 14 800 000; sqrt = 3847.0768; x 0.61 = 2346.7168; A = 0.01 / 2346.7168 = 4.261275e-6 m².
    expectNear(areaFromMassFlow({ massFlowKgS: 0.01, cd: 0.61, densityKgM3: 740, deltaPPa: 10_000 }), 4.261275e-6, 1e-6);
  });

  it("gives the flow through an orifice", () => {
    // Hand: A = 1e-6 m², Cd = 0.8, rho = 1000 kg/m³, dP = 2000 Pa.
    // 2 x 1000 x 2000 = 4 000 000; sqrt = 2000; m = 0.8 x 1e-6 x 2000 = 1.6e-3 kg/s.
    expectNear(massFlowFromArea({ areaM2: 1e-6, cd: 0.8, densityKgM3: 1000, deltaPPa: 2000 }), 1.6e-3, 1e-12);
  });

  it("refuses a Cd above 1 and a zero signal", () => {
    expect(() => areaFromMassFlow({ massFlowKgS: 0.01, cd: 1.2, densityKgM3: 740, deltaPPa: 1000 })).toThrow(RangeError);
    expect(() => areaFromMassFlow({ massFlowKgS: 0.01, cd: 0.6, densityKgM3: 740, deltaPPa: 0 })).toThrow(RangeError);
  });
});

describe("parallel and series areas", () => {
  it("adds areas side by side", () => {
    // Hand: 1e-6 + 2e-6 + 0.5e-6 = 3.5e-6 m².
    expectNear(parallelArea([1e-6, 2e-6, 0.5e-6]), 3.5e-6, 1e-12);
    expect(parallelArea([])).toBe(0);
  });

  it("combines equal areas in series as A / sqrt(2)", () => {
    // Hand: 1/A_eq² = 2/A², A_eq = A / 1.41421356 = 0.70710678 A.
    expectNear(seriesArea([2e-6, 2e-6]), 1.41421356e-6);
  });

  it("combines unequal areas in series", () => {
    // Hand: 1/(1e-6)² + 1/(2e-6)² = 1e12 + 0.25e12 = 1.25e12; A_eq = 1 / sqrt(1.25e12) = 8.94427191e-7 m².
    expectNear(seriesArea([1e-6, 2e-6]), 8.94427191e-7);
  });

  it("treats a closed member as closing the line, and refuses an empty list", () => {
    expect(seriesArea([1e-6, 0])).toBe(0);
    expect(() => seriesArea([])).toThrow(RangeError);
  });
});

describe("effectiveRestrictionArea", () => {
  it("is the holes alone without a valve window", () => {
    expect(effectiveRestrictionArea({ holesAreaM2: 3e-6 })).toEqual({ effectiveAreaM2: 3e-6, valveLimited: false });
  });

  it("is valve-limited once the holes reach the window", () => {
    // Hand: holes = window = 4e-6 -> 4e-6 / sqrt(2) = 2.82842712e-6 m².
    const r = effectiveRestrictionArea({ holesAreaM2: 4e-6, valveWindowAreaM2: 4e-6 });
    expectNear(r.effectiveAreaM2, 2.82842712e-6);
    expect(r.valveLimited).toBe(true);
  });

  it("is hole-limited while the holes are smaller than the window", () => {
    // Hand: holes 2e-6, window 4e-6: 2e-6 x 4e-6 / sqrt(4e-12 + 16e-12) = 8e-12 / 4.47213595e-6 = 1.78885438e-6 m².
    const r = effectiveRestrictionArea({ holesAreaM2: 2e-6, valveWindowAreaM2: 4e-6 });
    expectNear(r.effectiveAreaM2, 1.78885438e-6);
    expect(r.valveLimited).toBe(false);
  });
});

describe("default discharge coefficients", () => {
  it("uses the textbook sharp-edged orifice figure", () => {
    // White, Fluid Mechanics; Munson, Fundamentals of Fluid Mechanics: about 0.61 at high Reynolds number.
    expect(CD_SHARP_EDGED_ORIFICE).toBeCloseTo(0.61, 2);
  });

  it("rates a short drilled hole above a sharp-edged orifice", () => {
    // From memory of short-tube figures in fluid mechanics texts: about 0.8 for l/d of 1 to 3.
    expect(CD_SHORT_DRILLED_HOLE).toBeGreaterThan(CD_SHARP_EDGED_ORIFICE);
    expect(CD_SHORT_DRILLED_HOLE).toBeCloseTo(0.8, 1);
  });
});
