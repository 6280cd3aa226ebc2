import "server-only";
import { and, asc, eq, inArray, sql, type SQL } from "drizzle-orm";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import { canMove, type JobState } from "@/db/job-states";
import { RequestRefusal } from "@/db/refusal";
import { recordAudit } from "./audit";
import { namesAtApproval, revisionNameColumns, withReleasedBy, type RevisionNames } from "./revision-names";
import { getDb, type Executor } from "./client";
import { lockJob, type BlockRow } from "./jobs";
import type { Viewer } from "./visibility";
import { deliveries, enrichmentStages, jobs, meteringBlocks, operations, planRevisions, type Job } from "./schema";

/**
 * What an approved revision keeps forever: the inputs as they were, the plan solved from them, and the names it
 * prints as they were then (absent from revisions approved before the names were kept; see revision-names.ts).
 */
export interface RevisionSnapshot {
  job: Record<string, unknown>;
  blocks: BlockRow[];
  plan: ConversionPlan;
  names?: Partial<RevisionNames> | undefined;
}

async function loadBlocks(db: Executor, jobId: string): Promise<BlockRow[]> {
  const blocks = await db.select().from(meteringBlocks).where(eq(meteringBlocks.jobId, jobId)).orderBy(asc(meteringBlocks.side));
  if (!blocks.length) return [];
  const stages = await db
    .select()
    .from(enrichmentStages)
    .where(inArray(enrichmentStages.blockId, blocks.map((b) => b.id)))
    .orderBy(asc(enrichmentStages.position));
  return blocks.map((b) => ({ ...b, stages: stages.filter((s) => s.blockId === b.id) }));
}

/** The job's working inputs (the row and its blocks with their stages), read together. */
export async function getJobInputs(jobId: string): Promise<{ job: Job; blocks: BlockRow[] }> {
  const db = getDb();
  const [job] = await db.select().from(jobs).where(eq(jobs.id, jobId));
  if (!job) throw new RequestRefusal(404, "No such job.");
  return { job, blocks: await loadBlocks(db, jobId) };
}

/** What the workflow decides from the locked inputs: the plan to keep, and the warnings acknowledged with it. */
export interface ApprovedPlan {
  plan: ConversionPlan;
  acknowledgedWarnings: { code: string; level: string; message: string }[];
}

/**
 * Keeps the working inputs as the next revision: under the job's lock, `decide` solves the inputs as they are
 * (and may refuse); the store keeps the snapshot, writes each block's operations, marks the previous revision
 * superseded and moves the job to planned. All or nothing.
 */
export async function storeRevision(actor: Viewer, jobId: string, decide: (job: Job, blocks: BlockRow[]) => ApprovedPlan): Promise<{ revision: number }> {
  return getDb().transaction(async (tx) => {
    const job = await lockJob(tx, jobId);
    if (!canMove(job.state, "planned")) throw new RequestRefusal(409, `A ${job.state} job cannot be approved: edit it first.`, "to");
    const blocks = await loadBlocks(tx, jobId);
    const { plan, acknowledgedWarnings } = decide(job, blocks);
    const number = job.currentRevision + 1;
    const now = new Date();
    await tx
      .update(planRevisions)
      .set({ status: "superseded", supersededAt: now })
      .where(and(eq(planRevisions.jobId, jobId), eq(planRevisions.status, "current")));
    const names = await namesAtApproval(tx, { customerId: job.customerId, tunerId: job.tunerId, approverId: actor.id });
    const snapshot: RevisionSnapshot = { job: { ...job }, blocks, plan, names };
    const [revision] = await tx
      .insert(planRevisions)
      .values({ jobId, number, snapshot: JSON.parse(JSON.stringify(snapshot)), approvedById: actor.id, approvedAt: now, acknowledgedWarnings })
      .returning({ id: planRevisions.id });
    const rows = plan.blocks.flatMap((blockPlan) =>
      blockPlan.operations.map((op) => ({
        revisionId: revision!.id,
        blockId: blockPlan.blockId,
        number: op.number,
        kind: op.kind,
        title: op.title,
        instructions: op.instructions,
        parameters: { ...op.parameters, ...(op.stageId ? { stageId: op.stageId } : {}) },
        measurements: op.measurements,
        caution: op.caution,
      })),
    );
    if (rows.length) await tx.insert(operations).values(rows);
    await tx.update(jobs).set({ state: "planned", currentRevision: number, updatedAt: now }).where(eq(jobs.id, jobId));
    await recordAudit(tx, actor.id, "job.approve", jobId, { revision: number, ...(acknowledgedWarnings.length ? { acknowledgedWarnings } : {}) });
    return { revision: number };
  });
}

export interface RevisionProgress {
  complete: boolean;
  allSigned: boolean;
  failed: number;
}

/**
 * The three counts of a revision's bench record as SQL columns, for one revision id (a bound value or a
 * qualified column). Written with aliases: inside a subquery an unqualified "id" would name the wrong table.
 */
export function revisionProgressColumns(revisionId: SQL) {
  return {
    operationCount: sql<number>`(SELECT count(*)::int FROM operations o WHERE o.revision_id = ${revisionId})`,
    signedCount: sql<number>`(SELECT count(*)::int FROM sign_offs s INNER JOIN operations o ON o.id = s.operation_id WHERE o.revision_id = ${revisionId})`,
    failedCount: sql<number>`(SELECT count(*)::int FROM measurements m INNER JOIN operations o ON o.id = m.operation_id WHERE o.revision_id = ${revisionId} AND NOT m.passed)`,
  };
}

/** Reads the counts selected with `revisionProgressColumns`. */
export function revisionProgress(counts: { operationCount: number; signedCount: number; failedCount: number }): RevisionProgress {
  const allSigned = counts.operationCount > 0 && counts.operationCount === counts.signedCount;
  return { complete: allSigned && counts.failedCount === 0, allSigned, failed: counts.failedCount };
}

/** Whether every operation of the revision is signed, and whether every measurement passed too. */
export async function currentRevisionComplete(db: Executor, jobId: string, revision: number): Promise<RevisionProgress> {
  // One round trip: the revision and its three counts together.
  const [row] = await db
    .select(revisionProgressColumns(sql.raw(`"plan_revisions"."id"`)))
    .from(planRevisions)
    .where(and(eq(planRevisions.jobId, jobId), eq(planRevisions.number, revision)));
  if (!row) return { complete: false, allSigned: false, failed: 0 };
  return revisionProgress(row);
}

/**
 * Moves the job to another state when the move is allowed: planned -> released stamps the revision's
 * release (and keeps the releaser's name with it); verified needs a complete bench record. Approval (-> planned) keeps a revision: `storeRevision`.
 */
export async function changeJobState(
  actor: Viewer,
  jobId: string,
  to: Exclude<JobState, "planned">,
  options: { handedTo?: string | undefined } = {},
): Promise<{ state: JobState; revision: number }> {
  return getDb().transaction(async (tx) => {
    const job = await lockJob(tx, jobId);
    if (!canMove(job.state, to)) throw new RequestRefusal(409, `A ${job.state} job cannot move to ${to}.`, "to");
    const now = new Date();
    if (to === "released") {
      await tx
        .update(planRevisions)
        .set({ releasedAt: now, releasedById: actor.id, snapshot: withReleasedBy(actor.id) })
        .where(and(eq(planRevisions.jobId, jobId), eq(planRevisions.number, job.currentRevision)));
    }
    if (to === "verified") {
      const record = await currentRevisionComplete(tx, jobId, job.currentRevision);
      if (!record.complete) throw new RequestRefusal(409, "Every operation must be signed, with every measurement within plan, before the job is verified.", "to");
    }
    if (to === "delivered") {
      // Who took the blocks is part of the record: a delivery without a name is not made.
      const handedTo = options.handedTo?.trim();
      if (!handedTo) throw new RequestRefusal(400, "Say who the blocks were handed to.", "handedTo");
      await tx.insert(deliveries).values({ jobId, revisionNumber: job.currentRevision, handedOverById: actor.id, handedTo, deliveredAt: now });
    }
    await tx.update(jobs).set({ state: to, updatedAt: now }).where(eq(jobs.id, jobId));
    await recordAudit(tx, actor.id, "job.state", jobId, { from: job.state, to, ...(to === "delivered" ? { handedTo: options.handedTo?.trim() } : {}) });
    return { state: to, revision: job.currentRevision };
  });
}

/**
 * One approved revision's snapshot, with the names it prints resolved: as it keeps them, or for a revision
 * approved before names were kept, as the rows it points at are named now.
 */
export async function getRevisionSnapshot(
  jobId: string,
  number: number,
): Promise<{ id: string; status: string; snapshot: RevisionSnapshot; names: Omit<RevisionNames, "releasedBy"> & { releasedBy: string | null } } | undefined> {
  const [row] = await getDb()
    .select({ id: planRevisions.id, status: planRevisions.status, snapshot: planRevisions.snapshot, ...revisionNameColumns })
    .from(planRevisions)
    .where(and(eq(planRevisions.jobId, jobId), eq(planRevisions.number, number)));
  if (!row) return undefined;
  const { customer, tuner, approvedBy, releasedBy, ...revision } = row;
  return { ...revision, snapshot: row.snapshot as RevisionSnapshot, names: { customer, tuner, approvedBy, releasedBy } };
}
