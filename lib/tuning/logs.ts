import "server-only";
import { randomUUID } from "node:crypto";
import { Readable } from "node:stream";
import { z } from "zod";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { fuelProperties } from "@/lib/engineering/fuels";
import { restrictionDrillLimits } from "@/lib/engineering/restriction-limits";
import { DEFAULT_FULL_THROTTLE_ABOVE_PCT } from "@/lib/engineering/steady-readings";
import { DEFAULT_BIN_WIDTH_PA } from "@/lib/engineering/log-bins";
import { listStockedDrills } from "@/db/drill-stock";
import { getJob } from "@/db/jobs";
import type { JobState } from "@/db/job-states";
import { RequestRefusal } from "@/db/refusal";
import { getRevisionSnapshot } from "@/db/revisions";
import { getLogSettings, getShopSettings } from "@/db/shop-settings";
import { acceptTuningLog, findLogMapping, getTuningLog, insertTuningLog, rememberLogMapping, type StageInputChange } from "@/db/tuning-logs";
import type { Viewer } from "@/db/visibility";
import { fuelSpecOf, snapshotJob, snapshotPlan } from "@/lib/jobs/plan";
import { deleteObject, putObject } from "@/lib/server/storage";
import { analyseLog, type LogAnalysis } from "./log-analysis";
import { columnIndex, LOG_PRESSURE_UNITS, previewLog, readLog, type LogMapping, type LogPreview } from "./log-csv";

/** Logs of a few hundred thousand rows are a few MB; anything far larger is not a wideband log. */
export const MAX_LOG_BYTES = 32 * 1024 * 1024;
const REJECTED_KEPT = 1000;
/** A log is read against a revision that reached the engine: released or later, not while the plan is being revised. */
export const LOGGABLE_STATES: readonly JobState[] = ["released", "machining", "verified", "delivered"];

export const logMappingSchema = z.object({
  pressure: z.object({
    column: z.string({ error: "mapping.pressure.column: choose the manifold pressure column" }).min(1, { error: "choose the manifold pressure column" }),
    unit: z.enum(LOG_PRESSURE_UNITS, { error: `unit must be one of ${LOG_PRESSURE_UNITS.join(", ")}` }),
    reference: z.enum(["absolute", "gauge"], { error: 'reference must be "absolute" or "gauge"' }),
  }),
  mixture: z.object({
    column: z.string({ error: "choose the mixture column" }).min(1, { error: "choose the mixture column" }),
    kind: z.enum(["lambda", "afr"], { error: 'kind must be "lambda" or "afr"' }),
    scale: z.enum(["fuel", "gasoline"], { error: 'scale must be "fuel" or "gasoline"' }).optional(),
  }),
  rpm: z.object({ column: z.string().min(1, { error: "choose the rpm column, or leave it out" }) }).optional(),
  throttle: z.object({ column: z.string().min(1, { error: "choose the throttle column, or leave it out" }) }).optional(),
  time: z.object({ column: z.string().min(1, { error: "choose the time column, or leave it out" }) }).optional(),
  coolant: z
    .object({
      column: z.string().min(1, { error: "choose the coolant temperature column, or leave it out" }),
      unit: z.enum(["°C", "°F"], { error: 'unit must be "°C" or "°F"' }),
    })
    .optional(),
}).refine((m) => m.mixture.kind !== "afr" || m.mixture.scale !== undefined, {
  error: 'say whether the AFR is on the fuel\'s own scale ("fuel") or gasoline-scaled ("gasoline")',
  path: ["mixture", "scale"],
});

/** The header as the remembered-mapping key: the columns as written, in order. */
export function headerKey(headers: readonly string[]): string {
  return headers.map((h) => h.trim()).join("\u001f");
}

/** Reads the job a log belongs to: visible, past approval, with the revision the engine ran on. */
async function loggableJob(viewer: Viewer, jobId: string) {
  const record = await getJob(viewer, jobId);
  if (!record) throw new RequestRefusal(404, "No such job.");
  if (!LOGGABLE_STATES.includes(record.job.state) || record.job.currentRevision === 0) {
    throw new RequestRefusal(409, `A ${record.job.state} job has no revision on the engine yet: logs are read once a revision is released.`, "file");
  }
  return record;
}

function previewOf(bytes: Buffer): LogPreview {
  try {
    return previewLog(bytes.subarray(0, 64 * 1024).toString("utf8"));
  } catch (error) {
    if (error instanceof RangeError) throw new RequestRefusal(400, error.message.replace(/^file: /, ""), "file");
    throw error;
  }
}

/** The file's columns and first rows for the mapping step, with the mapping used last for the same header. */
export async function previewTuningLog(viewer: Viewer, jobId: string, bytes: Buffer): Promise<LogPreview & { remembered: LogMapping | null }> {
  await loggableJob(viewer, jobId);
  const preview = previewOf(bytes);
  const stored = logMappingSchema.safeParse(await findLogMapping(headerKey(preview.headers)));
  return { ...preview, remembered: stored.success ? stored.data : null };
}

export interface UploadedLog {
  id: string;
  rows: number;
  used: number;
  setAside: number;
  rejected: { line: number; reason: string }[];
}

/**
 * Reads a log against the revision the engine ran on: the rows (refused ones listed by line), the steady
 * readings binned and judged, the corrections; keeps the file in the object store and the analysis with it,
 * and remembers the mapping for the next file with the same header.
 */
export async function uploadTuningLog(viewer: Viewer, input: { jobId: string; fileName: string; bytes: Buffer; mapping: LogMapping }): Promise<UploadedLog> {
  const { job } = await loggableJob(viewer, input.jobId);
  const preview = previewOf(input.bytes);
  try {
    columnIndex(preview.headers, input.mapping);
  } catch (error) {
    if (error instanceof RangeError) throw new RequestRefusal(400, error.message.replace(/^mapping\.[a-z]+\.column: /, ""), error.message.split(":")[0]);
    throw error;
  }
  const read = await readLog(Readable.from([input.bytes]), preview, input.mapping);
  if (read.rows.length === 0) throw new RequestRefusal(400, `no row of the log could be read (${read.rejected.length} refused)`, "file");

  const revision = await getRevisionSnapshot(job.id, job.currentRevision);
  if (!revision) throw new RequestRefusal(409, "The job's current revision is missing.", "file");
  const ranJob = snapshotJob(revision.snapshot.job);
  const plan = snapshotPlan(revision.snapshot);
  const [stocked, shop, settings] = await Promise.all([
    listStockedDrills(),
    getShopSettings(),
    getLogSettings({ fullThrottleAbovePct: DEFAULT_FULL_THROTTLE_ABOVE_PCT, binWidthPa: DEFAULT_BIN_WIDTH_PA }),
  ]);
  const ambientPa = ranJob.ambientPressurePa;
  // Without a throttle column, a reading under vacuum is taken as part throttle and the rest as full throttle.
  const rows = input.mapping.throttle
    ? read.rows
    : read.rows.map((r) => {
        const gauge = r.manifold.reference === "gauge" ? r.manifold.pa : r.manifold.pa - ambientPa;
        return { ...r, throttlePct: gauge < 0 ? 0 : 100 };
      });
  let analysis: LogAnalysis;
  let readingRejects: { line: number; reason: string }[];
  try {
    const fuel = fuelProperties(fuelSpecOf(ranJob));
    ({ analysis, rejected: readingRejects } = analyseLog({
      rows,
      plan,
      blocks: revision.snapshot.blocks,
      ambientPa,
      fuelStoichAfr: fuel.stoichAfr,
      drills: ranJob.useAllDrills ? ALL_DRILLS : stocked,
      limits: restrictionDrillLimits({ system: ranJob.drillSystem, smallestDrillLabel: shop.smallestRestrictionDrill, largestDrillLabel: shop.largestRestrictionDrill }),
      minWebM: shop.minWebM,
      settings: { fullThrottleAbovePct: settings.fullThrottleAbovePct, binWidthPa: settings.binWidthPa },
    }));
  } catch (error) {
    if (error instanceof RangeError) throw new RequestRefusal(422, `the log cannot be analysed: ${error.message}`, "file");
    throw error;
  }
  const rejected = [...read.rejected, ...readingRejects].sort((a, b) => a.line - b.line);
  const setAside = analysis.counts.setAside.fastThrottle + analysis.counts.setAside.cold;
  const used = analysis.counts.used;

  const storageKey = `logs/${job.id}/${randomUUID()}.csv`;
  await putObject(storageKey, input.bytes, "text/csv");
  try {
    const { id } = await insertTuningLog({
      jobId: job.id,
      revisionNumber: job.currentRevision,
      fileName: input.fileName.slice(0, 200),
      storageKey,
      byteSize: input.bytes.length,
      mapping: input.mapping,
      totalRows: read.totalRows,
      usedRows: used,
      setAside: { ...analysis.counts.setAside, blank: read.skipped.blank, repeated: read.skipped.repeated },
      rejected: rejected.slice(0, REJECTED_KEPT),
      rejectedCount: rejected.length,
      analysis,
      uploadedById: viewer.id,
    });
    await rememberLogMapping(headerKey(preview.headers), input.mapping);
    return { id, rows: read.totalRows, used, setAside, rejected };
  } catch (error) {
    await deleteObject(storageKey).catch(() => undefined);
    throw error;
  }
}

/** A log of a visible job with its stored analysis. */
export async function getLogAnalysis(viewer: Viewer, jobId: string, logId: string) {
  const record = await getJob(viewer, jobId);
  if (!record) throw new RequestRefusal(404, "No such job.");
  const log = await getTuningLog(jobId, logId);
  if (!log) throw new RequestRefusal(404, "No such log for this job.", "logId");
  return { record, log, analysis: log.analysis as LogAnalysis };
}

/**
 * Accepts some or all of a log's corrections: each accepted stage gets the measured area with the proposed
 * layout (or its opening moved), the job goes back to draft, and the next approval is the revision they go into.
 */
export async function acceptLogCorrections(viewer: Viewer, input: { jobId: string; logId: string; stageIds: string[] }): Promise<{ revision: number }> {
  const { record, analysis } = await getLogAnalysis(viewer, input.jobId, input.logId);
  if (record.job.state === "draft" || record.job.state === "planned") {
    throw new RequestRefusal(409, `The job is ${record.job.state}: approve or release it, or finish the draft, before accepting more corrections.`, "stageIds");
  }
  return acceptTuningLog(viewer, input, (job, log) => {
    if (job.currentRevision !== log.revisionNumber) {
      throw new RequestRefusal(409, `The log was read on revision ${log.revisionNumber}; the job is at revision ${job.currentRevision}. Read a new log.`, "logId");
    }
    const stages: StageInputChange[] = [];
    const changes = [];
    for (const [i, stageId] of input.stageIds.entries()) {
      const correction = analysis.corrections.find((c) => c.stageId === stageId);
      if (!correction) throw new RequestRefusal(400, `no correction for stage ${stageId} in this log`, `stageIds.${i}`);
      if (!correction.changes) throw new RequestRefusal(400, `${correction.change}: nothing to change`, `stageIds.${i}`);
      stages.push({
        stageId,
        area: correction.opening === null && correction.layout
          ? { targetAreaM2: correction.proposedAreaM2, count: correction.layout.count, drillLabel: correction.layout.drill.label }
          : undefined,
        opening: correction.opening
          ? correction.opening.proposedGaugePa < 0
            ? { vacuumRatingPa: -correction.opening.proposedGaugePa }
            : { setpointPa: correction.opening.proposedGaugePa }
          : undefined,
      });
      changes.push({ stageId, side: correction.side, change: correction.change });
    }
    return { stages, changes };
  });
}
