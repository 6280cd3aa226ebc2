import { z } from "zod";
import { apiRoute, invalidInput } from "@/lib/http/api-route";
import { ALL_ROLES } from "@/lib/auth/session";
import { amendFromBench, signOffFromBench } from "@/lib/bench/sign-off";
import { idParams } from "@/lib/http/route-params";
import { amendSignOffSchema, signOffSchema } from "@/lib/bench/sign-off-schema";

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

/**
 * Corrects a signed operation's readings: { readings: [{ key, value, unit }], reason }. The signer or an admin;
 * the earlier readings stay in the record. Answers the job's state after the correction (a corrected failure can
 * complete the job); 409 once the job is verified, until an admin reopens it.
 */
export const PATCH = apiRoute({ roles: ALL_ROLES, params: idParams("id"), body: bodySchema }, async ({ user, params, body }) => {
  const parsed = amendSignOffSchema.safeParse({ ...body, operationId: params.id });
  if (!parsed.success) return invalidInput(parsed.error);
  const outcome = await amendFromBench(user, parsed.data);
  return Response.json({
    jobState: outcome.jobState,
    verified: outcome.verified,
    amended: outcome.amended.map((a) => ({ key: a.key, previousSi: a.previousSi, valueSi: a.valueSi, passed: a.passed })),
    failed: outcome.failed,
  });
});
