import "server-only";
import { and, asc, eq } from "drizzle-orm";
import { RequestRefusal } from "@/db/refusal";
import { getDb } from "./client";
import type { BlockRow } from "./jobs";
import { revisionNameColumns } from "./revision-names";
import type { RevisionSnapshot } from "./revisions";
import { jobs, meteringBlocks, operations, planRevisions, type Job, type MeteringBlock, type Operation, type PlanRevision } from "./schema";
import { maySeeJob, type Viewer } from "./visibility";

/** What the store keeps of one block in one revision: the sources of its printed traveler. */
export interface TravelerRecord {
  /** The job as approved in the revision (its snapshot over the working row). */
  job: Job;
  /** The block as approved, with the working row's identity. */
  block: MeteringBlock | BlockRow;
  blockId: string;
  side: MeteringBlock["side"];
  revision: {
    number: number;
    status: PlanRevision["status"];
    approvedAt: Date;
    approvedBy: string;
    releasedAt: Date | null;
    releasedBy: string | null;
    acknowledgedWarnings: unknown;
  };
  snapshot: RevisionSnapshot;
  operations: Operation[];
  /** The customer's and the tuner's names as the revision keeps them (as they were when it was approved). */
  customer: string;
  tuner: string;
}

/**
 * The record behind the printed traveler of one block, for one revision (the job's current one by default).
 * The job's figures and the names are the revision's snapshot (what was approved), not the job's working inputs
 * or today's names.
 * Machinists get travelers only for jobs that reached the shop floor (released or later); tuners and admins
 * get any approved revision. Refuses with 404 when the block, the revision or the block's part in it is
 * missing or when the viewer may not have it (a hidden job is not told apart from a missing one).
 */
export async function getTravelerRecord(viewer: Viewer, input: { blockId: string; revision?: number | undefined }): Promise<TravelerRecord> {
  const db = getDb();
  const [found] = await db
    .select({ block: meteringBlocks, job: jobs })
    .from(meteringBlocks)
    .innerJoin(jobs, eq(jobs.id, meteringBlocks.jobId))
    .where(eq(meteringBlocks.id, input.blockId));
  if (!found) throw new RequestRefusal(404, "No such metering block.", "blockId");
  if (!maySeeJob(viewer, found.job.state)) throw new RequestRefusal(404, "No such metering block.", "blockId");

  const number = input.revision ?? found.job.currentRevision;
  const [revision] = await db
    .select({
      id: planRevisions.id,
      number: planRevisions.number,
      status: planRevisions.status,
      snapshot: planRevisions.snapshot,
      acknowledgedWarnings: planRevisions.acknowledgedWarnings,
      approvedAt: planRevisions.approvedAt,
      releasedAt: planRevisions.releasedAt,
      ...revisionNameColumns,
    })
    .from(planRevisions)
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

  return {
    job: { ...job, number: found.job.number },
    block,
    blockId: found.block.id,
    side: found.block.side,
    revision: {
      number: revision.number,
      status: revision.status,
      approvedAt: revision.approvedAt,
      approvedBy: revision.approvedBy,
      releasedAt: revision.releasedAt,
      releasedBy: revision.releasedBy ?? null,
      acknowledgedWarnings: revision.acknowledgedWarnings,
    },
    snapshot,
    operations: rows,
    customer: revision.customer,
    tuner: revision.tuner,
  };
}
