import { getJob } from "@/db/jobs";
import { apiError, apiRoute } from "@/lib/http/api-route";
import { ALL_ROLES } from "@/lib/auth/session";
import { shownPlanOf } from "@/lib/jobs/plan-shown";
import { planDto } from "@/lib/jobs/plan-dto";
import { idParams } from "@/lib/http/route-params";

/**
 * The job's plan: solved now for a draft, from the approved snapshot past draft. The job's visibility
 * (db/visibility.ts) answers a hidden job as missing.
 */
export const GET = apiRoute({ roles: ALL_ROLES, params: idParams("id") }, async ({ user, params }) => {
  const record = await getJob(user, params.id);
  if (!record) return apiError(404, "not_found", "No such job.");
  const shown = await shownPlanOf(record);
  if (!shown) return apiError(404, "not_found", "This job has no plan yet.");
  return Response.json({ plan: planDto(shown.plan, shown.blocks, shown.revision) });
});
