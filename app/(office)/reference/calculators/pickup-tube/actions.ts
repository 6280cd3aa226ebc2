"use server";

import { ALL_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { computePickupTube, type PickupTubeResultDto } from "./compute";
import { pickupTubeSchema } from "./schema";

export async function pickupTubeAction(
  _previous: FormResult<PickupTubeResultDto> | undefined,
  formData: FormData,
): Promise<FormResult<PickupTubeResultDto>> {
  return runFormAction(formData, {
    schema: pickupTubeSchema,
    roles: ALL_ROLES,
    resetForm: false,
    work: async (value) => ({ data: computePickupTube(value) }),
  });
}
