import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import { benchUrl } from "@/lib/bench/url";
import { RequestRefusal } from "@/db/refusal";
import { fuelProperties } from "@/lib/engineering/fuels";
import { fuelSpecOf } from "@/lib/jobs/plan";
import { SHOP_FLOOR_STATES } from "@/db/job-states";
import { travelerOperations } from "@/lib/traveler/operations";
import { travelerPlanNotes } from "@/lib/traveler/plan-notes";
import type { TravelerData } from "@/lib/traveler/types";
import { getDb } from "./client";
import type { Viewer } from "./jobs";
import type { RevisionSnapshot } from "./revisions";
import { customers, jobs, meteringBlocks, operations, planRevisions, users, type Job } from "./schema";

const approvers = alias(users, "approver");
const releasers = alias(users, "releaser");

function fuelName(job: Job): string {
  try {
    return fuelProperties(fuelSpecOf(job)).name;
  } catch {
    return job.fuelKind;
  }
}

/**
 * Everything the printed traveler of one block shows, for one revision (the job's current one by default).
 * The job's figures are the revision's snapshot (what was approved), not the job's working inputs.
 * Machinists get travelers only for jobs that reached the shop floor (released or later); tuners and admins
 * get any approved revision. Refuses with 404 when the block, the revision or the block's part in it is
 * missing or when the viewer may not have it (a hidden job is not told apart from a missing one).
 */
export async function getTravelerData(viewer: Viewer, input: { blockId: string; revision?: number | undefined }): Promise<TravelerData> {
  const db = getDb();
  const [found] = await db
    .select({ block: meteringBlocks, job: jobs })
    .from(meteringBlocks)
    .innerJoin(jobs, eq(jobs.id, meteringBlocks.jobId))
    .where(eq(meteringBlocks.id, input.blockId));
  if (!found) throw new RequestRefusal(404, "No such metering block.", "blockId");
  if (viewer.role === "machinist" && !SHOP_FLOOR_STATES.includes(found.job.state)) {
    // Answered like a block that does not exist: the bench learns nothing about work not yet released.
    throw new RequestRefusal(404, "No such metering block.", "blockId");
  }

  const number = input.revision ?? found.job.currentRevision;
  const [revision] = await db
    .select({
      id: planRevisions.id,
      number: planRevisions.number,
      status: planRevisions.status,
      snapshot: planRevisions.snapshot,
      acknowledgedWarnings: planRevisions.acknowledgedWarnings,
      approvedAt: planRevisions.approvedAt,
      approvedBy: approvers.name,
      releasedAt: planRevisions.releasedAt,
      releasedBy: releasers.name,
    })
    .from(planRevisions)
    .innerJoin(approvers, eq(approvers.id, planRevisions.approvedById))
    .leftJoin(releasers, eq(releasers.id, planRevisions.releasedById))
    .where(and(eq(planRevisions.jobId, found.job.id), eq(planRevisions.number, number)));
  if (!revision) {
    throw new RequestRefusal(404, number === 0 ? "The job has no approved revision yet." : `The job has no revision ${number}.`, "revision");
  }

  const rows = await db
    .select()
    .from(operations)
    .where(and(eq(operations.revisionId, revision.id), eq(operations.blockId, input.blockId)))
    .orderBy(asc(operations.number));
  if (!rows.length) throw new RequestRefusal(404, `The ${found.block.side} block has no operations in revision ${number}.`, "revision");

  const snapshot = revision.snapshot as RevisionSnapshot;
  const job: Job = { ...found.job, ...(snapshot.job as Partial<Job>) };
  const block = snapshot.blocks.find((b) => b.id === input.blockId) ?? found.block;
  const [customer] = await db.select({ name: customers.name }).from(customers).where(eq(customers.id, job.customerId));
  const [tuner] = await db.select({ name: users.name }).from(users).where(eq(users.id, job.tunerId));

  return {
    job: {
      number: found.job.number,
      customer: customer?.name ?? "",
      carburetor: job.carburetor,
      displacementM3: job.displacementM3,
      fuel: fuelName(job),
      peakBoostPa: job.peakBoostPa,
    },
    block: { id: found.block.id, side: found.block.side, mainJetDiameterM: block.mainJetDiameterM, mainJetCount: block.mainJetCount },
    revision: {
      number: revision.number,
      status: revision.status,
      approvedAt: revision.approvedAt.toISOString(),
      approvedBy: revision.approvedBy,
      releasedAt: revision.releasedAt?.toISOString() ?? null,
      releasedBy: revision.releasedBy ?? null,
      tuner: tuner?.name ?? "",
    },
    operations: travelerOperations(
      rows,
      snapshot.plan.blocks.find((b) => b.blockId === input.blockId),
    ),
    planNotes: travelerPlanNotes(snapshot.plan.warnings, input.blockId),
    acknowledgedDangers: Array.isArray(revision.acknowledgedWarnings) ? revision.acknowledgedWarnings.length : 0,
    benchUrl: benchUrl(found.block.id, revision.number),
  };
}
