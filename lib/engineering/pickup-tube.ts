// Pickup extension for the secondary power valve: a short tube swaged onto the valve inlet, run rearward
// and bent down toward jet-extension level.
//
// Cut length = straight runs + bend arcs (arc length = centerline radius x angle in radians) + the length
// swaged over the valve inlet. Straight runs are measured along the centerline between bends (tangent to
// tangent).
//
// The path is drawn in the plane of the bends from the tip of the valve inlet (where the swaged part
// ends), heading rearward (+x), with y downward: a positive bend angle turns the tube down, a negative one
// up. Its extent (how far it reaches rearward and down from the inlet tip) is checked against the room
// the bowl needs to come off.

import { requireFinite, requireNonNegative, requirePositive } from "./checks";
import { M_PER_IN } from "./unit-factors";

/** Soft copper tube of 5/16 in outside diameter (common practice, no published source), in metres. */
export const COMMON_PICKUP_TUBE_OD_M = (5 / 16) * M_PER_IN;

export type TubeSegment =
  | { kind: "straight"; lengthM: number }
  | { kind: "bend"; angleRad: number; centerlineRadiusM: number };

export interface PickupTubeInput {
  /** Segments in order from the valve inlet outward. */
  segments: readonly TubeSegment[];
  /** Tube length pushed over the valve inlet and crimped, m. */
  swageEngagementM: number;
  /** Outside diameter, m: adds half of it to the reach; omit to check the centerline. */
  outsideDiameterM?: number | undefined;
  /** Room the bowl leaves: how far rearward and how far down the tube may reach from the inlet tip, m. */
  maxReach?: { rearwardM?: number | undefined; downwardM?: number | undefined } | undefined;
}

export interface PickupTubePlan {
  /** Length to cut, m. */
  cutLengthM: number;
  straightM: number;
  arcM: number;
  swageM: number;
  /** End of the centerline relative to the inlet tip: x rearward, y downward, m. */
  end: { xM: number; yM: number };
  /** Farthest reach of the tube rearward (x) and down (y) from the inlet tip, m. */
  reach: { rearwardM: number; downwardM: number };
  /** False when the tube reaches further than maxReach allows (true when no limit was given). */
  fitsBowl: boolean;
  /** Which limits are exceeded. */
  exceeds: ("rearward" | "downward")[];
}

const QUARTER_TURN = Math.PI / 2;

export function planPickupTube(input: PickupTubeInput): PickupTubePlan {
  const swageM = requireNonNegative("swageEngagementM", input.swageEngagementM);
  const halfOd = input.outsideDiameterM === undefined ? 0 : requirePositive("outsideDiameterM", input.outsideDiameterM) / 2;
  let straightM = 0;
  let arcM = 0;
  let x = 0;
  let y = 0;
  let heading = 0; // radians from +x toward +y (down)
  let maxX = 0;
  let maxY = 0;
  input.segments.forEach((segment, i) => {
    if (segment.kind === "straight") {
      const length = requireNonNegative(`segments[${i}].lengthM`, segment.lengthM);
      straightM += length;
      x += length * Math.cos(heading);
      y += length * Math.sin(heading);
      maxX = Math.max(maxX, x);
      maxY = Math.max(maxY, y);
      return;
    }
    const angle = requireFinite(`segments[${i}].angleRad`, segment.angleRad);
    const radius = requirePositive(`segments[${i}].centerlineRadiusM`, segment.centerlineRadiusM);
    if (halfOd > 0 && radius <= halfOd) {
      throw new RangeError(`segments[${i}].centerlineRadiusM must exceed half the tube's outside diameter`);
    }
    arcM += radius * Math.abs(angle);
    // Center of the arc: to the left (angle < 0) or right (angle > 0) of the heading, in x-right y-down axes.
    const turn = Math.sign(angle);
    const cx = x - turn * radius * Math.sin(heading);
    const cy = y + turn * radius * Math.cos(heading);
    const pointAt = (h: number): void => {
      const px = cx + turn * radius * Math.sin(h);
      const py = cy - turn * radius * Math.cos(h);
      maxX = Math.max(maxX, px);
      maxY = Math.max(maxY, py);
    };
    // Along an arc, x and y are extreme at its ends or where the heading passes a multiple of 90°.
    const start = Math.min(heading, heading + angle);
    const end = Math.max(heading, heading + angle);
    for (let k = Math.ceil(start / QUARTER_TURN); k * QUARTER_TURN < end; k++) pointAt(k * QUARTER_TURN);
    x = cx + turn * radius * Math.sin(heading + angle);
    y = cy - turn * radius * Math.cos(heading + angle);
    pointAt(heading + angle);
    heading += angle;
  });
  const reach = { rearwardM: maxX + halfOd, downwardM: maxY + halfOd };
  const exceeds: ("rearward" | "downward")[] = [];
  const limit = input.maxReach;
  if (limit?.rearwardM !== undefined && reach.rearwardM > requirePositive("maxReach.rearwardM", limit.rearwardM)) {
    exceeds.push("rearward");
  }
  if (limit?.downwardM !== undefined && reach.downwardM > requirePositive("maxReach.downwardM", limit.downwardM)) {
    exceeds.push("downward");
  }
  return {
    cutLengthM: straightM + arcM + swageM,
    straightM,
    arcM,
    swageM,
    end: { xM: x, yM: y },
    reach,
    fitsBowl: exceeds.length === 0,
    exceeds,
  };
}
