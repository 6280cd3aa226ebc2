import "server-only";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import { drillsInPlan } from "@/lib/engineering/plan-drills";
import { listStockedLabels } from "@/db/drill-stock";
import { getRevisionSnapshot } from "@/db/revisions";
import type { Job } from "@/db/schema";
import { snapshotJob } from "./plan";

/** Something a move went ahead with but the office should know: a drill the plan needs is off the rack. */
export interface MoveWarning {
  code: "drill_not_stocked";
  /** The drill as the plan names it: "#43", "1/16", "2.00 mm". */
  drill: string;
  message: string;
}

/**
 * The drills an approved plan uses that are not on the rack now (a drill taken off after approval). A job that
 * may use every standard drill was never planned on the rack: nothing to say.
 */
export async function offRackDrills(job: Pick<Job, "useAllDrills">, plan: ConversionPlan): Promise<MoveWarning[]> {
  if (job.useAllDrills) return [];
  const used = drillsInPlan(plan);
  if (used.length === 0) return [];
  const stocked = await listStockedLabels();
  return used
    .filter((drill) => !stocked.has(drill.label))
    .map((drill) => ({
      code: "drill_not_stocked" as const,
      drill: drill.label,
      message: `Drill ${drill.label} is not on the rack, and the plan uses it (${drill.uses.join("; ")}): stock it before the bench needs it, or revise the plan.`,
    }));
}

/** `offRackDrills` for one approved revision of the job, from its snapshot (the job as approved, its plan). */
export async function revisionOffRackDrills(jobId: string, revision: number): Promise<MoveWarning[]> {
  const kept = await getRevisionSnapshot(jobId, revision);
  if (!kept) return [];
  return offRackDrills(snapshotJob(kept.snapshot.job), kept.snapshot.plan);
}
