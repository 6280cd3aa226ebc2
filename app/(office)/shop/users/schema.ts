import { z } from "zod";
import { formText } from "@/lib/forms/text-field";
import { newPasswordField, refusePersonalPassword } from "@/lib/auth/password-policy";

const roleSchema = z.enum(["admin", "tuner", "machinist"], { error: "Choose a role: admin, tuner or machinist." });

export const createUserSchema = z
  .object({
    name: formText("person's name", { min: 2, max: 80 }),
    email: z.email({ error: "Enter a valid e-mail address." }),
    role: roleSchema,
    password: newPasswordField,
  })
  // The e-mail and name checks run once the fields themselves are valid.
  .superRefine((value, ctx) => refusePersonalPassword(value, ctx));

export const updateUserSchema = z
  .object({
    userId: z.uuid({ error: "userId must be a user's id." }),
    role: roleSchema.optional(),
    active: z.enum(["true", "false"], { error: "active must be true or false." }).transform((v) => v === "true").optional(),
  })
  .refine((v) => v.role !== undefined || v.active !== undefined, { error: "Change the role or the active state.", path: ["role"] });

export const sendResetLinkSchema = z.object({ userId: z.uuid({ error: "userId must be a user's id." }) });
