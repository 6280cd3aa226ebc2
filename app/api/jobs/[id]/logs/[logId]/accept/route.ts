import { z } from "zod";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { apiRoute } from "@/lib/http/api-route";
import { idParams } from "@/lib/http/route-params";
import { acceptLogCorrections } from "@/lib/tuning/logs";

const acceptSchema = z.object({
  stageIds: z
    .array(z.uuid({ error: "each stage id must be an id" }), { error: "stageIds must be a list of stage ids" })
    .min(1, { error: "accept at least one correction" })
    .max(32, { error: "at most 32 stages" })
    .refine((ids) => new Set(ids).size === ids.length, { error: "a stage is named twice" }),
});

/** Accepts some or all of a log's corrections into the job's next revision (the job returns to draft for approval). */
export const POST = apiRoute({ roles: OFFICE_ROLES, params: idParams("id", "logId"), body: acceptSchema }, async ({ user, params, body }) => {
  const { revision } = await acceptLogCorrections(user, { jobId: params.id, logId: params.logId, stageIds: body.stageIds });
  return Response.json({ revision: { number: revision } }, { status: 201 });
});
