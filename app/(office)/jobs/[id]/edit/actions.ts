"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { updateJob } from "@/db/jobs";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { jobColumns } from "@/lib/jobs/input";
import { updateJobSchema } from "@/lib/jobs/schema";
import { requireVisibleJob } from "../job-guard";

/**
 * Saves the engine and fuel of a job and goes back to its page. A job with an approved revision goes back to
 * draft (the data layer does it); the revision stays as it was until the next approval supersedes it.
 */
export async function updateJobAction(jobId: string, _previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  let saved: string | undefined;
  const result = await runFormAction(formData, {
    schema: updateJobSchema,
    roles: OFFICE_ROLES,
    resetForm: false,
    async work(value, user) {
      const id = await requireVisibleJob(user, jobId);
      const { tunerId, customerId, confirmHold, ...fields } = value;
      // The form carries every field: an emptied optional box clears the stored figure.
      const columns = jobColumns({ ...fields, targetPower: fields.targetPower, chargeTemperature: fields.chargeTemperature });
      await updateJob(user, id, { fields: columns, tunerId, customerId }, { confirmHold });
      revalidatePath(`/jobs/${id}`);
      saved = id;
      return "Engine and fuel saved.";
    },
  });
  if (result.httpStatus === 200 && saved) redirect(`/jobs/${saved}`);
  return result;
}
