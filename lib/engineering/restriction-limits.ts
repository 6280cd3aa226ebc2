// What a shop will drill for a power-valve channel restriction: one drill system per plan, a smallest and a
// largest drill, and a least web of metal between neighbouring holes. A drill under about #70 breaks easily
// and its hole is hard to verify with pin gauges; above about 1/8 in the hole no longer restricts much next to
// the valve's own window (large alcohol setups run up to four holes of about 0.125 in: common practice).

import { findDrill } from "./drills";
import type { Drill, DrillSystem } from "./types";
import { M_PER_IN } from "./unit-factors";

/** Which drill series one plan draws from: the inch series (number, letter, fraction), metric, or both. */
export type PlanDrillSystem = "inch" | "metric" | "mixed";
export const PLAN_DRILL_SYSTEMS: readonly PlanDrillSystem[] = ["inch", "metric", "mixed"];

// Defaults used where the shop has set nothing. Common practice, no published source; the diameters are
// ASME B94.11M's: #70 = 0.0280 in, 1/8 = 0.1250 in.
export const DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL = "#70";
export const DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL = "1/8";
export const DEFAULT_SMALLEST_RESTRICTION_DRILL_M = 0.028 * M_PER_IN;
export const DEFAULT_LARGEST_RESTRICTION_DRILL_M = 0.125 * M_PER_IN;
/** Least metal between neighbouring holes: 0.020 in (common practice, no published source). */
export const DEFAULT_MIN_WEB_M = 0.02 * M_PER_IN;
export const DEFAULT_PLAN_DRILL_SYSTEM: PlanDrillSystem = "inch";

/** The drills a plan may choose restriction holes from. */
export interface RestrictionDrillLimits {
  system: PlanDrillSystem;
  /** Smallest drill diameter allowed, m (inclusive). */
  smallestDrillM: number;
  /** Largest drill diameter allowed, m (inclusive). */
  largestDrillM: number;
}

export const DEFAULT_RESTRICTION_DRILL_LIMITS: Readonly<RestrictionDrillLimits> = {
  system: DEFAULT_PLAN_DRILL_SYSTEM,
  smallestDrillM: DEFAULT_SMALLEST_RESTRICTION_DRILL_M,
  largestDrillM: DEFAULT_LARGEST_RESTRICTION_DRILL_M,
};

// A drill within a nanometre of a limit counts as on it (floating-point noise of unit conversion).
const SAME_DIAMETER_M = 1e-9;

/** Whether a drill of this series belongs to a plan of the given system. */
export function inDrillSystem(series: DrillSystem, system: PlanDrillSystem): boolean {
  if (system === "mixed") return true;
  return system === "metric" ? series === "metric" : series !== "metric";
}

/** Whether a drill may be used for a restriction under the limits (system and diameter). */
export function isRestrictionDrill(drill: Drill, limits: RestrictionDrillLimits): boolean {
  return (
    inDrillSystem(drill.system, limits.system) &&
    drill.diameterM >= limits.smallestDrillM - SAME_DIAMETER_M &&
    drill.diameterM <= limits.largestDrillM + SAME_DIAMETER_M
  );
}

/** The shop's settings as stored (labels, null meaning "the default") and the job's drill system. */
export interface ShopRestrictionSettings {
  system?: PlanDrillSystem | undefined;
  smallestDrillLabel?: string | null | undefined;
  largestDrillLabel?: string | null | undefined;
}

/**
 * Limits from the shop's settings, defaults where a value is missing. Throws a RangeError naming the setting
 * for a label that is no standard drill or a smallest drill larger than the largest.
 */
export function restrictionDrillLimits(settings: ShopRestrictionSettings = {}): RestrictionDrillLimits {
  const limits: RestrictionDrillLimits = {
    system: settings.system ?? DEFAULT_PLAN_DRILL_SYSTEM,
    smallestDrillM: labelDiameter("smallestDrillLabel", settings.smallestDrillLabel) ?? DEFAULT_SMALLEST_RESTRICTION_DRILL_M,
    largestDrillM: labelDiameter("largestDrillLabel", settings.largestDrillLabel) ?? DEFAULT_LARGEST_RESTRICTION_DRILL_M,
  };
  return checkRestrictionDrillLimits(limits);
}

function labelDiameter(name: string, label: string | null | undefined): number | undefined {
  if (label === null || label === undefined) return undefined;
  const drill = findDrill(label);
  if (drill === undefined) throw new RangeError(`${name}: "${label}" is not a standard drill size`);
  return drill.diameterM;
}

function requirePlanDrillSystem(system: PlanDrillSystem): void {
  if (!PLAN_DRILL_SYSTEMS.includes(system)) {
    throw new RangeError(`system must be one of ${PLAN_DRILL_SYSTEMS.join(", ")}, got ${String(system)}`);
  }
}

/** Checks the limits and returns them: a known system, positive diameters, smallest not above largest. */
export function checkRestrictionDrillLimits(limits: RestrictionDrillLimits): RestrictionDrillLimits {
  requirePlanDrillSystem(limits.system);
  const { smallestDrillM: min, largestDrillM: max } = limits;
  if (!(Number.isFinite(min) && min > 0)) throw new RangeError(`smallestDrillM must be a positive number, got ${min}`);
  if (!(Number.isFinite(max) && max > 0)) throw new RangeError(`largestDrillM must be a positive number, got ${max}`);
  if (min > max + SAME_DIAMETER_M) {
    throw new RangeError(`smallestDrillM must not exceed largestDrillM, got ${min} > ${max}`);
  }
  return limits;
}
