// Incompressible flow through small orifices: main jets, power-valve channel restrictions, the valve's own
// flow window. SI throughout: m, m², kg/s, kg/m³, Pa.
//
//   m = Cd * A * sqrt(2 * rho * dP)          (Bernoulli between the bowl and the orifice, with a discharge
//                                            coefficient; White, Fluid Mechanics, the orifice-meter section)
//
// Orifices side by side (parallel) add their areas. Orifices one after the other (series) carry the same
// flow; with equal Cd and the pressure drops adding up, 1/A_eq² = Σ 1/A_i².

import { requireNonNegative, requirePositive } from "./checks";

const QUARTER_PI = Math.PI / 4;

/** Area of a round hole of diameter d (m) in m². */
export function circleArea(diameterM: number): number {
  requireNonNegative("diameterM", diameterM);
  return QUARTER_PI * diameterM * diameterM;
}

/** Diameter (m) of a round hole of the given area (m²). */
export function diameterForArea(areaM2: number): number {
  requireNonNegative("areaM2", areaM2);
  return Math.sqrt(areaM2 / QUARTER_PI);
}

export interface OrificeConditions {
  /** Discharge coefficient, dimensionless (0 < Cd <= 1). */
  cd: number;
  /** Density of the liquid flowing, kg/m³. */
  densityKgM3: number;
  /** Pressure drop across the orifice (the metering signal), Pa. */
  deltaPPa: number;
}

function validateConditions(c: OrificeConditions): void {
  requirePositive("cd", c.cd);
  if (c.cd > 1) throw new RangeError(`cd must not exceed 1, got ${c.cd}`);
  requirePositive("densityKgM3", c.densityKgM3);
  requirePositive("deltaPPa", c.deltaPPa);
}

/** Orifice area (m²) that passes the mass flow at the given conditions: A = m / (Cd * sqrt(2 rho dP)). */
export function areaFromMassFlow(input: OrificeConditions & { massFlowKgS: number }): number {
  validateConditions(input);
  requireNonNegative("massFlowKgS", input.massFlowKgS);
  return input.massFlowKgS / (input.cd * Math.sqrt(2 * input.densityKgM3 * input.deltaPPa));
}

/**
 * Series area of two orifices without allocating: a*b/sqrt(a²+b²). Used in hot loops.
 * Both areas must already be validated as non-negative.
 */
export function seriesPairArea(aM2: number, bM2: number): number {
  if (aM2 === 0 || bM2 === 0) return 0;
  return (aM2 * bM2) / Math.sqrt(aM2 * aM2 + bM2 * bM2);
}
