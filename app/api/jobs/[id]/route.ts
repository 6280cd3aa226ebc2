import { z } from "zod";
import { getJob, saveJobBlocks, updateJob } from "@/db/jobs";
import { apiError, invalidInput, readJson, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { ALL_ROLES, OFFICE_ROLES } from "@/lib/auth/session";
import { blockColumns, jobColumns } from "@/lib/job-input";
import { parseIdParam } from "@/lib/route-params";
import { jobBlocksSchema, jobFieldsSchema, requireOneAmbient } from "@/app/(office)/jobs/schema";
import { jobDto } from "./job-dto";

type Params = { params: Promise<{ id: string }> };

export async function GET(_request: Request, { params }: Params) {
  const id = parseIdParam((await params).id);
  if (!id.ok) return invalidInput(id.error);
  const access = await authorize(ALL_ROLES);
  if (!access.ok) return access.response;
  const record = await getJob(access.user, id.id);
  if (!record) return apiError(404, "not_found", "No such job.");
  return Response.json({ job: jobDto(record) });
}

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
export async function PATCH(request: Request, { params }: Params) {
  const id = parseIdParam((await params).id);
  if (!id.ok) return invalidInput(id.error);
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = patchSchema.safeParse(body.value);
  if (!parsed.success) return invalidInput(parsed.error);
  const { blocks, tunerId, customerId, ...fields } = parsed.data;
  const checkedBlocks = blocks === undefined ? undefined : jobBlocksSchema.safeParse({ blocks });
  if (checkedBlocks && !checkedBlocks.success) return invalidInput(checkedBlocks.error);
  const access = await authorize(OFFICE_ROLES);
  if (!access.ok) return access.response;
  try {
    const existing = await getJob(access.user, id.id);
    if (!existing) return apiError(404, "not_found", "No such job.");
    if (checkedBlocks?.success) await saveJobBlocks(access.user, id.id, blockColumns(checkedBlocks.data));
    const columns = jobColumns(fields);
    if (Object.keys(columns).length || tunerId || customerId) {
      await updateJob(access.user, id.id, { fields: columns, tunerId, customerId });
    }
    const record = await getJob(access.user, id.id);
    return Response.json({ job: jobDto(record!) });
  } catch (error) {
    return refusalResponse(error);
  }
}
