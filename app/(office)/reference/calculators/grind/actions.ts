"use server";

import { ALL_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { computeGrind, type GrindResultDto } from "./compute";
import { grindSchema } from "./schema";

export async function grindPlanAction(_previous: FormResult<GrindResultDto> | undefined, formData: FormData): Promise<FormResult<GrindResultDto>> {
  return runFormAction(formData, {
    schema: grindSchema,
    roles: ALL_ROLES,
    resetForm: false,
    work: async (value) => ({ data: computeGrind(value) }),
  });
}
