import "server-only";
import { RequestRefusal } from "@/db/refusal";
import type { Viewer } from "@/db/visibility";
import { changeJobState } from "@/db/revisions";
import { sendConversionRecord } from "@/lib/delivery/send-record";
import { approveRevision } from "./approve";
import { revisionOffRackDrills, type MoveWarning } from "./drill-rack-check";
import { queueReleaseTravelers } from "./release-travelers";
import type { JobState } from "@/db/job-states";

/**
 * Moves a job to another state (the one way pages and the API do it) and sends what the move calls for:
 * a release queues the block travelers of the released revision, which the worker renders and mails to every
 * active machinist (release-travelers.ts). A release goes ahead when a drill the revision uses has left the rack
 * since approval, and answers with a warning for each.
 */
export async function moveJob(
  actor: Viewer,
  jobId: string,
  to: JobState,
  options: { acknowledgeWarnings?: boolean | undefined; handedTo?: string | undefined } = {},
): Promise<{ state: JobState; revision: number; warnings: MoveWarning[]; recordMailedTo?: string | null }> {
  // Reopening a verified job lets signed readings be corrected again: an admin's call, not the tuner's.
  if (to === "machining" && actor.role !== "admin") throw new RequestRefusal(403, "Only an admin reopens a verified job for corrections.", "to");
  const moved =
    to === "planned" ? { state: to, ...(await approveRevision(actor, jobId, options)) } : await changeJobState(actor, jobId, to, { handedTo: options.handedTo });
  if (moved.state === "delivered") return { ...moved, warnings: [], recordMailedTo: await sendConversionRecord(actor, jobId) };
  if (moved.state !== "released") return { ...moved, warnings: [] };
  const warnings = await revisionOffRackDrills(jobId, moved.revision);
  await queueReleaseTravelers(actor, jobId, moved.revision);
  return { ...moved, warnings };
}
