// The pin-gauge band a drilled restriction hole is accepted in at the bench. A fixed +/-0.001 in spans the next
// number drill for #61-#80 (0.0010-0.0020 in apart), so a hole drilled one size off would pass. The band on each
// side is the largest pin-gauge step strictly under half the gap to the neighbouring size of the drill's series,
// and never wider than 0.001 in (the usual bench allowance where drills are far apart: common practice).

import { FRACTION_DRILLS, LETTER_DRILLS, METRIC_DRILLS, NUMBER_DRILLS } from "./drills";
import type { Drill, DrillSystem } from "./types";
import { M_PER_IN, M_PER_MM } from "./unit-factors";

/** Widest allowance on either side: 0.001 in (common practice, no published source). */
export const MAX_ACCEPT_ALLOWANCE_M = 0.001 * M_PER_IN;

/** Pin-gauge steps: 0.0001 in for inch drills, 0.001 mm for metric ones (the finest steps of gauge sets). */
const PIN_STEP_M: Readonly<Record<DrillSystem, number>> = {
  number: 0.0001 * M_PER_IN,
  letter: 0.0001 * M_PER_IN,
  fraction: 0.0001 * M_PER_IN,
  metric: 0.001 * M_PER_MM,
};

const SERIES: Readonly<Record<DrillSystem, readonly Drill[]>> = {
  number: NUMBER_DRILLS,
  letter: LETTER_DRILLS,
  fraction: FRACTION_DRILLS,
  metric: METRIC_DRILLS,
};

// Floating-point slack when counting whole pin steps (0.0010 in / 0.0001 in is not exactly 10 in binary).
const STEP_SLACK = 1e-6;

export interface HoleAcceptBand {
  /** Smallest pin gauge that must enter, m. */
  minM: number;
  /** Largest pin gauge that may enter, m. */
  maxM: number;
  /** Allowance under the drill diameter, m. */
  belowM: number;
  /** Allowance over the drill diameter, m. */
  aboveM: number;
}

/** Whole pin steps strictly under half the gap, and not over the cap. */
function allowance(gapM: number, stepM: number): number {
  const halfSteps = gapM / 2 / stepM;
  const under = Math.max(0, Math.ceil(halfSteps - STEP_SLACK) - 1);
  const cap = Math.floor(MAX_ACCEPT_ALLOWANCE_M / stepM + STEP_SLACK);
  return Math.min(under, cap) * stepM;
}

/**
 * The accept band for a hole drilled with `drill`, among the sizes of `series` (default: the standard series of
 * the drill's own system, ASME B94.11M or the metric series). A drill at an end of the series takes the
 * allowance of its one neighbour on both sides.
 */
export function holeAcceptBand(drill: Drill, series: readonly Drill[] = SERIES[drill.system]): HoleAcceptBand {
  const stepM = PIN_STEP_M[drill.system];
  const others = series.filter((d) => Math.abs(d.diameterM - drill.diameterM) > 1e-9);
  const below = others.filter((d) => d.diameterM < drill.diameterM).reduce<number | undefined>((a, d) => Math.max(a ?? 0, d.diameterM), undefined);
  const above = others.filter((d) => d.diameterM > drill.diameterM).reduce<number | undefined>((a, d) => Math.min(a ?? Infinity, d.diameterM), undefined);
  let belowM = below === undefined ? undefined : allowance(drill.diameterM - below, stepM);
  let aboveM = above === undefined ? undefined : allowance(above - drill.diameterM, stepM);
  belowM ??= aboveM ?? allowance(Infinity, stepM);
  aboveM ??= belowM;
  return { minM: drill.diameterM - belowM, maxM: drill.diameterM + aboveM, belowM, aboveM };
}
