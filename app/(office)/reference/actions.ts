"use server";

import { revalidatePath } from "next/cache";
import { setLengthUnit } from "@/db/users";
import { ALL_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { lengthUnitSchema } from "./schema";

/** Remembers the signed-in user's inch/mm choice; every reference screen shows sizes in it. */
export async function setLengthUnitAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: lengthUnitSchema,
    roles: ALL_ROLES,
    async work(value, user) {
      await setLengthUnit(user.id, value.lengthUnit);
      revalidatePath("/reference", "layout");
      return value.lengthUnit === "in" ? "Sizes in inches." : "Sizes in millimetres.";
    },
  });
}
