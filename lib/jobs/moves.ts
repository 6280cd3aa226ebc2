import "server-only";
import type { Viewer } from "@/db/visibility";
import { changeJobState } from "@/db/revisions";
import { approveRevision } from "./approve";
import { queueReleaseTravelers } from "./release-travelers";
import type { JobState } from "@/db/job-states";

/**
 * Moves a job to another state (the one way pages and the API do it) and sends what the move calls for:
 * a release queues the block travelers of the released revision, which the worker renders and mails to every
 * active machinist (release-travelers.ts).
 */
export async function moveJob(
  actor: Viewer,
  jobId: string,
  to: JobState,
  options: { acknowledgeWarnings?: boolean | undefined } = {},
): Promise<{ state: JobState; revision: number }> {
  const moved = to === "planned" ? { state: to, ...(await approveRevision(actor, jobId, options)) } : await changeJobState(actor, jobId, to);
  if (moved.state === "released") await queueReleaseTravelers(actor, jobId, moved.revision);
  return moved;
}
