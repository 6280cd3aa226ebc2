import "server-only";
import { and, asc, desc, eq } from "drizzle-orm";
import { RequestRefusal } from "@/db/refusal";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { lockJob, touchForEdit } from "./jobs";
import { enrichmentStages, logMappings, meteringBlocks, tuningLogs, users, type Job, type TuningLog } from "./schema";
import type { Viewer } from "./visibility";

export type NewTuningLog = Omit<typeof tuningLogs.$inferInsert, "id" | "uploadedAt" | "acceptedById" | "acceptedAt" | "acceptedChanges" | "nextRevisionNumber">;

export async function insertTuningLog(values: NewTuningLog): Promise<{ id: string }> {
  return getDb().transaction(async (tx) => {
    const [row] = await tx.insert(tuningLogs).values(values).returning({ id: tuningLogs.id });
    await recordAudit(tx, values.uploadedById, "job.log", values.jobId, { logId: row!.id, file: values.fileName, rows: values.totalRows });
    return row!;
  });
}

/** One log of one job (undefined when the job has no such log). */
export async function getTuningLog(jobId: string, logId: string): Promise<TuningLog | undefined> {
  const [row] = await getDb()
    .select()
    .from(tuningLogs)
    .where(and(eq(tuningLogs.jobId, jobId), eq(tuningLogs.id, logId)));
  return row;
}

export interface TuningLogSummary {
  id: string;
  fileName: string;
  revisionNumber: number;
  totalRows: number;
  usedRows: number;
  rejectedCount: number;
  uploadedAt: Date;
  uploadedBy: string;
  acceptedAt: Date | null;
  acceptedChanges: AcceptedChange[] | null;
  nextRevisionNumber: number | null;
}

/** A correction as accepted: the stage and the change as the machinist reads it. */
export interface AcceptedChange {
  stageId: string;
  side: string;
  change: string;
}

/** The job's logs, newest first. */
export async function listTuningLogs(jobId: string): Promise<TuningLogSummary[]> {
  const rows = await getDb()
    .select({
      id: tuningLogs.id,
      fileName: tuningLogs.fileName,
      revisionNumber: tuningLogs.revisionNumber,
      totalRows: tuningLogs.totalRows,
      usedRows: tuningLogs.usedRows,
      rejectedCount: tuningLogs.rejectedCount,
      uploadedAt: tuningLogs.uploadedAt,
      uploadedBy: users.name,
      acceptedAt: tuningLogs.acceptedAt,
      acceptedChanges: tuningLogs.acceptedChanges,
      nextRevisionNumber: tuningLogs.nextRevisionNumber,
    })
    .from(tuningLogs)
    .innerJoin(users, eq(users.id, tuningLogs.uploadedById))
    .where(eq(tuningLogs.jobId, jobId))
    .orderBy(desc(tuningLogs.uploadedAt));
  return rows.map((r) => ({ ...r, acceptedChanges: r.acceptedChanges as AcceptedChange[] | null }));
}

/** The changes accepted from logs into one revision of the job, in the order they were accepted. */
export async function listChangesInto(jobId: string, revisionNumber: number): Promise<{ logId: string; fileName: string; fromRevision: number; changes: AcceptedChange[] }[]> {
  const rows = await getDb()
    .select({ logId: tuningLogs.id, fileName: tuningLogs.fileName, fromRevision: tuningLogs.revisionNumber, changes: tuningLogs.acceptedChanges })
    .from(tuningLogs)
    .where(and(eq(tuningLogs.jobId, jobId), eq(tuningLogs.nextRevisionNumber, revisionNumber)))
    .orderBy(asc(tuningLogs.acceptedAt));
  return rows.map((r) => ({ ...r, changes: (r.changes as AcceptedChange[] | null) ?? [] }));
}

/** The mapping the shop last used for a file with this header. */
export async function findLogMapping(header: string): Promise<unknown> {
  const [row] = await getDb().select({ mapping: logMappings.mapping }).from(logMappings).where(eq(logMappings.header, header));
  return row?.mapping;
}

export async function rememberLogMapping(header: string, mapping: unknown): Promise<void> {
  await getDb()
    .insert(logMappings)
    .values({ header, mapping, updatedAt: new Date() })
    .onConflictDoUpdate({ target: logMappings.header, set: { mapping, updatedAt: new Date() } });
}

/** What accepting writes into one stage's inputs. */
export interface StageInputChange {
  stageId: string;
  /** A measured area to build (m²) with the layout that gives it; absent when only the opening moves. */
  area?: { targetAreaM2: number; count: number; drillLabel: string } | undefined;
  opening?: { vacuumRatingPa?: number | undefined; setpointPa?: number | undefined } | undefined;
}

/**
 * Accepts corrections from a log, all or nothing: under the job's lock, `decide` checks the log against the job
 * as it is now (refusing when the job moved on) and says what to write; the stages' inputs change, the log keeps
 * what was accepted and the revision it goes into, and the job goes back to draft (on hold if in machining).
 */
export async function acceptTuningLog(
  actor: Viewer,
  input: { jobId: string; logId: string },
  decide: (job: Job, log: TuningLog) => { stages: StageInputChange[]; changes: AcceptedChange[] },
): Promise<{ revision: number }> {
  return getDb().transaction(async (tx) => {
    const job = await lockJob(tx, input.jobId);
    const [log] = await tx
      .select()
      .from(tuningLogs)
      .where(and(eq(tuningLogs.jobId, input.jobId), eq(tuningLogs.id, input.logId)))
      .for("update");
    if (!log) throw new RequestRefusal(404, "No such log for this job.", "logId");
    if (log.acceptedAt) throw new RequestRefusal(409, "This log's corrections are already accepted.", "logId");
    const { stages, changes } = decide(job, log);
    for (const change of stages) {
      const [stage] = await tx
        .select({ id: enrichmentStages.id })
        .from(enrichmentStages)
        .innerJoin(meteringBlocks, eq(meteringBlocks.id, enrichmentStages.blockId))
        .where(and(eq(enrichmentStages.id, change.stageId), eq(meteringBlocks.jobId, input.jobId)));
      if (!stage) throw new RequestRefusal(409, "A stage of this log is no longer in the job: read a new log.", "stageIds");
      await tx
        .update(enrichmentStages)
        .set({
          ...(change.area
            ? { targetKind: "area" as const, targetFrom: null, targetTo: change.area.targetAreaM2, chosenCount: change.area.count, chosenDrillLabel: change.area.drillLabel }
            : {}),
          ...(change.opening?.vacuumRatingPa !== undefined ? { vacuumRatingPa: change.opening.vacuumRatingPa } : {}),
          ...(change.opening?.setpointPa !== undefined ? { setpointPa: change.opening.setpointPa } : {}),
        })
        .where(eq(enrichmentStages.id, change.stageId));
    }
    const revision = job.currentRevision + 1;
    const now = new Date();
    await tx
      .update(tuningLogs)
      .set({ acceptedById: actor.id, acceptedAt: now, acceptedChanges: changes, nextRevisionNumber: revision })
      .where(eq(tuningLogs.id, log.id));
    // Accepting is the tuner's own confirmation: a job in machining goes on hold, any other back to draft.
    await touchForEdit(tx, job, { confirmHold: true });
    await recordAudit(tx, actor.id, "job.log.accept", input.jobId, { logId: log.id, revision, changes });
    return { revision };
  });
}
