// Incompressible flow through small orifices: main jets, power-valve channel restrictions, the valve's own
// flow window. SI throughout: m, m², kg/s, kg/m³, Pa.
//
//   m = Cd * A * sqrt(2 * rho * dP)          (Bernoulli between the bowl and the orifice, with a discharge
//                                            coefficient; White, Fluid Mechanics, the orifice-meter section)
//
// Orifices side by side (parallel) add their areas. Orifices one after the other (series) carry the same
// flow; with equal Cd and the pressure drops adding up, 1/A_eq² = Σ 1/A_i².

import { requireNonNegative, requirePositive } from "./checks";

/**
 * Discharge coefficient of a sharp-edged thin-plate orifice at high Reynolds number: about 0.61, the
 * contraction of the vena contracta. Any fluid mechanics text has it (White, Fluid Mechanics; Munson,
 * Fundamentals of Fluid Mechanics).
 */
export const CD_SHARP_EDGED_ORIFICE = 0.61;

/**
 * Discharge coefficient of a short drilled hole (length about 1 to 3 diameters, square entry): about 0.8,
 * because the jet reattaches to the wall of the hole before it leaves. Value from memory of the short-tube
 * ("external mouthpiece") figures of around 0.8 in fluid mechanics and hydraulics texts (e.g. White, Fluid
 * Mechanics); it falls at low Reynolds number, so treat it as a planning default, not a calibration.
 */
export const CD_SHORT_DRILLED_HOLE = 0.8;

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

/** Mass flow (kg/s) through an orifice of the given area: m = Cd * A * sqrt(2 rho dP). */
export function massFlowFromArea(input: OrificeConditions & { areaM2: number }): number {
  validateConditions(input);
  requireNonNegative("areaM2", input.areaM2);
  return input.cd * input.areaM2 * Math.sqrt(2 * input.densityKgM3 * input.deltaPPa);
}

/** Orifices side by side: their areas add. */
export function parallelArea(areasM2: readonly number[]): number {
  let sum = 0;
  for (let i = 0; i < areasM2.length; i++) sum += requireNonNegative(`areasM2[${i}]`, areasM2[i] ?? Number.NaN);
  return sum;
}

/**
 * Orifices one after the other, same flow, equal Cd: 1/A_eq² = Σ 1/A_i². The result is never larger than
 * the smallest member; a closed member (area 0) closes the line. An empty list is no restriction at all
 * and has no finite area, so it is refused.
 */
export function seriesArea(areasM2: readonly number[]): number {
  if (areasM2.length === 0) throw new RangeError("seriesArea needs at least one area");
  let inverseSquares = 0;
  for (let i = 0; i < areasM2.length; i++) {
    const a = requireNonNegative(`areasM2[${i}]`, areasM2[i] ?? Number.NaN);
    if (a === 0) return 0;
    inverseSquares += 1 / (a * a);
  }
  return 1 / Math.sqrt(inverseSquares);
}

/**
 * Series area of two orifices without allocating: a*b/sqrt(a²+b²). Used in hot loops.
 * Both areas must already be validated as non-negative.
 */
export function seriesPairArea(aM2: number, bM2: number): number {
  if (aM2 === 0 || bM2 === 0) return 0;
  return (aM2 * bM2) / Math.sqrt(aM2 * aM2 + bM2 * bM2);
}

export interface EffectiveRestriction {
  /** Area the holes and the valve window pass together, m². */
  effectiveAreaM2: number;
  /**
   * True when the valve's flow window, not the holes, sets the flow: the holes' area is at least the
   * window's. At that point the series area has reached window/√2 (70.7 % of the window), and no amount of
   * further hole area can raise it by more than another 41 % (it only tends to the window itself).
   */
  valveLimited: boolean;
}

/**
 * Channel restriction holes in series with the power valve's own flow window. Without a window the holes
 * alone set the area. See EffectiveRestriction.valveLimited for the rule.
 */
export function effectiveRestrictionArea(input: {
  holesAreaM2: number;
  valveWindowAreaM2?: number | undefined;
}): EffectiveRestriction {
  const holes = requireNonNegative("holesAreaM2", input.holesAreaM2);
  if (input.valveWindowAreaM2 === undefined) return { effectiveAreaM2: holes, valveLimited: false };
  const window = requirePositive("valveWindowAreaM2", input.valveWindowAreaM2);
  return { effectiveAreaM2: seriesPairArea(holes, window), valveLimited: holes >= window };
}
