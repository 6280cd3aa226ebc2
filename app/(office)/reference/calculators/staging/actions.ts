"use server";

import { ALL_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { computeStaging, type StagingResultDto } from "./compute";
import { stagingSchema } from "./schema";

/** Charts the staging plan as entered, or (command "propose") proposes boost-valve setpoints and charts those. */
export async function stagingAction(_previous: FormResult<StagingResultDto> | undefined, formData: FormData): Promise<FormResult<StagingResultDto>> {
  return runFormAction(formData, {
    schema: stagingSchema,
    roles: ALL_ROLES,
    resetForm: false,
    work: async (value) => ({ data: computeStaging(value) }),
  });
}
