// Job fixtures for the integration tests: the demo job (tests/support/job-fixtures.ts) made through the data layer.
import { createJob, saveJobBlocks } from "@/db/jobs";
import type { Viewer } from "@/db/visibility";
import { changeJobState } from "@/db/revisions";
import { approveRevision } from "@/lib/jobs/approve";
import { blockColumns, jobColumns } from "@/lib/jobs/input";
import { createJobSchema, jobBlocksSchema } from "@/lib/jobs/schema";
import type { JobFields } from "@/db/jobs";
import { and, eq } from "drizzle-orm";
import * as schema from "@/db/schema";
import { demoBlocksBody, demoJobBody } from "../../support/job-fixtures";
import { actAs, testDb, type Actor } from "./database";

// The demo job's request bodies, shared with the other tiers.
export { demoBlocksBody as blocksBody, demoJobBody as jobBody } from "../../support/job-fixtures";

async function viewer(actor: Exclude<Actor, "anonymous">): Promise<Viewer> {
  const id = await actAs(actor);
  return { id: id!, role: actor };
}

/** A job with blocks, created by the tuner through the data layer, taken as far as `state`. */
export async function makeJob(state: "draft" | "planned" | "released" = "draft", overrides: Record<string, unknown> = {}) {
  const tuner = await viewer("tuner");
  const { customerId, newCustomerName, tunerId, ...fields } = createJobSchema.parse(demoJobBody(overrides));
  const job = await createJob(tuner, { fields: jobColumns(fields) as JobFields, customerId, newCustomerName, tunerId });
  await saveJobBlocks(tuner, job.id, blockColumns(jobBlocksSchema.parse(demoBlocksBody())));
  if (state !== "draft") await approveRevision(tuner, job.id);
  if (state === "released") await changeJobState(tuner, job.id, "released");
  return job;
}

/** The id of the job's block on the given side. */
export async function blockIdOf(jobId: string, side: "primary" | "secondary" = "primary"): Promise<string> {
  const [block] = await testDb
    .select({ id: schema.meteringBlocks.id })
    .from(schema.meteringBlocks)
    .where(and(eq(schema.meteringBlocks.jobId, jobId), eq(schema.meteringBlocks.side, side)));
  if (!block) throw new Error(`job ${jobId} has no ${side} block`);
  return block.id;
}
