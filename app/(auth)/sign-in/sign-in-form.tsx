"use client";

import { getFormProps, getInputProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";
import { signInSchema } from "./schema";

export function SignInForm({ returnTo }: { returnTo: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [refusal, setRefusal] = useState<string>();
  const [form, fields] = useForm({
    id: "sign-in",
    shouldValidate: "onBlur",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: signInSchema }),
    async onSubmit(event, { submission }) {
      event.preventDefault();
      if (submission?.status !== "success") return;
      setPending(true);
      setRefusal(undefined);
      const result = await signIn("credentials", { ...submission.value, redirect: false });
      if (!result || result.error) {
        setPending(false);
        setRefusal(result?.error && result.error !== "CredentialsSignin" ? result.error : "Sign-in failed.");
        return;
      }
      router.replace(returnTo);
      router.refresh();
    },
  });

  return (
    <form {...getFormProps(form)} className="flex flex-col gap-4" noValidate>
      <FormMessage errors={refusal ? [refusal] : undefined} />
      <Field label="E-mail" htmlFor={fields.email.id} errors={fields.email.errors} errorId={fields.email.errorId}>
        <Input {...getInputProps(fields.email, { type: "email" })} key={fields.email.key} autoComplete="username" />
      </Field>
      <Field label="Password" htmlFor={fields.password.id} errors={fields.password.errors} errorId={fields.password.errorId}>
        <Input {...getInputProps(fields.password, { type: "password" })} key={fields.password.key} autoComplete="current-password" />
      </Field>
      <Button type="submit" size="lg" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
