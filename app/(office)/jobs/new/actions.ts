"use server";

import { redirect } from "next/navigation";
import { createJob, type JobFields } from "@/db/jobs";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { RequestRefusal } from "@/db/refusal";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { jobColumns } from "@/lib/jobs/input";
import { createJobSchema } from "@/lib/jobs/schema";

export type CreateJobResult = FormResult<{ id: string; number: string }>;

/**
 * Opens a job from the new-job form, for an existing customer or a new one typed in, and goes to its page.
 * A tuner opens jobs in their own name; only an admin hands a job to someone else.
 */
export async function createJobAction(_previous: CreateJobResult | undefined, formData: FormData): Promise<CreateJobResult> {
  const result = await runFormAction(formData, {
    schema: createJobSchema,
    roles: OFFICE_ROLES,
    resetForm: false,
    async work(value, user) {
      const { customerId, newCustomerName, tunerId, ...fields } = value;
      if (user.role !== "admin" && tunerId && tunerId !== user.id) {
        throw new RequestRefusal(403, "A tuner opens jobs in their own name; an admin assigns them to others.", "tunerId");
      }
      const job = await createJob(user, {
        fields: jobColumns(fields) as JobFields,
        customerId,
        newCustomerName: customerId ? undefined : newCustomerName,
        tunerId,
      });
      return { message: `Job ${job.number} opened.`, data: job };
    },
  });
  if (result.httpStatus === 200 && result.data) redirect(`/jobs/${result.data.id}`);
  return result;
}
