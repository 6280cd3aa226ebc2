"use server";

import { ALL_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { computePassagePlug, computeTapDrill, type PassagePlugResultDto, type TapDrillResultDto } from "./compute";
import { passagePlugSchema, tapDrillSchema } from "./schema";

export async function tapDrillAction(
  _previous: FormResult<TapDrillResultDto> | undefined,
  formData: FormData,
): Promise<FormResult<TapDrillResultDto>> {
  return runFormAction(formData, {
    schema: tapDrillSchema,
    roles: ALL_ROLES,
    resetForm: false,
    work: async (value) => ({ data: computeTapDrill(value) }),
  });
}

export async function passagePlugAction(
  _previous: FormResult<PassagePlugResultDto> | undefined,
  formData: FormData,
): Promise<FormResult<PassagePlugResultDto>> {
  return runFormAction(formData, {
    schema: passagePlugSchema,
    roles: ALL_ROLES,
    resetForm: false,
    work: async (value) => ({ data: computePassagePlug(value) }),
  });
}
