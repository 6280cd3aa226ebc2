import { z } from "zod";
import { newPasswordField } from "@/lib/auth/password-policy";

export const resetPasswordSchema = z
  .object({
    token: z.string({ error: "This link is incomplete: open it from the e-mail again." }).regex(/^[A-Za-z0-9_-]{43}$/, {
      error: "This link is incomplete: open it from the e-mail again.",
    }),
    newPassword: newPasswordField,
    confirmPassword: z.string({ error: "Type the new password again." }),
  })
  .refine((v) => v.newPassword === v.confirmPassword, { error: "The two new passwords differ.", path: ["confirmPassword"] });
