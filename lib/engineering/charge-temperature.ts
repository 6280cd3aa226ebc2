import { compressorOutletTemperature } from "./engine-demand";
import type { ChargeTemperatureModel } from "./staging";

/**
 * Isentropic efficiency assumed for the compressor when the measured charge temperature is cooler than it
 * would leave: 0.70, a typical peak efficiency of a centrifugal compressor map (common practice, no
 * published source). It shapes the curve between zero and peak boost only; the peak matches the measurement.
 */
export const ASSUMED_COMPRESSOR_EFFICIENCY = 0.7;

/**
 * A charge-temperature model that starts at the ambient temperature at zero boost and reaches the measured
 * charge temperature at peak boost, following the compressor's isentropic heating:
 *   hotter than a 70 % compressor leaves it: no intercooler, efficiency solved from
 *     T_peak = T_amb (1 + (PR^((γ-1)/γ) - 1) / η);
 *   cooler (intercooled): 70 % compressor, intercooler effectiveness solved from
 *     T_peak = T_c - ε (T_c - T_amb).
 * A charge cooler than the ambient air has no model here (it needs a chiller): undefined.
 */
export function chargeModelFromPeak(input: {
  ambientTemperatureK: number;
  ambientPressurePa: number;
  peakBoostGaugePa: number;
  chargeAtPeakK: number;
}): ChargeTemperatureModel | undefined {
  const { ambientTemperatureK: tAmb, ambientPressurePa: pAmb, peakBoostGaugePa, chargeAtPeakK: tPeak } = input;
  if (tPeak < tAmb - 1e-9) return undefined;
  const ratio = (pAmb + peakBoostGaugePa) / pAmb;
  const isentropicRise = Math.pow(ratio, 0.4 / 1.4) - 1;
  if (tPeak - tAmb < 1e-9) return { kind: "compressor", efficiency: 1, intercoolerEffectiveness: 1 };
  const compressorOut = compressorOutletTemperature({
    inletTemperatureK: tAmb,
    inletPressurePa: pAmb,
    outletPressurePa: pAmb + peakBoostGaugePa,
    efficiency: ASSUMED_COMPRESSOR_EFFICIENCY,
  });
  if (tPeak >= compressorOut) {
    return { kind: "compressor", efficiency: Math.min(1, isentropicRise / (tPeak / tAmb - 1)) };
  }
  return {
    kind: "compressor",
    efficiency: ASSUMED_COMPRESSOR_EFFICIENCY,
    intercoolerEffectiveness: (compressorOut - tPeak) / (compressorOut - tAmb),
  };
}
