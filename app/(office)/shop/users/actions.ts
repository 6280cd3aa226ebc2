"use server";

import { revalidatePath } from "next/cache";
import { changeAccount, createAccount } from "@/lib/auth/accounts";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { sendPasswordReset } from "@/lib/auth/passwords";
import { createUserSchema, sendResetLinkSchema, updateUserSchema } from "./schema";

export async function createUserAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: createUserSchema,
    roles: ["admin"],
    async work(value, user) {
      const created = await createAccount(user.id, value);
      revalidatePath("/shop/users");
      return `${created.name} can now sign in as ${created.role}.`;
    },
  });
}

export async function updateUserAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: updateUserSchema,
    roles: ["admin"],
    async work(value, user) {
      const updated = await changeAccount(user.id, value);
      revalidatePath("/shop/users");
      return `${updated.name}: ${updated.active ? updated.role : "deactivated"}.`;
    },
  });
}

/** Mails the person a single-use link to set a new password. */
export async function sendResetLinkAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: sendResetLinkSchema,
    roles: ["admin"],
    async work(value, user) {
      await sendPasswordReset(user, value.userId);
      return "Reset link sent.";
    },
  });
}
