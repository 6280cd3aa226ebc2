"use server";

import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { saveJobBlocks } from "@/db/jobs";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { blockColumns } from "@/lib/jobs/input";
import { jobBlocksSchema } from "@/lib/jobs/schema";
import { requireVisibleJob } from "../job-guard";

/**
 * Replaces the job's blocks and stages with the form's, all or nothing, and goes back to the job's page. A
 * job with an approved revision goes back to draft (on hold, when confirmed, if the bench is machining it); the
 * revision itself stays as it was.
 */
export async function saveBlocksAction(jobId: string, _previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  let saved: string | undefined;
  const result = await runFormAction(formData, {
    schema: jobBlocksSchema,
    roles: OFFICE_ROLES,
    resetForm: false,
    async work(value, user) {
      const id = await requireVisibleJob(user, jobId);
      await saveJobBlocks(user, id, blockColumns(value), { confirmHold: value.confirmHold });
      revalidatePath(`/jobs/${id}`);
      saved = id;
      return "Blocks and stages saved.";
    },
  });
  if (result.httpStatus === 200 && saved) redirect(`/jobs/${saved}`);
  return result;
}
