import "server-only";
import { getJob } from "@/db/jobs";
import type { Viewer } from "@/db/visibility";
import { RequestRefusal } from "@/db/refusal";
import { parseIdParam } from "@/lib/http/route-params";

/** The job's id when it exists and the viewer may see it; a 404 refusal otherwise. */
export async function requireVisibleJob(viewer: Viewer, jobId: string): Promise<string> {
  const parsed = parseIdParam(jobId);
  if (!parsed.ok || !(await getJob(viewer, parsed.id))) throw new RequestRefusal(404, "No such job.");
  return parsed.id;
}
