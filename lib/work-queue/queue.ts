import "server-only";
import { JOB_STATES, JOB_STATE_LABELS } from "@/db/job-states";
import { RequestRefusal } from "@/db/refusal";
import type { Viewer } from "@/db/visibility";
import {
  countJobsChangedSince,
  listBenchBlocks,
  listFailedReadings,
  listLongestWaiting,
  listRecentSignOffs,
  listShopChanges,
  listTunerJobsIn,
  listWaitingLogs,
  namesOfUsers,
  type FailedReading,
  type QueueJob,
} from "@/db/work-queue";
import type { PlannedMeasurement } from "@/lib/engineering/conversion-plan";
import { benchPath } from "@/lib/bench/url";
import { formatMeasurement, formatRange } from "@/lib/format/measurement";
import { solveJob } from "@/lib/jobs/approve";
import { shopTimeZone } from "@/lib/server/env";
import type { AdminQueue, DraftItem, HeldItem, MachinistQueue, PlanWarningItem, QueueJobItem, TunerQueue, WorkQueue } from "./types";

/** Drafts solved for warnings on each read: solving runs the staging search, so only the newest few. */
export const DRAFTS_SOLVED = 5;

const WEEK_MS = 7 * 24 * 60 * 60 * 1000;

function jobItem(job: QueueJob): QueueJobItem {
  return { ...job, href: `/jobs/${job.id}` };
}

/** The home page's queue for the person asking: what is theirs to do next. */
export async function workQueueFor(viewer: Viewer): Promise<WorkQueue> {
  if (viewer.role === "tuner") return tunerQueue(viewer);
  if (viewer.role === "machinist") return machinistQueue(viewer);
  return adminQueue(new Date());
}

async function tunerQueue(viewer: Viewer): Promise<TunerQueue> {
  const [drafts, failed, verified, logs] = await Promise.all([
    listTunerJobsIn(viewer, "draft"),
    listFailedReadings(viewer),
    listTunerJobsIn(viewer, "verified"),
    listWaitingLogs(viewer),
  ]);
  const newest = [...drafts].sort((a, b) => b.updatedAt.localeCompare(a.updatedAt)).slice(0, DRAFTS_SOLVED);
  const problems = new Map<string, string>();
  const planWarnings: PlanWarningItem[] = [];
  for (const job of newest) {
    try {
      const plan = await solveJob(job.id);
      const serious = plan.warnings.filter((w) => w.level === "danger" || w.level === "warning");
      if (serious.length) {
        planWarnings.push({
          job: jobItem(job),
          // Danger first: it is the one approval refuses without an acknowledgement.
          warnings: serious
            .map((w) => ({ level: w.level as "danger" | "warning", message: w.message }))
            .sort((a, b) => (a.level === b.level ? 0 : a.level === "danger" ? -1 : 1)),
        });
      }
    } catch (error) {
      if (!(error instanceof RequestRefusal)) throw error;
      problems.set(job.id, error.message);
    }
  }
  return {
    role: "tuner",
    timeZone: shopTimeZone(),
    drafts: drafts.map((job): DraftItem => ({ ...jobItem(job), problem: problems.get(job.id) ?? null })),
    draftsChecked: newest.length,
    planWarnings,
    held: failed.map(heldItem),
    toDeliver: verified.map(jobItem),
    logs: logs.map((log) => ({ ...log, href: `/jobs/${log.jobId}/logs/${log.id}` })),
  };
}

function heldItem(row: FailedReading): HeldItem {
  const plannedList = Array.isArray(row.planned) ? (row.planned as PlannedMeasurement[]) : [];
  const planned = plannedList.find((m) => m.key === row.key);
  return {
    job: jobItem(row.job),
    side: row.side,
    revision: row.revision,
    operation: `${row.operationNumber} ${row.operationTitle}`,
    reading: planned ? `${planned.label}: ${formatMeasurement(planned.quantity, row.valueSi)}` : `${row.key}: ${row.valueSi}`,
    planned: planned ? formatRange(planned) : "not in the plan",
    recordedAt: row.recordedAt,
    benchHref: benchPath(row.blockId, row.revision),
  };
}

async function machinistQueue(viewer: Viewer): Promise<MachinistQueue> {
  const [blocks, recent] = await Promise.all([listBenchBlocks(), listRecentSignOffs(viewer)]);
  const items = blocks.map((b) => ({
    href: benchPath(b.blockId, b.revision),
    jobNumber: b.job.number,
    customer: b.job.customer,
    carburetor: b.job.carburetor,
    side: b.side,
    revision: b.revision,
    operations: b.operations,
    operationsLeft: b.operations - b.signed,
    signed: b.signed,
  }));
  const strip = ({ signed: _signed, ...item }: (typeof items)[number]) => item;
  return {
    role: "machinist",
    timeZone: shopTimeZone(),
    notStarted: items.filter((i) => i.signed === 0).map(strip),
    inProgress: items.filter((i) => i.signed > 0 && i.operationsLeft > 0).map(strip),
    recent: recent.map((s) => ({
      operationId: s.operationId,
      operation: `${s.operationNumber} ${s.operationTitle}`,
      jobNumber: s.jobNumber,
      side: s.side,
      revision: s.revision,
      signedAt: s.signedAt,
      href: benchPath(s.blockId, s.revision),
    })),
  };
}

async function adminQueue(now: Date): Promise<AdminQueue> {
  const since = new Date(now.getTime() - WEEK_MS);
  const [counts, waiting, changes] = await Promise.all([countJobsChangedSince(since), listLongestWaiting(), listShopChanges()]);
  const names = await namesOfUsers(changes.filter((c) => c.action.startsWith("user.")).map((c) => c.subjectId));
  return {
    role: "admin",
    timeZone: shopTimeZone(),
    since: since.toISOString(),
    byState: JOB_STATES.map((state) => ({ state, label: JOB_STATE_LABELS[state].label, jobs: counts.find((c) => c.state === state)?.jobs ?? 0 })),
    longestWaiting: waiting.map(({ tuner, ...job }) => ({ ...jobItem(job), tuner })),
    changes: changes.map((c) => ({ id: c.id, at: c.at, actor: c.actor, what: describeChange(c.action, names.get(c.subjectId) ?? "a removed user", c.subjectId, c.details) })),
  };
}

/** One audit row in words. Users are named (the row keeps their id); drills by their label. */
export function describeChange(action: string, userName: string, subjectId: string, details: unknown): string {
  const d = (details ?? {}) as Record<string, unknown>;
  switch (action) {
    case "user.create":
      return `Added ${userName} as ${String(d.role)}`;
    case "user.update":
      return `Changed ${userName}: ${String(d.role)}, ${d.active === false ? "deactivated" : "active"}`;
    case "user.password":
      return `Password of ${userName} changed`;
    case "user.password-reset-sent":
      return `Sent ${userName} a password reset link`;
    case "drill.stock":
      return `Put drill ${subjectId} on the rack`;
    case "drill.unstock":
      return `Took drill ${subjectId} off the rack`;
    case "drill.stock-system":
      return `Put every ${subjectId} drill on the rack (${String(d.count)})`;
    case "drill.unstock-system":
      return `Took every ${subjectId} drill off the rack (${String(d.count)})`;
    default:
      return `${action} ${subjectId}`;
  }
}
