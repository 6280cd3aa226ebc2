import { getJob } from "@/db/jobs";
import { moveJob } from "@/lib/job-moves";
import { apiError, invalidInput, readJson, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { parseIdParam } from "@/lib/route-params";
import { jobStateChangeSchema } from "@/app/(office)/jobs/schema";

/** Moves a job to another state; 409 when the move is not allowed from where it is. */
export async function POST(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = parseIdParam((await params).id);
  if (!id.ok) return invalidInput(id.error);
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = jobStateChangeSchema.safeParse(body.value);
  if (!parsed.success) return invalidInput(parsed.error);
  const access = await authorize(OFFICE_ROLES);
  if (!access.ok) return access.response;
  if (!(await getJob(access.user, id.id))) return apiError(404, "not_found", "No such job.");
  try {
    return Response.json(await moveJob(access.user, id.id, parsed.data.to, { acknowledgeWarnings: parsed.data.acknowledgeWarnings }));
  } catch (error) {
    return refusalResponse(error);
  }
}
