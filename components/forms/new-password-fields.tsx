"use client";

import { getInputProps, type FieldMetadata } from "@conform-to/react";
import { Field, Input } from "@/components/ui/field";

type PasswordField = FieldMetadata<string, Record<string, unknown>, string[]>;

/** A new password typed twice, with the rules said beside it: shared by the forms that set one. */
export function NewPasswordFields({ newPassword, confirmPassword, hint }: { newPassword: PasswordField; confirmPassword: PasswordField; hint: string }) {
  return (
    <>
      <Field label="New password" htmlFor={newPassword.id} errors={newPassword.errors} errorId={newPassword.errorId} hint={hint}>
        <Input {...getInputProps(newPassword, { type: "password" })} key={newPassword.key} autoComplete="new-password" />
      </Field>
      <Field label="New password again" htmlFor={confirmPassword.id} errors={confirmPassword.errors} errorId={confirmPassword.errorId}>
        <Input {...getInputProps(confirmPassword, { type: "password" })} key={confirmPassword.key} autoComplete="new-password" />
      </Field>
    </>
  );
}
