import { z } from "zod";
import { getJob, saveJobBlocks, updateJob } from "@/db/jobs";
import { apiError, apiRoute, invalidInput } from "@/lib/http/api-route";
import { ALL_ROLES, OFFICE_ROLES } from "@/lib/auth/session";
import { blockColumns, jobColumns } from "@/lib/jobs/input";
import { idParams } from "@/lib/http/route-params";
import { jobBlocksSchema, jobFieldsSchema, requireOneAmbient } from "@/lib/jobs/schema";
import { jobDto } from "./job-dto";

export const GET = apiRoute({ roles: ALL_ROLES, params: idParams("id") }, async ({ user, params }) => {
  const record = await getJob(user, params.id);
  if (!record) return apiError(404, "not_found", "No such job.");
  return Response.json({ job: jobDto(record) });
});

const patchSchema = jobFieldsSchema
  .partial()
  .extend({
    tunerId: z.uuid({ error: "tunerId must be a user's id" }).optional(),
    customerId: z.uuid({ error: "customerId must be a customer's id" }).optional(),
    blocks: z.unknown().optional(),
  })
  .strict()
  .superRefine(requireOneAmbient);

/** Changes the job's inputs (and, with `blocks`, replaces its blocks and stages). Sends an approved job back to draft. */
export const PATCH = apiRoute({ roles: OFFICE_ROLES, params: idParams("id"), body: patchSchema }, async ({ user, params, body }) => {
  const { blocks, tunerId, customerId, ...fields } = body;
  const checkedBlocks = blocks === undefined ? undefined : jobBlocksSchema.safeParse({ blocks });
  if (checkedBlocks && !checkedBlocks.success) return invalidInput(checkedBlocks.error);
  const existing = await getJob(user, params.id);
  if (!existing) return apiError(404, "not_found", "No such job.");
  if (checkedBlocks?.success) await saveJobBlocks(user, params.id, blockColumns(checkedBlocks.data));
  const columns = jobColumns(fields);
  if (Object.keys(columns).length || tunerId || customerId) {
    await updateJob(user, params.id, { fields: columns, tunerId, customerId });
  }
  const record = await getJob(user, params.id);
  return Response.json({ job: jobDto(record!) });
});
