"use client";

import { getFormProps, getInputProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";
import { resetPasswordAction } from "./actions";
import { resetPasswordSchema } from "./schema";

export function ResetPasswordForm({ token }: { token: string }) {
  const [lastResult, action, pending] = useActionState(resetPasswordAction, undefined);
  const [form, fields] = useForm({
    id: "reset-password",
    lastResult,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: resetPasswordSchema }),
  });
  return (
    <form {...getFormProps(form)} action={action} aria-label="Set a new password" className="flex flex-col gap-4" noValidate>
      <FormMessage errors={form.errors ?? fields.token.errors} />
      <input type="hidden" name={fields.token.name} value={token} />
      <Field
        label="New password"
        htmlFor={fields.newPassword.id}
        errors={fields.newPassword.errors}
        errorId={fields.newPassword.errorId}
        hint="At least 12 characters, not your e-mail or name."
      >
        <Input {...getInputProps(fields.newPassword, { type: "password" })} key={fields.newPassword.key} autoComplete="new-password" />
      </Field>
      <Field label="New password again" htmlFor={fields.confirmPassword.id} errors={fields.confirmPassword.errors} errorId={fields.confirmPassword.errorId}>
        <Input {...getInputProps(fields.confirmPassword, { type: "password" })} key={fields.confirmPassword.key} autoComplete="new-password" />
      </Field>
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Saving…" : "Set password"}
      </Button>
    </form>
  );
}
