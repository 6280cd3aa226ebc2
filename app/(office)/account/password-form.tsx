"use client";

import { getInputProps } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";
import { NewPasswordFields } from "@/components/forms/new-password-fields";
import { changePasswordAction, signOutEverywhereAction } from "./actions";
import { changePasswordSchema } from "./schema";

export function PasswordForm() {
  const { form, fields, formProps, pending } = useServerForm(changePasswordAction, {
    id: "change-password",
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: changePasswordSchema }),
  });
  return (
    <form {...formProps} aria-label="Change your password" className="flex flex-col gap-4" noValidate>
      <FormMessage errors={form.errors} />
      <Field label="Current password" htmlFor={fields.currentPassword.id} errors={fields.currentPassword.errors} errorId={fields.currentPassword.errorId}>
        <Input {...getInputProps(fields.currentPassword, { type: "password" })} key={fields.currentPassword.key} autoComplete="current-password" />
      </Field>
      <NewPasswordFields newPassword={fields.newPassword} confirmPassword={fields.confirmPassword} hint="At least 12 characters, not your e-mail or name. A few unrelated words make a good one." />
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : "Change password"}
      </Button>
    </form>
  );
}

export function SignOutEverywhereForm() {
  const { formProps, lastResult: result, pending } = useServerForm(signOutEverywhereAction, { id: "sign-out-everywhere" });
  return (
    <form {...formProps} aria-label="Sign out everywhere" className="flex flex-col gap-2">
      <FormMessage errors={result?.error?.[""] ?? undefined} />
      <Button type="submit" variant="secondary" disabled={pending}>
        {pending ? "Signing out…" : "Sign out on every device"}
      </Button>
    </form>
  );
}
