import { getJob } from "@/db/jobs";
import { moveJob } from "@/lib/jobs/moves";
import { apiError, apiRoute } from "@/lib/http/api-route";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { idParams } from "@/lib/http/route-params";
import { jobStateChangeSchema } from "@/lib/jobs/schema";

/** Moves a job to another state; 409 when the move is not allowed from where it is. */
export const POST = apiRoute({ roles: OFFICE_ROLES, params: idParams("id"), body: jobStateChangeSchema }, async ({ user, params, body }) => {
  if (!(await getJob(user, params.id))) return apiError(404, "not_found", "No such job.");
  return Response.json(await moveJob(user, params.id, body.to, { acknowledgeWarnings: body.acknowledgeWarnings, handedTo: body.handedTo }));
});
