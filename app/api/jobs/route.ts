import { createJob, listJobs } from "@/db/jobs";
import { apiRoute } from "@/lib/http/api-route";
import { ALL_ROLES, OFFICE_ROLES } from "@/lib/auth/session";
import { jobColumns } from "@/lib/jobs/input";
import type { JobFields } from "@/db/jobs";
import { createJobSchema, jobListQuerySchema } from "@/lib/jobs/schema";

/** Jobs page by page, filtered and sorted on the server. Machinists see released work only. */
export const GET = apiRoute({ roles: ALL_ROLES, query: jobListQuerySchema }, async ({ user, query }) => Response.json(await listJobs(user, query)));

export const POST = apiRoute({ roles: OFFICE_ROLES, body: createJobSchema }, async ({ user, body }) => {
  const { customerId, newCustomerName, tunerId, ...fields } = body;
  const job = await createJob(user, { fields: jobColumns(fields) as JobFields, customerId, newCustomerName, tunerId });
  return Response.json({ job }, { status: 201 });
});
