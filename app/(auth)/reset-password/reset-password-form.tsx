"use client";

import { parseWithZod } from "@conform-to/zod/v4";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/field";
import { NewPasswordFields } from "@/components/forms/new-password-fields";
import { resetPasswordAction } from "./actions";
import { resetPasswordSchema } from "./schema";

export function ResetPasswordForm({ token }: { token: string }) {
  const { form, fields, formProps, pending } = useServerForm(resetPasswordAction, {
    id: "reset-password",
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: resetPasswordSchema }),
  });
  return (
    <form {...formProps} aria-label="Set a new password" className="flex flex-col gap-4" noValidate>
      <FormMessage errors={form.errors ?? fields.token.errors} />
      <input type="hidden" name={fields.token.name} value={token} />
      <NewPasswordFields newPassword={fields.newPassword} confirmPassword={fields.confirmPassword} hint="At least 12 characters, not your e-mail or name." />
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Saving…" : "Set password"}
      </Button>
    </form>
  );
}
