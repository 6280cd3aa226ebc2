import "server-only";
import { EDITING_STATES } from "@/db/job-states";
import type { BlockRow, JobRecord } from "@/db/jobs";
import { getRevisionSnapshot } from "@/db/revisions";
import type { Job } from "@/db/schema";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import { RequestRefusal } from "@/db/refusal";
import { solveJob } from "./approve";
import { snapshotJob, snapshotPlan } from "./plan";

/** The plan the job stands on: the job as it was, its blocks and the solved plan, and where it came from. */
export interface ShownPlan {
  job: Job;
  plan: ConversionPlan;
  blocks: BlockRow[];
  /** The approved revision it comes from; null for a draft solved now. */
  revision: number | null;
  source: string;
}

/**
 * A draft is solved now, with the shop's rack and limits; past draft the bench works from the approved
 * revision's snapshot. Undefined when there is nothing to solve yet; a refusal when it cannot be solved.
 */
export async function shownPlanOf(record: JobRecord): Promise<ShownPlan | undefined> {
  const { job } = record;
  if (!EDITING_STATES.includes(job.state) && job.currentRevision > 0) {
    const revision = await getRevisionSnapshot(job.id, job.currentRevision);
    if (!revision) return undefined;
    return {
      job: snapshotJob(revision.snapshot.job),
      plan: snapshotPlan(revision.snapshot),
      blocks: revision.snapshot.blocks,
      revision: job.currentRevision,
      source: `As approved in revision ${job.currentRevision}.`,
    };
  }
  if (!record.blocks.length) throw new RequestRefusal(409, "Add the metering blocks and their stages before solving.", "blocks");
  return { job, plan: await solveJob(job.id), blocks: record.blocks, revision: null, source: "Working plan, solved now from the inputs and the drills available." };
}
