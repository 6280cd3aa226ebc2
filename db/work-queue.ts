import "server-only";
import { and, asc, count, desc, eq, gte, inArray, isNull, like, ne, or } from "drizzle-orm";
import type { JobState } from "./job-states";
import { getDb } from "./client";
import { visibleJobsWhere, type Viewer } from "./visibility";
import { auditEvents, customers, jobs, measurements, meteringBlocks, operations, planRevisions, signOffs, tuningLogs, users } from "./schema";

// The reads behind the home pages' work queues: small lists, newest or oldest first, each bounded.

/** How many rows one list of a queue carries at most: a home page is a to-do list, not a report. */
export const QUEUE_LIMIT = 20;

export interface QueueJob {
  id: string;
  number: string;
  customer: string;
  carburetor: string;
  state: JobState;
  updatedAt: string;
}

const jobColumns = {
  id: jobs.id,
  number: jobs.number,
  customer: customers.name,
  carburetor: jobs.carburetor,
  state: jobs.state,
  updatedAt: jobs.updatedAt,
};

function jobOut(row: { id: string; number: string; customer: string; carburetor: string; state: JobState; updatedAt: Date }): QueueJob {
  return { ...row, updatedAt: row.updatedAt.toISOString() };
}

/** The tuner's own jobs in one state, the longest untouched first. */
export async function listTunerJobsIn(tuner: Viewer, state: JobState): Promise<QueueJob[]> {
  const rows = await getDb()
    .select(jobColumns)
    .from(jobs)
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .where(and(eq(jobs.tunerId, tuner.id), eq(jobs.state, state)))
    .orderBy(asc(jobs.updatedAt))
    .limit(QUEUE_LIMIT);
  return rows.map(jobOut);
}

export interface FailedReading {
  job: QueueJob;
  blockId: string;
  side: "primary" | "secondary";
  revision: number;
  operationNumber: number;
  operationTitle: string;
  key: string;
  valueSi: number;
  /** The operation's planned measurements (jsonb), for the plan and band of this reading. */
  planned: unknown;
  recordedAt: string;
}

/** Readings out of plan on the current revision of the tuner's jobs in machining: what holds them there. */
export async function listFailedReadings(tuner: Viewer): Promise<FailedReading[]> {
  const rows = await getDb()
    .select({
      ...jobColumns,
      blockId: meteringBlocks.id,
      side: meteringBlocks.side,
      revision: planRevisions.number,
      operationNumber: operations.number,
      operationTitle: operations.title,
      key: measurements.key,
      valueSi: measurements.valueSi,
      planned: operations.measurements,
      recordedAt: measurements.recordedAt,
    })
    .from(measurements)
    .innerJoin(operations, eq(operations.id, measurements.operationId))
    .innerJoin(planRevisions, and(eq(planRevisions.id, operations.revisionId), eq(planRevisions.status, "current")))
    .innerJoin(jobs, eq(jobs.id, planRevisions.jobId))
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .innerJoin(meteringBlocks, eq(meteringBlocks.id, operations.blockId))
    .where(and(eq(measurements.passed, false), eq(jobs.state, "machining"), eq(jobs.tunerId, tuner.id)))
    .orderBy(asc(measurements.recordedAt))
    .limit(QUEUE_LIMIT);
  return rows.map(({ blockId, side, revision, operationNumber, operationTitle, key, valueSi, planned, recordedAt, ...job }) => ({
    job: jobOut(job),
    blockId,
    side,
    revision,
    operationNumber,
    operationTitle,
    key,
    valueSi,
    planned,
    recordedAt: recordedAt.toISOString(),
  }));
}

export interface WaitingLog {
  id: string;
  jobId: string;
  jobNumber: string;
  fileName: string;
  revision: number;
  uploadedAt: string;
}

/** Logs read against the revision the job stands on and not yet accepted: the tuner's next correction. */
export async function listWaitingLogs(tuner: Viewer): Promise<WaitingLog[]> {
  const rows = await getDb()
    .select({
      id: tuningLogs.id,
      jobId: jobs.id,
      jobNumber: jobs.number,
      fileName: tuningLogs.fileName,
      revision: tuningLogs.revisionNumber,
      uploadedAt: tuningLogs.uploadedAt,
    })
    .from(tuningLogs)
    .innerJoin(jobs, and(eq(jobs.id, tuningLogs.jobId), eq(jobs.currentRevision, tuningLogs.revisionNumber)))
    .where(and(isNull(tuningLogs.acceptedAt), eq(jobs.tunerId, tuner.id)))
    .orderBy(asc(tuningLogs.uploadedAt))
    .limit(QUEUE_LIMIT);
  return rows.map((r) => ({ ...r, uploadedAt: r.uploadedAt.toISOString() }));
}

export interface BenchBlock {
  blockId: string;
  side: "primary" | "secondary";
  revision: number;
  job: QueueJob;
  operations: number;
  signed: number;
}

/** Every block of the current revision of released work, with how many of its operations are signed. */
export async function listBenchBlocks(): Promise<BenchBlock[]> {
  const rows = await getDb()
    .select({
      ...jobColumns,
      blockId: meteringBlocks.id,
      side: meteringBlocks.side,
      revision: planRevisions.number,
      operations: count(operations.id),
      signed: count(signOffs.id),
    })
    .from(operations)
    .innerJoin(planRevisions, and(eq(planRevisions.id, operations.revisionId), eq(planRevisions.status, "current")))
    .innerJoin(jobs, eq(jobs.id, planRevisions.jobId))
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .innerJoin(meteringBlocks, eq(meteringBlocks.id, operations.blockId))
    .leftJoin(signOffs, eq(signOffs.operationId, operations.id))
    .where(inArray(jobs.state, ["released", "machining"]))
    .groupBy(jobs.id, customers.name, meteringBlocks.id, planRevisions.number)
    .orderBy(asc(jobs.updatedAt), asc(meteringBlocks.side))
    .limit(QUEUE_LIMIT * 2);
  return rows.map(({ blockId, side, revision, operations: total, signed, ...job }) => ({
    blockId,
    side,
    revision,
    job: jobOut(job),
    operations: Number(total),
    signed: Number(signed),
  }));
}

export interface SignedWork {
  operationId: string;
  operationNumber: number;
  operationTitle: string;
  blockId: string;
  side: "primary" | "secondary";
  revision: number;
  jobNumber: string;
  signedAt: string;
}

/** What this person signed lately, newest first, on jobs the bench still sees. */
export async function listRecentSignOffs(viewer: Viewer, limit = 10): Promise<SignedWork[]> {
  const rows = await getDb()
    .select({
      operationId: operations.id,
      operationNumber: operations.number,
      operationTitle: operations.title,
      blockId: meteringBlocks.id,
      side: meteringBlocks.side,
      revision: planRevisions.number,
      jobNumber: jobs.number,
      signedAt: signOffs.signedAt,
    })
    .from(signOffs)
    .innerJoin(operations, eq(operations.id, signOffs.operationId))
    .innerJoin(planRevisions, eq(planRevisions.id, operations.revisionId))
    .innerJoin(jobs, eq(jobs.id, planRevisions.jobId))
    .innerJoin(meteringBlocks, eq(meteringBlocks.id, operations.blockId))
    // A job sent back to draft (a correction from a log) leaves the bench's sight: its links would answer 404.
    .where(and(eq(signOffs.userId, viewer.id), visibleJobsWhere(viewer)))
    .orderBy(desc(signOffs.signedAt))
    .limit(limit);
  return rows.map((r) => ({ ...r, signedAt: r.signedAt.toISOString() }));
}

/** How many jobs changed in the window, by the state they stand in now. */
export async function countJobsChangedSince(since: Date): Promise<{ state: JobState; jobs: number }[]> {
  const rows = await getDb()
    .select({ state: jobs.state, jobs: count(jobs.id) })
    .from(jobs)
    .where(gte(jobs.updatedAt, since))
    .groupBy(jobs.state);
  return rows.map((r) => ({ state: r.state, jobs: Number(r.jobs) }));
}

/** Open jobs (not yet delivered) that have stood still longest, with who holds them. */
export async function listLongestWaiting(): Promise<(QueueJob & { tuner: string })[]> {
  const rows = await getDb()
    .select({ ...jobColumns, tuner: users.name })
    .from(jobs)
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .innerJoin(users, eq(users.id, jobs.tunerId))
    .where(ne(jobs.state, "delivered"))
    .orderBy(asc(jobs.updatedAt))
    .limit(10);
  return rows.map(({ tuner, ...job }) => ({ ...jobOut(job), tuner }));
}

export interface ShopChange {
  id: number;
  action: string;
  subjectId: string;
  details: unknown;
  actor: string | null;
  at: string;
}

/** The audit trail's changes to people and the drill rack, newest first. */
export async function listShopChanges(limit = QUEUE_LIMIT): Promise<ShopChange[]> {
  const rows = await getDb()
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      subjectId: auditEvents.subjectId,
      details: auditEvents.details,
      actor: users.name,
      at: auditEvents.at,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(or(like(auditEvents.action, "user.%"), eq(auditEvents.subjectType, "drill")))
    .orderBy(desc(auditEvents.at), desc(auditEvents.id))
    .limit(limit);
  return rows.map((r) => ({ ...r, at: r.at.toISOString() }));
}

/** The subject a user change is about, by name (audit rows keep the id). */
export async function namesOfUsers(ids: string[]): Promise<Map<string, string>> {
  const uuids = ids.filter((id) => /^[0-9a-f-]{36}$/i.test(id));
  if (uuids.length === 0) return new Map();
  const rows = await getDb().select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, uuids));
  return new Map(rows.map((r) => [r.id, r.name]));
}
