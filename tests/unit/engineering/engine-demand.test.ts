import { describe, expect, it } from "vitest";
import {
  GAMMA_AIR,
  R_AIR_J_PER_KG_K,
  airMassFlow,
  chargeDensity,
  compressorOutletTemperature,
  fuelMassFlowFromAir,
  fuelMassFlowFromPower,
  intercoolerOutletTemperature,
} from "@/lib/engineering/engine-demand";
import { KG_PER_LB, PA_STANDARD_ATMOSPHERE, W_PER_HP } from "./nist-factors";

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

describe("airMassFlow and fuel demand", () => {
  it("gives a four-stroke engine's air flow", () => {
    // Heywood, ch. 2, volumetric efficiency (from memory): m_air = VE x rho x V_d x N / 2, N in rev/s.
    // Hand: 0.9 x 1.2 x 0.0057 m³ x (6000 / 60) / 2 = 0.9 x 1.2 x 0.0057 x 50 = 0.3078 kg/s.
    expectNear(airMassFlow({ chargeDensityKgM3: 1.2, displacementM3: 0.0057, rpm: 6000, volumetricEfficiency: 0.9 }), 0.3078);
  });

  it("divides the air by the target AFR", () => {
    // Hand: 0.3078 / 12.5 = 0.024624 kg/s.
    expectNear(fuelMassFlowFromAir({ airMassFlowKgS: 0.3078, afr: 12.5 }), 0.024624);
  });

  it("multiplies power by BSFC", () => {
    // 500 hp at 0.5 lb/(hp h). Hand: 500 x 0.5 = 250 lb/h; x 0.45359237 kg/lb = 113.39809 kg/h; / 3600 = 0.03149947 kg/s.
    const bsfcKgPerJ = (0.5 * KG_PER_LB) / (W_PER_HP * 3600);
    expectNear(fuelMassFlowFromPower({ brakePowerW: 500 * W_PER_HP, bsfcKgPerJ }), 0.03149947);
  });
});
