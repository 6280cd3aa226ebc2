import { describe, expect, it } from "vitest";
import {
  addedAreaForExtraFuel,
  addedAreaForMassFlow,
  extraFuelFromAddedArea,
  extraFuelFromAfr,
  extraFuelFromLambda,
  extraFuelFromMassFlow,
  mainJetArea,
} from "@/lib/engineering/enrichment";
import { M_PER_IN } from "./nist-factors";

function expectNear(actual: number, expected: number, rel = 1e-5) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe("extra fuel from a mixture change", () => {
  it("follows AFR_before / AFR_after - 1", () => {
    // Hand: 13.0 / 11.5 = 1.1304348 -> 13.04 % more fuel.
    expectNear(extraFuelFromAfr(13.0, 11.5), 0.1304348);
    // Hand: a leaner target asks for less: 12 / 13 - 1 = -0.0769231.
    expectNear(extraFuelFromAfr(12, 13), -0.0769231);
  });

  it("gives the same from lambda, the stoichiometric ratio cancelling", () => {
    // Hand: lambda 0.88 -> 0.78: 0.88 / 0.78 - 1 = 0.1282051.
    expectNear(extraFuelFromLambda(0.88, 0.78), 0.1282051);
    // Gasoline stoichiometric AFR 14.7 (common practice, no published source): 0.88 x 14.7 = 12.936,
    // 0.78 x 14.7 = 11.466 -> 12.936 / 11.466 - 1 = 0.1282051, the same.
    expectNear(extraFuelFromAfr(12.936, 11.466), 0.1282051);
  });
});

describe("mainJetArea", () => {
  it("adds the jets of each side from their measured bores", () => {
    const area = mainJetArea({
      primary: { diameterM: 0.07 * M_PER_IN, count: 2 },
      secondary: { diameterM: 0.08 * M_PER_IN, count: 2 },
    });
    // Hand: 0.070 in = 0.001778 m, d² = 3.161284e-6, x 0.785398163 = 2.482866e-6 m², two jets 4.965731e-6 m².
    // 0.080 in = 0.002032 m, d² = 4.129024e-6, x 0.785398163 = 3.242925e-6 m², two jets 6.485851e-6 m².
    expectNear(area.primaryM2, 4.965731e-6);
    expectNear(area.secondaryM2, 6.485851e-6);
    expectNear(area.totalM2, 1.1451582e-5);
  });

  it("leaves out a side that has no jets", () => {
    const area = mainJetArea({ primary: { diameterM: 0.07 * M_PER_IN, count: 2 } });
    expect(area.secondaryM2).toBe(0);
    expect(area.totalM2).toBe(area.primaryM2);
  });
});

describe("restriction area for an extra-fuel fraction", () => {
  it("scales the main-jet area when Cd and signal are equal", () => {
    // Hand: 13 % of 1.1451582e-5 m² = 1.4887057e-6 m².
    expectNear(addedAreaForExtraFuel({ extraFuelFraction: 0.13, mainJetAreaM2: 1.1451582e-5 }), 1.4887057e-6);
    // And back: 1.4887057e-6 / 1.1451582e-5 = 0.13.
    expectNear(extraFuelFromAddedArea({ addedAreaM2: 1.4887057e-6, mainJetAreaM2: 1.1451582e-5 }), 0.13);
  });

  it("needs more area where the restriction's Cd is lower than the jets'", () => {
    // Hand: 10 % of 1e-5 m² at Cd ratio 0.8 / 0.61 = 1.3114754 -> 1e-6 x 1.3114754 = 1.3114754e-6 m².
    expectNear(
      addedAreaForExtraFuel({ extraFuelFraction: 0.1, mainJetAreaM2: 1e-5, mainJetCd: 0.8, restrictionCd: 0.61 }),
      1.3114754e-6,
    );
  });
});

describe("extra fuel from a mass flow at a metering signal", () => {
  const signal = { cd: 0.7, fuelDensityKgM3: 740, signalPa: 5000 };

  it("compares the wanted flow with the main jets' flow", () => {
    // Hand: main jets 1e-5 m² flow 0.7 x 1e-5 x sqrt(2 x 740 x 5000) = 0.7e-5 x sqrt(7.4e6) = 0.7e-5 x 2720.2941
    // = 0.01904206 kg/s; 0.002 / 0.01904206 = 0.1050307.
    expectNear(extraFuelFromMassFlow({ ...signal, extraFuelKgS: 0.002, mainJetAreaM2: 1e-5 }), 0.1050307);
  });

  it("sizes the restriction for that flow", () => {
    // Hand: 0.002 / (0.7 x 2720.2941) = 0.002 / 1904.2059 = 1.0503066e-6 m².
    expectNear(addedAreaForMassFlow({ ...signal, extraFuelKgS: 0.002 }), 1.0503066e-6);
  });
});
