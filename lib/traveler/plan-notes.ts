import { byGravity, type PlanWarning } from "@/lib/engineering/plan-warnings";
import type { TravelerData } from "./types";

/**
 * The plan's warnings a traveler prints: those about this block, and the whole plan's warnings and dangers
 * (a lean zone under boost concerns every block). Revisions approved before warnings were graded kept them as
 * plain sentences; those print as cautions.
 */
export function travelerPlanNotes(warnings: readonly (PlanWarning | string)[] | undefined, blockId: string): TravelerData["planNotes"] {
  const graded = (warnings ?? []).map((w): PlanWarning => (typeof w === "string" ? { code: "plan_note", level: "caution", message: w } : w));
  return byGravity(graded)
    .filter((w) => w.blockId === blockId || (w.blockId === undefined && (w.level === "danger" || w.level === "warning")))
    .map(({ level, message }) => ({ level, message }));
}
