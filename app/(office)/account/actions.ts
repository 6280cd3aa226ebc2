"use server";

import { redirect } from "next/navigation";
import { changeOwnPassword, signOutEverywhere } from "@/lib/auth/passwords";
import { ALL_ROLES } from "@/lib/auth/session";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { changePasswordSchema, signOutEverywhereSchema } from "./schema";

/** A new password ends every session, this one too: the person signs in again with it. */
export async function changePasswordAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: changePasswordSchema,
    roles: ALL_ROLES,
    async work(value, user) {
      await changeOwnPassword(user, { currentPassword: value.currentPassword, newPassword: value.newPassword });
      redirect("/sign-in?notice=password-changed");
    },
  });
}

export async function signOutEverywhereAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: signOutEverywhereSchema,
    roles: ALL_ROLES,
    async work(_value, user) {
      await signOutEverywhere(user);
      redirect("/sign-in?notice=signed-out-everywhere");
    },
  });
}
