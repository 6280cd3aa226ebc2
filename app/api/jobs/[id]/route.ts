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
    /** Required (true) to edit a job the bench is machining: it goes on hold until the next approval. */
    confirmHold: z.boolean({ error: "confirmHold must be true or false" }).optional(),
  })
  .strict()
  .superRefine(requireOneAmbient);

/**
 * Changes the job's inputs (and, with `blocks`, replaces its blocks and stages). Sends an approved job back to
 * draft; a job in machining goes on hold, only with `confirmHold: true` (409 naming it otherwise).
 */
export const PATCH = apiRoute({ roles: OFFICE_ROLES, params: idParams("id"), body: patchSchema }, async ({ user, params, body }) => {
  const { blocks, tunerId, customerId, confirmHold, ...fields } = body;
  const checkedBlocks = blocks === undefined ? undefined : jobBlocksSchema.safeParse({ blocks });
  if (checkedBlocks && !checkedBlocks.success) return invalidInput(checkedBlocks.error);
  const existing = await getJob(user, params.id);
  if (!existing) return apiError(404, "not_found", "No such job.");
  if (checkedBlocks?.success) await saveJobBlocks(user, params.id, blockColumns(checkedBlocks.data), { confirmHold });
  const columns = jobColumns(fields);
  if (Object.keys(columns).length || tunerId || customerId) {
    await updateJob(user, params.id, { fields: columns, tunerId, customerId }, { confirmHold });
  }
  const record = await getJob(user, params.id);
  return Response.json({ job: jobDto(record!) });
});
