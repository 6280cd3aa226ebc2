"use client";

import { getInputProps, type FieldMetadata } from "@conform-to/react";
import type { ReactNode } from "react";
import { FieldErrors } from "@/components/ui/field";

/** A yes/no box with its label beside it, large enough to hit. */
export function CheckboxField<Form extends Record<string, unknown>>({
  field,
  label,
  hint,
}: {
  field: FieldMetadata<boolean | undefined, Form, string[]>;
  label: ReactNode;
  hint?: ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={field.id} className="flex min-h-10 items-center gap-3 text-sm font-semibold text-ink">
        <input {...getInputProps(field, { type: "checkbox" })} key={field.key} className="h-5 w-5 accent-accent" />
        {label}
      </label>
      {hint && !field.errors?.length ? <p className="text-xs text-pencil">{hint}</p> : null}
      <FieldErrors id={field.errorId} errors={field.errors} />
    </div>
  );
}
