import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import type { PlannedMeasurement } from "@/lib/engineering/conversion-plan";
import type { JobState } from "@/db/job-states";
import { maySeeJob } from "./visibility";
import { RequestRefusal } from "@/db/refusal";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { lockJob } from "./jobs";
import type { Viewer } from "./visibility";
import { currentRevisionComplete } from "./revisions";
import { attachments, customers, jobs, measurements, meteringBlocks, operations, planRevisions, signOffs, users } from "./schema";

export interface BenchOperation {
  id: string;
  number: number;
  kind: string;
  title: string;
  instructions: string;
  parameters: Record<string, string | number>;
  caution: string | null;
  planned: PlannedMeasurement[];
  signOff: { by: string; at: string; note: string } | null;
  recorded: { key: string; valueSi: number; passed: boolean }[];
}

export interface BenchView {
  job: { id: string; number: string; state: JobState; customer: string; carburetor: string; tunerId: string };
  block: { id: string; side: "primary" | "secondary" };
  revision: { id: string; number: number; status: "current" | "superseded"; releasedAt: string | null };
  currentRevision: number;
  operations: BenchOperation[];
  photos: { id: string; operationId: string | null; createdAt: string }[];
}

/**
 * One block in one revision as the bench sees it. Machinists see only released work; undefined when the
 * block, the revision or the permission is missing.
 */
export async function getBenchView(viewer: Viewer, blockId: string, revisionNumber?: number): Promise<BenchView | undefined> {
  const db = getDb();
  const [row] = await db
    .select({
      blockId: meteringBlocks.id,
      side: meteringBlocks.side,
      jobId: jobs.id,
      number: jobs.number,
      state: jobs.state,
      carburetor: jobs.carburetor,
      currentRevision: jobs.currentRevision,
      tunerId: jobs.tunerId,
      customer: customers.name,
    })
    .from(meteringBlocks)
    .innerJoin(jobs, eq(jobs.id, meteringBlocks.jobId))
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .where(eq(meteringBlocks.id, blockId));
  if (!row) return undefined;
  if (!maySeeJob(viewer, row.state)) return undefined;
  const number = revisionNumber ?? row.currentRevision;
  const [revision] = await db
    .select({ id: planRevisions.id, number: planRevisions.number, status: planRevisions.status, releasedAt: planRevisions.releasedAt })
    .from(planRevisions)
    .where(and(eq(planRevisions.jobId, row.jobId), eq(planRevisions.number, number)));
  if (!revision) return undefined;
  const ops = await db
    .select()
    .from(operations)
    .where(and(eq(operations.revisionId, revision.id), eq(operations.blockId, blockId)))
    .orderBy(asc(operations.number));
  const opIds = ops.map((o) => o.id);
  const signed = opIds.length
    ? await db
        .select({ operationId: signOffs.operationId, by: users.name, at: signOffs.signedAt, note: signOffs.note })
        .from(signOffs)
        .innerJoin(users, eq(users.id, signOffs.userId))
        .where(inArray(signOffs.operationId, opIds))
    : [];
  const recorded = opIds.length
    ? await db
        .select({ operationId: measurements.operationId, key: measurements.key, valueSi: measurements.valueSi, passed: measurements.passed })
        .from(measurements)
        .where(inArray(measurements.operationId, opIds))
    : [];
  const photos = await db
    .select({ id: attachments.id, operationId: attachments.operationId, createdAt: attachments.createdAt })
    .from(attachments)
    .where(eq(attachments.blockId, blockId))
    .orderBy(desc(attachments.createdAt));
  return {
    job: { id: row.jobId, number: row.number, state: row.state, customer: row.customer, carburetor: row.carburetor, tunerId: row.tunerId },
    block: { id: row.blockId, side: row.side },
    revision: { ...revision, releasedAt: revision.releasedAt?.toISOString() ?? null },
    currentRevision: row.currentRevision,
    operations: ops.map((op) => {
      const s = signed.find((x) => x.operationId === op.id);
      return {
        id: op.id,
        number: op.number,
        kind: op.kind,
        title: op.title,
        instructions: op.instructions,
        parameters: op.parameters as Record<string, string | number>,
        caution: op.caution,
        planned: op.measurements as PlannedMeasurement[],
        signOff: s ? { by: s.by, at: s.at.toISOString(), note: s.note } : null,
        recorded: recorded.filter((m) => m.operationId === op.id).map(({ key, valueSi, passed }) => ({ key, valueSi, passed })),
      };
    }),
    photos: photos.map((p) => ({ ...p, createdAt: p.createdAt.toISOString() })),
  };
}

export interface SignOffOutcome {
  /** False when the operation was already signed: nothing was recorded again. */
  recorded: boolean;
  operationTitle: string;
  jobId: string;
  jobState: JobState;
  /** Measurements that fell outside plan in this sign-off. */
  failed: { key: string; label: string }[];
  /** Every operation of every block is signed now, with or without failures. */
  allSigned: boolean;
  /** The job moved to verified with this sign-off. */
  verified: boolean;
}

/**
 * Signs one operation off with its measurements (SI, by key). Idempotent: a second sign-off of the same
 * operation (another phone, a double tap, a retry) records nothing and says so. The job row is locked for
 * the transaction, so concurrent sign-offs queue up; the unique sign-off per operation is the last guard.
 * The first sign-off moves a released job to machining; the last one, with every measurement within plan,
 * to verified.
 */
export async function signOffOperation(
  viewer: Viewer,
  input: {
    operationId: string;
    measurements: Record<string, number>;
    note: string;
    /** What each reading's unit measured, when known: a length typed in psi is refused, not stored as metres. */
    quantities?: Record<string, "length" | "pressure">;
  },
): Promise<SignOffOutcome> {
  return getDb().transaction(async (tx) => {
    const [op] = await tx
      .select({ op: operations, revisionStatus: planRevisions.status, revisionNumber: planRevisions.number, jobId: planRevisions.jobId })
      .from(operations)
      .innerJoin(planRevisions, eq(planRevisions.id, operations.revisionId))
      .where(eq(operations.id, input.operationId));
    if (!op) throw new RequestRefusal(404, "No such operation.", "operationId");
    const job = await lockJob(tx, op.jobId);
    if (!maySeeJob(viewer, job.state)) throw new RequestRefusal(404, "No such operation.", "operationId");
    if (op.revisionStatus !== "current" || op.revisionNumber !== job.currentRevision) {
      throw new RequestRefusal(409, `Revision ${op.revisionNumber} is superseded: work from revision ${job.currentRevision}.`, "operationId");
    }
    if (job.state !== "released" && job.state !== "machining") {
      throw new RequestRefusal(409, `The job is ${job.state}: only released work is signed at the bench.`, "operationId");
    }
    const [existing] = await tx.select({ id: signOffs.id }).from(signOffs).where(eq(signOffs.operationId, input.operationId));
    if (existing) {
      const progress = await currentRevisionComplete(tx, job.id, job.currentRevision);
      return { recorded: false, operationTitle: op.op.title, jobId: job.id, jobState: job.state, failed: [], allSigned: progress.allSigned, verified: false };
    }
    const planned = op.op.measurements as PlannedMeasurement[];
    const failed: { key: string; label: string }[] = [];
    const rows = planned.map((m) => {
      const value = input.measurements[m.key];
      if (value === undefined || !Number.isFinite(value)) throw new RequestRefusal(400, `Record ${m.label.toLowerCase()} before signing.`, `measurements.${m.key}`);
      const measuredAs = input.quantities?.[m.key];
      if (measuredAs && measuredAs !== m.quantity) {
        throw new RequestRefusal(400, `${m.label} is a ${m.quantity}: choose a ${m.quantity === "length" ? "length unit (in or mm)" : "pressure unit (psi, kPa or bar)"}.`, `measurements.${m.key}`);
      }
      const passed = value >= m.minSi - 1e-12 && value <= m.maxSi + 1e-12;
      if (!passed) failed.push({ key: m.key, label: m.label });
      return { operationId: input.operationId, key: m.key, valueSi: value, passed, recordedById: viewer.id };
    });
    const inserted = await tx
      .insert(signOffs)
      .values({ operationId: input.operationId, userId: viewer.id, note: input.note })
      .onConflictDoNothing({ target: signOffs.operationId })
      .returning({ id: signOffs.id });
    if (inserted.length === 0) {
      return { recorded: false, operationTitle: op.op.title, jobId: job.id, jobState: job.state, failed: [], allSigned: false, verified: false };
    }
    if (rows.length) await tx.insert(measurements).values(rows).onConflictDoNothing();
    let state: JobState = job.state === "released" ? "machining" : job.state;
    const progress = await currentRevisionComplete(tx, job.id, job.currentRevision);
    const verified = progress.complete;
    if (verified) state = "verified";
    if (state !== job.state) await tx.update(jobs).set({ state, updatedAt: new Date() }).where(eq(jobs.id, job.id));
    await recordAudit(tx, viewer.id, "operation.sign", input.operationId, { job: job.number, failed: failed.map((f) => f.key), state });
    return { recorded: true, operationTitle: op.op.title, jobId: job.id, jobState: state, failed, allSigned: progress.allSigned, verified };
  });
}
