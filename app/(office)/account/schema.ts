import { z } from "zod";
import { newPasswordField } from "@/lib/auth/password-policy";

export const changePasswordSchema = z
  .object({
    currentPassword: z.string({ error: "Enter your current password." }).min(1, { error: "Enter your current password." }).max(200),
    newPassword: newPasswordField,
    confirmPassword: z.string({ error: "Type the new password again." }),
  })
  .refine((v) => v.newPassword === v.confirmPassword, { error: "The two new passwords differ.", path: ["confirmPassword"] });

/** The sign-out-everywhere button sends nothing but itself. */
export const signOutEverywhereSchema = z.object({});
