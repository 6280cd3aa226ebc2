import { z } from "zod";
import { apiRoute, invalidInput } from "@/lib/http/api-route";
import { ALL_ROLES } from "@/lib/auth/session";
import { signOffFromBench } from "@/lib/bench/sign-off";
import { idParams } from "@/lib/http/route-params";
import { signOffSchema } from "@/lib/bench/sign-off-schema";

const bodySchema = z.record(z.string(), z.unknown(), { error: "(body) must be a JSON object" });

/**
 * Signs an operation off with its readings: { readings: [{ key, value, unit }], note }. Answers 201 when
 * recorded, 200 when it was already signed (nothing recorded twice), 409 for a superseded revision.
 */
export const POST = apiRoute({ roles: ALL_ROLES, params: idParams("id"), body: bodySchema }, async ({ user, params, body }) => {
  const parsed = signOffSchema.safeParse({ ...body, operationId: params.id });
  if (!parsed.success) return invalidInput(parsed.error);
  const outcome = await signOffFromBench(user, parsed.data);
  return Response.json(
    { recorded: outcome.recorded, jobState: outcome.jobState, failed: outcome.failed, allSigned: outcome.allSigned },
    { status: outcome.recorded ? 201 : 200 },
  );
});
