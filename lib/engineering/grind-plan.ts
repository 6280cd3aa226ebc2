// Clearance grind of the main-body boss next to a taller (boost-referenced) power valve.
//
//   depth to remove = valve protrusion + running clearance - measured gap
//
// The measured gap is what the clay shows between the boss and the valve before grinding (zero when they
// touch; the protrusion is then how far the valve stands into the boss). The depth is taken off in equal
// light passes no deeper than the maximum per pass, with a clay check after every Nth pass and always
// after the last. The grind stops before it starts if the depth exceeds what the wall can spare:
//   spare = wall thickness - least wall that must remain.

import { requireInteger, requireNonNegative, requirePositive } from "./checks";

export interface GrindPlanInput {
  /** How far the new valve stands into the boss where it would seat, m. */
  valveProtrusionM: number;
  /** Running clearance wanted between valve and boss once ground, m. */
  runningClearanceM: number;
  /** Gap the clay shows between valve and boss before grinding, m (0 when they touch). */
  measuredGapM: number;
  /** Deepest cut in one light pass, m. */
  maxDepthPerPassM: number;
  /** Wall thickness of the boss where it is ground, m. */
  wallThicknessM: number;
  /** Least wall that must remain after grinding, m. */
  minRemainingWallM: number;
  /** Clay check after every this many passes (and always after the last). Default 1: after every pass. */
  clayCheckEvery?: number | undefined;
}

export interface GrindPass {
  /** 1-based pass number. */
  pass: number;
  /** Depth removed in this pass, m. */
  depthM: number;
  /** Total depth removed after this pass, m. */
  cumulativeDepthM: number;
  /** Check the fit with clay after this pass. */
  clayCheck: boolean;
}

export type GrindRefusal = "depth-exceeds-wall";

export interface GrindPlan {
  /** False when the grind must not be done as planned; see reason. */
  ok: boolean;
  reason?: { code: GrindRefusal; message: string } | undefined;
  /** False when the gap already covers protrusion and clearance. */
  grindNeeded: boolean;
  /** Depth to remove, m (0 when no grind is needed). */
  depthM: number;
  /** Wall that can be spared, m. */
  wallSpareM: number;
  /** Wall left after the grind, m. */
  remainingWallM: number;
  /** Passes (empty when no grind is needed or the plan is refused). */
  passes: GrindPass[];
}

/**
 * A clearance grind is a handful of light passes; a plan of more than this many is a slip in the depth per pass
 * (our own limit, no published source).
 */
export const MAX_GRIND_PASSES = 100;

// A depth that is a whole number of passes up to rounding (0.050 / 0.0125 in floating point) is not one
// pass more.
const PASS_ROUNDING = 1e-9;

export function planGrind(input: GrindPlanInput): GrindPlan {
  const protrusion = requireNonNegative("valveProtrusionM", input.valveProtrusionM);
  const clearance = requireNonNegative("runningClearanceM", input.runningClearanceM);
  const gap = requireNonNegative("measuredGapM", input.measuredGapM);
  const perPass = requirePositive("maxDepthPerPassM", input.maxDepthPerPassM);
  const wall = requirePositive("wallThicknessM", input.wallThicknessM);
  const minWall = requireNonNegative("minRemainingWallM", input.minRemainingWallM);
  const every = input.clayCheckEvery === undefined ? 1 : requireInteger("clayCheckEvery", input.clayCheckEvery, 1, 1000);

  const wallSpareM = Math.max(wall - minWall, 0);
  const rawDepth = protrusion + clearance - gap;
  if (!(rawDepth > 0)) {
    return { ok: true, grindNeeded: false, depthM: 0, wallSpareM, remainingWallM: wall, passes: [] };
  }
  if (rawDepth > wallSpareM) {
    return {
      ok: false,
      reason: {
        code: "depth-exceeds-wall",
        message:
          "The depth to remove is more than the wall can spare; do not grind: choose a shorter valve, " +
          "accept less clearance, or have the body checked.",
      },
      grindNeeded: true,
      depthM: rawDepth,
      wallSpareM,
      remainingWallM: wall - rawDepth,
      passes: [],
    };
  }
  const count = Math.max(1, Math.ceil(rawDepth / perPass - PASS_ROUNDING));
  if (count > MAX_GRIND_PASSES) {
    throw new RangeError(`maxDepthPerPassM: the depth would take ${count} passes, more than ${MAX_GRIND_PASSES}; check the depth per pass`);
  }
  const depthM = rawDepth / count;
  const passes: GrindPass[] = [];
  for (let pass = 1; pass <= count; pass++) {
    passes.push({
      pass,
      depthM,
      cumulativeDepthM: pass === count ? rawDepth : depthM * pass,
      clayCheck: pass === count || pass % every === 0,
    });
  }
  return { ok: true, grindNeeded: true, depthM: rawDepth, wallSpareM, remainingWallM: wall - rawDepth, passes };
}
