"use client";

import { getInputProps, getSelectProps } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input, Select } from "@/components/ui/field";
import { createUserAction } from "./actions";
import { createUserSchema } from "./schema";

export function CreateUserForm() {
  const { form, fields, formProps, lastResult, pending } = useServerForm(createUserAction, {
    id: "create-user",
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: createUserSchema }),
  });
  return (
    <form {...formProps} aria-label="Add a user" className="flex flex-col gap-4" noValidate>
      <FormMessage errors={form.errors} success={lastResult?.httpStatus === 200 ? lastResult.message : undefined} />
      <Field label="Name" htmlFor={fields.name.id} errors={fields.name.errors} errorId={fields.name.errorId}>
        <Input {...getInputProps(fields.name, { type: "text" })} key={fields.name.key} />
      </Field>
      <Field label="E-mail" htmlFor={fields.email.id} errors={fields.email.errors} errorId={fields.email.errorId}>
        <Input {...getInputProps(fields.email, { type: "email" })} key={fields.email.key} />
      </Field>
      <Field label="Role" htmlFor={fields.role.id} errors={fields.role.errors} errorId={fields.role.errorId}>
        <Select {...getSelectProps(fields.role)} key={fields.role.key} defaultValue={fields.role.initialValue ?? "machinist"}>
          <option value="machinist">Machinist: works travelers at the bench</option>
          <option value="tuner">Tuner: plans jobs and revisions</option>
          <option value="admin">Admin: runs the shop</option>
        </Select>
      </Field>
      <Field
        label="Starting password"
        htmlFor={fields.password.id}
        errors={fields.password.errors}
        errorId={fields.password.errorId}
        hint="At least 12 characters, not the e-mail or the name. Hand it over in person, or send a reset link once the user exists."
      >
        <Input {...getInputProps(fields.password, { type: "password" })} key={fields.password.key} autoComplete="new-password" />
      </Field>
      <Button type="submit" disabled={pending}>
        {pending ? "Adding…" : "Add user"}
      </Button>
    </form>
  );
}
