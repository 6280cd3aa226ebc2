import { describe, expect, it } from "vitest";
import {
  GAMMA_AIR,
  R_AIR_J_PER_KG_K,
  chargeDensity,
  compressorOutletTemperature,
  intercoolerOutletTemperature,
} from "@/lib/engineering/engine-demand";
import { PA_STANDARD_ATMOSPHERE } from "./nist-factors";

function expectNear(actual: number, expected: number, rel = 1e-5) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe("gas constants", () => {
  it("uses the standard-atmosphere gas constant and gamma of air", () => {
    // ISO 2533: R = 287.052 87 J/(kg K), gamma = 1.4.
    expect(R_AIR_J_PER_KG_K).toBeCloseTo(287.05, 2);
    expect(GAMMA_AIR).toBe(1.4);
  });
});

describe("chargeDensity", () => {
  it("gives the standard sea-level density", () => {
    // ISO 2533 standard atmosphere at sea level: 101 325 Pa, 288.15 K, 1.2250 kg/m³.
    expect(chargeDensity({ absolutePressurePa: PA_STANDARD_ATMOSPHERE, temperatureK: 288.15 })).toBeCloseTo(1.225, 3);
  });

  it("matches the textbook room-temperature density", () => {
    // Heywood, Internal Combustion Engine Fundamentals: air at 1 atm and 298 K, about 1.184 kg/m³ (from memory).
    expect(chargeDensity({ absolutePressurePa: PA_STANDARD_ATMOSPHERE, temperatureK: 298 })).toBeCloseTo(1.184, 2);
    // Hand: 101 325 / (287.05 x 298) = 101 325 / 85 540.9 = 1.184524 kg/m³.
    expectNear(chargeDensity({ absolutePressurePa: PA_STANDARD_ATMOSPHERE, temperatureK: 298 }), 1.184524);
  });
});

describe("compressorOutletTemperature", () => {
  it("follows the isentropic relation at 100 % efficiency", () => {
    // Hand: pressure ratio 2, (gamma - 1)/gamma = 0.4/1.4 = 0.2857143; 2^0.2857143 = e^(0.6931472 x 0.2857143)
    // = e^0.1980421 = 1.2190137; T2 = 300 x 1.2190137 = 365.7041 K.
    expectNear(compressorOutletTemperature({ inletTemperatureK: 300, inletPressurePa: 1e5, outletPressurePa: 2e5, efficiency: 1 }), 365.7041);
  });

  it("heats the charge more at a lower efficiency", () => {
    // Hand: T2 = 300 x (1 + 0.2190137 / 0.7) = 300 x 1.3128767 = 393.8630 K.
    expectNear(compressorOutletTemperature({ inletTemperatureK: 300, inletPressurePa: 1e5, outletPressurePa: 2e5, efficiency: 0.7 }), 393.863);
  });

  it("adds nothing without boost", () => {
    expect(compressorOutletTemperature({ inletTemperatureK: 300, inletPressurePa: 1e5, outletPressurePa: 0.9e5, efficiency: 0.7 })).toBe(300);
  });

  it("refuses an efficiency above 1", () => {
    expect(() =>
      compressorOutletTemperature({ inletTemperatureK: 300, inletPressurePa: 1e5, outletPressurePa: 2e5, efficiency: 1.1 }),
    ).toThrow(RangeError);
  });
});

describe("intercoolerOutletTemperature", () => {
  it("removes the effectiveness share of the temperature difference", () => {
    // Hand: 393.863 - 0.7 x (393.863 - 300) = 393.863 - 65.7041 = 328.1589 K.
    expectNear(intercoolerOutletTemperature({ inletTemperatureK: 393.863, coolantTemperatureK: 300, effectiveness: 0.7 }), 328.1589);
  });
});
