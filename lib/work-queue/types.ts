// What GET /api/work-queue answers: one queue per role, already shaped for the home page (client-safe types).
import type { JobState } from "@/db/job-states";

export interface QueueJobItem {
  id: string;
  number: string;
  customer: string;
  carburetor: string;
  state: JobState;
  updatedAt: string;
  href: string;
}

export interface DraftItem extends QueueJobItem {
  /** Why the draft cannot be solved yet (no blocks, an empty rack), when it cannot. */
  problem: string | null;
}

export interface PlanWarningItem {
  job: QueueJobItem;
  warnings: { level: "danger" | "warning"; message: string }[];
}

export interface HeldItem {
  job: QueueJobItem;
  side: "primary" | "secondary";
  revision: number;
  operation: string;
  /** The reading as recorded and the band it had to fall in, in the shop's units. */
  reading: string;
  planned: string;
  recordedAt: string;
  benchHref: string;
}

export interface LogItem {
  id: string;
  jobNumber: string;
  fileName: string;
  revision: number;
  uploadedAt: string;
  href: string;
}

export interface TunerQueue {
  role: "tuner";
  timeZone: string;
  drafts: DraftItem[];
  /** How many of the drafts were solved for warnings (the newest few: solving is costly). */
  draftsChecked: number;
  planWarnings: PlanWarningItem[];
  held: HeldItem[];
  toDeliver: QueueJobItem[];
  logs: LogItem[];
}

export interface BenchItem {
  href: string;
  jobNumber: string;
  customer: string;
  carburetor: string;
  side: "primary" | "secondary";
  revision: number;
  operations: number;
  operationsLeft: number;
}

export interface SignedItem {
  operationId: string;
  operation: string;
  jobNumber: string;
  side: "primary" | "secondary";
  revision: number;
  signedAt: string;
  href: string;
}

export interface MachinistQueue {
  role: "machinist";
  timeZone: string;
  notStarted: BenchItem[];
  inProgress: BenchItem[];
  recent: SignedItem[];
}

export interface AdminQueue {
  role: "admin";
  timeZone: string;
  /** The start of the window "this week" counts from (seven days back). */
  since: string;
  byState: { state: JobState; label: string; jobs: number }[];
  longestWaiting: (QueueJobItem & { tuner: string })[];
  changes: { id: number; at: string; actor: string | null; what: string }[];
}

export type WorkQueue = TunerQueue | MachinistQueue | AdminQueue;
