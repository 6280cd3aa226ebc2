import "server-only";
import { and, asc, desc, eq, inArray, sql } from "drizzle-orm";
import type { PlannedMeasurement } from "@/lib/engineering/conversion-plan";
import type { JobState } from "@/db/job-states";
import { RequestRefusal } from "@/db/refusal";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { lockJob } from "./jobs";
import { maySeeJob, visibleJobsWhere, type Viewer } from "./visibility";
import { revisionNameColumns } from "./revision-names";
import { currentRevisionComplete, revisionProgress, revisionProgressColumns } from "./revisions";
import { attachments, jobs, measurementAmendments, measurements, meteringBlocks, operations, planRevisions, signOffs, users } from "./schema";

export interface BenchOperation {
  id: string;
  number: number;
  kind: string;
  title: string;
  instructions: string;
  parameters: Record<string, string | number>;
  caution: string | null;
  planned: PlannedMeasurement[];
  signOff: { by: string; byId: string; at: string; note: string } | null;
  recorded: { key: string; valueSi: number; passed: boolean }[];
  /** Readings corrected after signing, oldest first: what was recorded before, what replaced it, and why. */
  amendments: { key: string; previousValueSi: number; valueSi: number; passed: boolean; reason: string; by: string; at: string }[];
}

export interface BenchView {
  /** The job's state now; its customer, carburetor and tuner as the revision was approved. */
  job: { id: string; number: string; state: JobState; customer: string; carburetor: string; tuner: string; tunerId: string };
  block: { id: string; side: "primary" | "secondary" };
  revision: { id: string; number: number; status: "current" | "superseded"; releasedAt: string | null };
  currentRevision: number;
  operations: BenchOperation[];
  photos: { id: string; operationId: string | null; createdAt: string }[];
}

/**
 * One block in one revision as the bench sees it, named as the revision keeps it (a customer renamed later does
 * not change an approved revision). Machinists see only released work; undefined when the block, the revision
 * or the permission is missing.
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
    })
    .from(meteringBlocks)
    .innerJoin(jobs, eq(jobs.id, meteringBlocks.jobId))
    .where(eq(meteringBlocks.id, blockId));
  if (!row) return undefined;
  if (!maySeeJob(viewer, row.state)) return undefined;
  const number = revisionNumber ?? row.currentRevision;
  const [revision] = await db
    .select({
      id: planRevisions.id,
      number: planRevisions.number,
      status: planRevisions.status,
      releasedAt: planRevisions.releasedAt,
      carburetor: sql<string | null>`${planRevisions.snapshot} #>> '{job,carburetor}'`,
      customer: revisionNameColumns.customer,
      tuner: revisionNameColumns.tuner,
    })
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
        .select({ operationId: signOffs.operationId, by: users.name, byId: signOffs.userId, at: signOffs.signedAt, note: signOffs.note })
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
  const amendments = await listAmendments(opIds);
  const photos = await db
    .select({ id: attachments.id, operationId: attachments.operationId, createdAt: attachments.createdAt })
    .from(attachments)
    .where(eq(attachments.blockId, blockId))
    .orderBy(desc(attachments.createdAt));
  return {
    job: {
      id: row.jobId,
      number: row.number,
      state: row.state,
      customer: revision.customer,
      carburetor: revision.carburetor ?? row.carburetor,
      tuner: revision.tuner,
      tunerId: row.tunerId,
    },
    block: { id: row.blockId, side: row.side },
    revision: { id: revision.id, number: revision.number, status: revision.status, releasedAt: revision.releasedAt?.toISOString() ?? null },
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
        signOff: s ? { by: s.by, byId: s.byId, at: s.at.toISOString(), note: s.note } : null,
        recorded: recorded.filter((m) => m.operationId === op.id).map(({ key, valueSi, passed }) => ({ key, valueSi, passed })),
        amendments: amendments
          .filter((a) => a.operationId === op.id)
          .map(({ key, previousValueSi, valueSi, passed, reason, by, at }) => ({ key, previousValueSi, valueSi, passed, reason, by, at: at.toISOString() })),
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
    // One statement finds the operation, its revision and its job, applies the viewer's visibility (a hidden
    // job reads as a missing operation) and locks the job row: concurrent sign-offs of the job queue here.
    const [op] = await tx
      .select({
        title: operations.title,
        measurements: operations.measurements,
        revisionId: planRevisions.id,
        revisionStatus: planRevisions.status,
        revisionNumber: planRevisions.number,
        jobId: jobs.id,
        jobNumber: jobs.number,
        jobState: jobs.state,
        currentRevision: jobs.currentRevision,
        tunerId: jobs.tunerId,
      })
      .from(operations)
      .innerJoin(planRevisions, eq(planRevisions.id, operations.revisionId))
      .innerJoin(jobs, eq(jobs.id, planRevisions.jobId))
      .where(and(eq(operations.id, input.operationId), visibleJobsWhere(viewer)))
      .for("update", { of: jobs });
    if (!op) throw new RequestRefusal(404, "No such operation.", "operationId");
    const job = { id: op.jobId, number: op.jobNumber, state: op.jobState, currentRevision: op.currentRevision, tunerId: op.tunerId };
    if (op.revisionStatus !== "current" || op.revisionNumber !== job.currentRevision) {
      throw new RequestRefusal(409, `Revision ${op.revisionNumber} is superseded: work from revision ${job.currentRevision}.`, "operationId");
    }
    if (job.state === "held") {
      const [tuner] = await tx.select({ name: users.name }).from(users).where(eq(users.id, job.tunerId));
      throw new RequestRefusal(409, `Revision ${job.currentRevision} is on hold: ${tuner?.name ?? "the tuner"} is revising the plan. Nothing is signed until the next revision is released.`, "operationId");
    }
    if (job.state !== "released" && job.state !== "machining") {
      throw new RequestRefusal(409, `The job is ${job.state}: only released work is signed at the bench.`, "operationId");
    }
    // After the lock, in a statement of its own (it sees sign-offs committed while it waited): a repeat and
    // the revision's progress in one round trip.
    const [already] = await tx
      .select({ signed: sql<boolean>`EXISTS (SELECT 1 FROM sign_offs s WHERE s.operation_id = ${input.operationId})`, ...revisionProgressColumns(sql`${op.revisionId}`) })
      .from(sql`(SELECT 1) AS one`);
    if (already?.signed) {
      const progress = revisionProgress(already);
      return { recorded: false, operationTitle: op.title, jobId: job.id, jobState: job.state, failed: [], allSigned: progress.allSigned, verified: false };
    }
    const planned = op.measurements as PlannedMeasurement[];
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
      return { recorded: false, operationTitle: op.title, jobId: job.id, jobState: job.state, failed: [], allSigned: false, verified: false };
    }
    if (rows.length) await tx.insert(measurements).values(rows).onConflictDoNothing();
    let state: JobState = job.state === "released" ? "machining" : job.state;
    const [counts] = await tx.select(revisionProgressColumns(sql`${op.revisionId}`)).from(sql`(SELECT 1) AS one`);
    const progress = revisionProgress(counts!);
    const verified = progress.complete;
    if (verified) state = "verified";
    if (state !== job.state) await tx.update(jobs).set({ state, updatedAt: new Date() }).where(eq(jobs.id, job.id));
    await recordAudit(tx, viewer.id, "operation.sign", input.operationId, { job: job.number, failed: failed.map((f) => f.key), state });
    return { recorded: true, operationTitle: op.title, jobId: job.id, jobState: state, failed, allSigned: progress.allSigned, verified };
  });
}

export interface AmendOutcome {
  jobId: string;
  operationTitle: string;
  jobState: JobState;
  /** Readings that changed: before and after, and whether each is within plan now. */
  amended: { key: string; label: string; previousSi: number; valueSi: number; passed: boolean }[];
  /** Measurements of this operation still outside plan. */
  failed: { key: string; label: string }[];
  verified: boolean;
}

/**
 * Corrects the readings of a signed operation (a typo at the bench) with a reason. The signer or an admin may;
 * the earlier readings are kept in measurement_amendments and the audit trail, and the job's state is derived
 * again (a corrected failure can complete the job). A verified job is reopened by an admin first; a delivered
 * one is closed.
 */
export async function amendSignOff(
  viewer: Viewer,
  input: { operationId: string; measurements: Record<string, number>; reason: string; quantities?: Record<string, "length" | "pressure"> },
): Promise<AmendOutcome> {
  return getDb().transaction(async (tx) => {
    const [op] = await tx
      .select({ op: operations, revisionStatus: planRevisions.status, revisionNumber: planRevisions.number, jobId: planRevisions.jobId })
      .from(operations)
      .innerJoin(planRevisions, eq(planRevisions.id, operations.revisionId))
      .where(eq(operations.id, input.operationId));
    if (!op) throw new RequestRefusal(404, "No such operation.", "operationId");
    const job = await lockJob(tx, op.jobId);
    if (!maySeeJob(viewer, job.state)) throw new RequestRefusal(404, "No such operation.", "operationId");
    const [signed] = await tx.select({ userId: signOffs.userId }).from(signOffs).where(eq(signOffs.operationId, input.operationId));
    if (!signed) throw new RequestRefusal(409, "The operation is not signed yet: sign it off with its readings.", "operationId");
    if (viewer.role !== "admin" && signed.userId !== viewer.id) {
      throw new RequestRefusal(403, "Only the person who signed this operation, or an admin, may correct its readings.", "operationId");
    }
    if (op.revisionStatus !== "current" || op.revisionNumber !== job.currentRevision) {
      throw new RequestRefusal(409, `Revision ${op.revisionNumber} is superseded: its record stays as it was.`, "operationId");
    }
    if (job.state === "verified") throw new RequestRefusal(409, "The job is verified: an admin reopens it (back to machining) before a reading is corrected.", "operationId");
    if (job.state !== "machining") throw new RequestRefusal(409, `The job is ${job.state}: its bench record is closed.`, "operationId");

    const planned = op.op.measurements as PlannedMeasurement[];
    const current = await tx.select().from(measurements).where(eq(measurements.operationId, input.operationId));
    const amended: AmendOutcome["amended"] = [];
    for (const [key, value] of Object.entries(input.measurements)) {
      const plan = planned.find((m) => m.key === key);
      if (!plan) throw new RequestRefusal(400, "This operation has no such reading.", `readings.${key}`);
      if (!Number.isFinite(value)) throw new RequestRefusal(400, `Record ${plan.label.toLowerCase()} as a number.`, `readings.${key}`);
      const measuredAs = input.quantities?.[key];
      if (measuredAs && measuredAs !== plan.quantity) {
        throw new RequestRefusal(400, `${plan.label} is a ${plan.quantity}: choose a ${plan.quantity === "length" ? "length unit (in or mm)" : "pressure unit (psi, kPa or bar)"}.`, `readings.${key}`);
      }
      const before = current.find((m) => m.key === key);
      if (!before) throw new RequestRefusal(409, `${plan.label} was not recorded at sign-off.`, `readings.${key}`);
      if (before.valueSi === value) continue;
      const passed = value >= plan.minSi - 1e-12 && value <= plan.maxSi + 1e-12;
      await tx.insert(measurementAmendments).values({
        operationId: input.operationId,
        key,
        previousValueSi: before.valueSi,
        previousPassed: before.passed,
        valueSi: value,
        passed,
        reason: input.reason,
        amendedById: viewer.id,
      });
      await tx.update(measurements).set({ valueSi: value, passed, recordedById: viewer.id, recordedAt: new Date() }).where(eq(measurements.id, before.id));
      amended.push({ key, label: plan.label, previousSi: before.valueSi, valueSi: value, passed });
    }
    if (amended.length === 0) throw new RequestRefusal(400, "Every reading is as recorded: change one to correct it.", "readings");
    const after = await tx.select({ key: measurements.key, passed: measurements.passed }).from(measurements).where(eq(measurements.operationId, input.operationId));
    const failed = after.filter((m) => !m.passed).map((m) => ({ key: m.key, label: planned.find((p) => p.key === m.key)?.label ?? m.key }));
    const progress = await currentRevisionComplete(tx, job.id, job.currentRevision);
    const state: JobState = progress.complete ? "verified" : "machining";
    if (state !== job.state) await tx.update(jobs).set({ state, updatedAt: new Date() }).where(eq(jobs.id, job.id));
    await recordAudit(tx, viewer.id, "operation.amend", input.operationId, {
      job: job.number,
      reason: input.reason,
      readings: amended.map((a) => ({ key: a.key, from: a.previousSi, to: a.valueSi, passed: a.passed })),
      state,
    });
    return { jobId: job.id, operationTitle: op.op.title, jobState: state, amended, failed, verified: state === "verified" };
  });
}

/** Every correction of the operations' readings, oldest first, with who made it. */
export async function listAmendments(operationIds: string[]) {
  if (operationIds.length === 0) return [];
  return getDb()
    .select({
      operationId: measurementAmendments.operationId,
      key: measurementAmendments.key,
      previousValueSi: measurementAmendments.previousValueSi,
      valueSi: measurementAmendments.valueSi,
      passed: measurementAmendments.passed,
      reason: measurementAmendments.reason,
      by: users.name,
      at: measurementAmendments.amendedAt,
    })
    .from(measurementAmendments)
    .innerJoin(users, eq(users.id, measurementAmendments.amendedById))
    .where(inArray(measurementAmendments.operationId, operationIds))
    .orderBy(asc(measurementAmendments.amendedAt));
}
