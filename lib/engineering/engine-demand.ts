// What the engine asks for: charge density, charge temperature after the compressor and the intercooler,
// air and fuel mass flow. SI: Pa (absolute unless named gauge), K, m³, kg/s, W.

import { requireInRange, requirePositive } from "./checks";

/**
 * Specific gas constant of dry air, J/(kg K): 287.05, the ISO 2533 standard-atmosphere value (287.052 87)
 * rounded; the universal gas constant over a molar mass of about 28.96 g/mol.
 */
export const R_AIR_J_PER_KG_K = 287.05;

/** Ratio of specific heats of air near room temperature: 1.4 (any thermodynamics text; ISO 2533 uses 1.4). */
export const GAMMA_AIR = 1.4;

/** Ideal-gas density: rho = P_abs / (R_air T). */
export function chargeDensity(input: { absolutePressurePa: number; temperatureK: number }): number {
  return (
    requirePositive("absolutePressurePa", input.absolutePressurePa) /
    (R_AIR_J_PER_KG_K * requirePositive("temperatureK", input.temperatureK))
  );
}

/**
 * Compressor outlet temperature from the isentropic relation and an isentropic efficiency:
 *   T2 = T1 (1 + ((P2/P1)^((γ-1)/γ) - 1) / η)
 * With P2 <= P1 (no boost) the compressor adds nothing and T2 = T1.
 */
export function compressorOutletTemperature(input: {
  inletTemperatureK: number;
  inletPressurePa: number;
  outletPressurePa: number;
  /** Isentropic efficiency, 0 < η <= 1. */
  efficiency: number;
  gamma?: number | undefined;
}): number {
  const t1 = requirePositive("inletTemperatureK", input.inletTemperatureK);
  const ratio =
    requirePositive("outletPressurePa", input.outletPressurePa) / requirePositive("inletPressurePa", input.inletPressurePa);
  const eta = requireInRange("efficiency", input.efficiency, Number.MIN_VALUE, 1);
  const gamma = input.gamma === undefined ? GAMMA_AIR : requirePositive("gamma", input.gamma);
  if (gamma <= 1) throw new RangeError(`gamma must exceed 1, got ${gamma}`);
  if (ratio <= 1) return t1;
  return t1 * (1 + (Math.pow(ratio, (gamma - 1) / gamma) - 1) / eta);
}

/** Intercooler outlet: T_out = T_in - ε (T_in - T_coolant), ε the effectiveness (0..1). */
export function intercoolerOutletTemperature(input: {
  inletTemperatureK: number;
  coolantTemperatureK: number;
  effectiveness: number;
}): number {
  const tIn = requirePositive("inletTemperatureK", input.inletTemperatureK);
  const tCool = requirePositive("coolantTemperatureK", input.coolantTemperatureK);
  const eps = requireInRange("effectiveness", input.effectiveness, 0, 1);
  return tIn - eps * (tIn - tCool);
}
