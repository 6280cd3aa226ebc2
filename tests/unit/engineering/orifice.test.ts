import { describe, expect, it } from "vitest";
import { areaFromMassFlow, circleArea, diameterForArea } from "@/lib/engineering/orifice";
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

describe("areaFromMassFlow", () => {
  it("sizes an orifice for a fuel flow", () => {
    // Hand: m = 0.01 kg/s, Cd = 0.61, rho = 740 kg/m³, dP = 10 000 Pa.
    // 2 x 740 x 10 000 = 14 800 000; sqrt = 3847.0768; x 0.61 = 2346.7168; A = 0.01 / 2346.7168 = 4.261275e-6 m².
    expectNear(areaFromMassFlow({ massFlowKgS: 0.01, cd: 0.61, densityKgM3: 740, deltaPPa: 10_000 }), 4.261275e-6, 1e-6);
  });

  it("refuses a Cd above 1 and a zero signal", () => {
    expect(() => areaFromMassFlow({ massFlowKgS: 0.01, cd: 1.2, densityKgM3: 740, deltaPPa: 1000 })).toThrow(RangeError);
    expect(() => areaFromMassFlow({ massFlowKgS: 0.01, cd: 0.6, densityKgM3: 740, deltaPPa: 0 })).toThrow(RangeError);
  });
});
