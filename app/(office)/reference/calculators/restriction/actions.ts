"use server";

import { ALL_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { computeRestriction, type RestrictionResultDto } from "./compute";
import { restrictionSchema } from "./schema";

export async function restrictionAction(
  _previous: FormResult<RestrictionResultDto> | undefined,
  formData: FormData,
): Promise<FormResult<RestrictionResultDto>> {
  return runFormAction(formData, {
    schema: restrictionSchema,
    roles: ALL_ROLES,
    resetForm: false,
    work: async (value) => ({ data: computeRestriction(value) }),
  });
}
