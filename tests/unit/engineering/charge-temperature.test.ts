// The staging calculator's charge-temperature model: from the ambient at zero boost to the measured charge
// temperature at peak boost, along the compressor's isentropic heating.
import { describe, expect, it } from "vitest";
import { chargeModelFromPeak } from "@/lib/engineering/charge-temperature";
import { venturiAirAt, type StagingModel } from "@/lib/engineering/staging";
import { PA_PER_PSI, PA_STANDARD_ATMOSPHERE } from "./nist-factors";

const AMBIENT_K = 298.15; // 25 °C
const PEAK = 10 * PA_PER_PSI;

function modelWith(chargeAtPeakK: number): StagingModel {
  const charge = chargeModelFromPeak({ ambientTemperatureK: AMBIENT_K, ambientPressurePa: PA_STANDARD_ATMOSPHERE, peakBoostGaugePa: PEAK, chargeAtPeakK });
  if (charge === undefined) throw new Error("no model");
  return {
    mainJets: { primary: 1e-5, secondary: 1e-5 },
    valves: [],
    ambient: { pressurePa: PA_STANDARD_ATMOSPHERE, temperatureK: AMBIENT_K },
    target: { atmosphereAfr: 12.5, peakBoostAfr: 12.5, peakBoostGaugePa: PEAK },
    charge,
  };
}

describe("charge temperature from a measurement at peak boost", () => {
  // Pressure ratio at 10 psi: (101325 + 68947.57) / 101325 = 1.680454 (NIST SP 811 factors).
  // Isentropic rise, gamma 1.4: 1.680454^(0.4/1.4) - 1 = exp(0.285714 x 0.519065) - 1 = 0.159873.
  // A 70 % compressor leaves 298.15 x (1 + 0.159873 / 0.7) = 366.24 K.

  it("is the ambient at zero boost and the measurement at peak, hot or intercooled", () => {
    for (const measured of [400, 366.24, 320, 298.15]) {
      const model = modelWith(measured);
      expect(venturiAirAt(model, 0).temperatureK).toBeCloseTo(AMBIENT_K, 6);
      expect(venturiAirAt(model, PEAK).temperatureK).toBeCloseTo(measured, 6);
    }
  });

  it("solves the compressor efficiency for a charge hotter than a 70 % compressor leaves it", () => {
    // eta = 0.159873 / (400 / 298.15 - 1) = 0.159873 / 0.341607 = 0.46800
    const charge = modelWith(400).charge;
    expect(charge.kind === "compressor" && charge.intercoolerEffectiveness).toBeUndefined();
    expect(charge.kind === "compressor" && charge.efficiency).toBeCloseTo(0.468, 3);
  });

  it("solves the intercooler effectiveness for a cooler charge", () => {
    // epsilon = (366.24 - 320) / (366.24 - 298.15) = 46.24 / 68.09 = 0.6791
    const charge = modelWith(320).charge;
    expect(charge.kind === "compressor" && charge.efficiency).toBeCloseTo(0.7, 9);
    expect(charge.kind === "compressor" && charge.intercoolerEffectiveness).toBeCloseTo(0.679, 2);
  });

  it("refuses a charge cooler than the ambient air", () => {
    expect(
      chargeModelFromPeak({ ambientTemperatureK: AMBIENT_K, ambientPressurePa: PA_STANDARD_ATMOSPHERE, peakBoostGaugePa: PEAK, chargeAtPeakK: 280 }),
    ).toBeUndefined();
  });
});
