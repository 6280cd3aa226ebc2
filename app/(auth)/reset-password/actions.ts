"use server";

import { redirect } from "next/navigation";
import { resetPassword } from "@/lib/auth/passwords";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { resetPasswordSchema } from "./schema";

/** Anyone holding the link may use it, once: the link is the proof. */
export async function resetPasswordAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: resetPasswordSchema,
    roles: "public",
    async work(value) {
      await resetPassword({ token: value.token, newPassword: value.newPassword });
      redirect("/sign-in?notice=password-changed");
    },
  });
}
