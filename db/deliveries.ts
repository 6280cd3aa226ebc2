import "server-only";
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import type { PlannedMeasurement } from "@/lib/engineering/conversion-plan";
import type { JobState } from "./job-states";
import { getDb } from "./client";
import type { BlockRow } from "./jobs";
import { maySeeJob, type Viewer } from "./visibility";
import { customers, deliveries, jobs, measurements, meteringBlocks, operations, planRevisions, users, type Job } from "./schema";

export interface RecordOperation {
  blockId: string;
  number: number;
  kind: string;
  title: string;
  parameters: Record<string, string | number>;
  planned: PlannedMeasurement[];
  measured: { key: string; valueSi: number; passed: boolean }[];
}

/** Everything a customer's conversion record is made of, from the revision the blocks were machined to. */
export interface ConversionRecordRows {
  job: Job;
  customer: { name: string; email: string | null };
  tuner: { name: string; email: string };
  revision: number;
  /** The blocks and their stages as the revision approved them. */
  blocks: BlockRow[];
  operations: RecordOperation[];
  delivery: { handedTo: string; handedOverBy: string; deliveredAt: Date } | null;
}

/**
 * The record of one revision of a job (the current one by default), or undefined when the job or the revision is
 * missing or hidden.
 */
export async function getConversionRecordRows(viewer: Viewer, jobId: string, revisionNumber?: number): Promise<ConversionRecordRows | undefined> {
  const db = getDb();
  const [row] = await db
    .select({ job: jobs, customerName: customers.name, customerEmail: customers.email, tunerName: users.name, tunerEmail: users.email })
    .from(jobs)
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .innerJoin(users, eq(users.id, jobs.tunerId))
    .where(eq(jobs.id, jobId));
  if (!row || !maySeeJob(viewer, row.job.state)) return undefined;
  const [revision] = await db
    .select({ id: planRevisions.id, number: planRevisions.number, snapshot: planRevisions.snapshot })
    .from(planRevisions)
    .where(and(eq(planRevisions.jobId, jobId), eq(planRevisions.number, revisionNumber ?? row.job.currentRevision)));
  if (!revision) return undefined;
  const ops = await db
    .select({
      id: operations.id,
      blockId: operations.blockId,
      number: operations.number,
      kind: operations.kind,
      title: operations.title,
      parameters: operations.parameters,
      planned: operations.measurements,
    })
    .from(operations)
    .innerJoin(meteringBlocks, eq(meteringBlocks.id, operations.blockId))
    .where(eq(operations.revisionId, revision.id))
    .orderBy(asc(meteringBlocks.side), asc(operations.number));
  const readings = ops.length
    ? await db
        .select({ operationId: measurements.operationId, key: measurements.key, valueSi: measurements.valueSi, passed: measurements.passed })
        .from(measurements)
        .where(inArray(measurements.operationId, ops.map((o) => o.id)))
    : [];
  const [delivery] = await db
    .select({ handedTo: deliveries.handedTo, handedOverBy: users.name, deliveredAt: deliveries.deliveredAt })
    .from(deliveries)
    .innerJoin(users, eq(users.id, deliveries.handedOverById))
    .where(and(eq(deliveries.jobId, jobId), eq(deliveries.revisionNumber, revision.number)));
  return {
    job: row.job,
    customer: { name: row.customerName, email: row.customerEmail },
    tuner: { name: row.tunerName, email: row.tunerEmail },
    revision: revision.number,
    blocks: (revision.snapshot as { blocks: BlockRow[] }).blocks,
    operations: ops.map((op) => ({
      blockId: op.blockId,
      number: op.number,
      kind: op.kind,
      title: op.title,
      parameters: op.parameters as Record<string, string | number>,
      planned: op.planned as PlannedMeasurement[],
      measured: readings.filter((r) => r.operationId === op.id).map(({ key, valueSi, passed }) => ({ key, valueSi, passed })),
    })),
    delivery: delivery ?? null,
  };
}

/** Notes where the conversion record of a delivered revision was mailed. */
export async function markRecordMailed(jobId: string, revisionNumber: number, email: string): Promise<void> {
  await getDb()
    .update(deliveries)
    .set({ recordMailedTo: email })
    .where(and(eq(deliveries.jobId, jobId), eq(deliveries.revisionNumber, revisionNumber)));
}

export interface CustomerDelivery {
  revision: number;
  handedTo: string;
  deliveredAt: string;
  recordMailedTo: string | null;
}

export interface CustomerJob {
  id: string;
  number: string;
  state: JobState;
  carburetor: string;
  currentRevision: number;
  /** Every hand-over of the job, newest first (a car that came back is delivered again on a new revision). */
  deliveries: CustomerDelivery[];
}

/** Every job of one customer, newest first, with its hand-overs. */
export async function listCustomerJobs(customerId: string): Promise<CustomerJob[]> {
  const db = getDb();
  const rows = await db
    .select({ id: jobs.id, number: jobs.number, state: jobs.state, carburetor: jobs.carburetor, currentRevision: jobs.currentRevision })
    .from(jobs)
    .where(eq(jobs.customerId, customerId))
    .orderBy(desc(jobs.createdAt));
  const handOvers = rows.length
    ? await db
        .select({
          jobId: deliveries.jobId,
          revision: deliveries.revisionNumber,
          handedTo: deliveries.handedTo,
          deliveredAt: deliveries.deliveredAt,
          recordMailedTo: deliveries.recordMailedTo,
        })
        .from(deliveries)
        .where(inArray(deliveries.jobId, rows.map((r) => r.id)))
        .orderBy(desc(deliveries.revisionNumber))
    : [];
  return rows.map((job) => ({
    ...job,
    deliveries: handOvers
      .filter((d) => d.jobId === job.id)
      .map(({ revision, handedTo, deliveredAt, recordMailedTo }) => ({ revision, handedTo, deliveredAt: deliveredAt.toISOString(), recordMailedTo })),
  }));
}
