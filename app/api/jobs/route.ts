import { createJob, listJobs } from "@/db/jobs";
import { invalidInput, readJson, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { ALL_ROLES, OFFICE_ROLES } from "@/lib/auth/session";
import { jobColumns } from "@/lib/job-input";
import type { JobFields } from "@/db/jobs";
import { createJobSchema, jobListQuerySchema } from "@/app/(office)/jobs/schema";

/** Jobs page by page, filtered and sorted on the server. Machinists see released work only. */
export async function GET(request: Request) {
  const query = jobListQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return invalidInput(query.error);
  const access = await authorize(ALL_ROLES);
  if (!access.ok) return access.response;
  return Response.json(await listJobs(access.user, query.data));
}

export async function POST(request: Request) {
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = createJobSchema.safeParse(body.value);
  if (!parsed.success) return invalidInput(parsed.error);
  const access = await authorize(OFFICE_ROLES);
  if (!access.ok) return access.response;
  const { customerId, newCustomerName, tunerId, ...fields } = parsed.data;
  try {
    const job = await createJob(access.user, { fields: jobColumns(fields) as JobFields, customerId, newCustomerName, tunerId });
    return Response.json({ job }, { status: 201 });
  } catch (error) {
    return refusalResponse(error);
  }
}
