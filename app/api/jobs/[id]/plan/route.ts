import { getJob } from "@/db/jobs";
import { apiError, invalidInput, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { ALL_ROLES } from "@/lib/auth/session";
import { shownPlanOf } from "@/lib/job-plan-shown";
import { planDto } from "@/lib/plan-dto";
import { parseIdParam } from "@/lib/route-params";

/**
 * The job's plan: solved now for a draft, from the approved snapshot past draft. Machinists see released
 * work only (the job's visibility already hides the rest from them, and a draft is never theirs).
 */
export async function GET(_request: Request, { params }: { params: Promise<{ id: string }> }) {
  const access = await authorize(ALL_ROLES);
  if (!access.ok) return access.response;
  const id = parseIdParam((await params).id);
  if (!id.ok) return invalidInput(id.error);
  try {
    const record = await getJob(access.user, id.id);
    if (!record || (access.user.role === "machinist" && record.job.state === "draft")) return apiError(404, "not_found", "No such job.");
    const shown = await shownPlanOf(record);
    if (!shown) return apiError(404, "not_found", "This job has no plan yet.");
    return Response.json({ plan: planDto(shown.plan, shown.blocks, shown.revision) });
  } catch (error) {
    return refusalResponse(error);
  }
}
