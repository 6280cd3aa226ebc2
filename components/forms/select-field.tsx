"use client";

import { getSelectProps, type FieldMetadata } from "@conform-to/react";
import type { ReactNode } from "react";
import { FieldErrors, Select } from "@/components/ui/field";

/** A labelled choice from a short list. */
export function SelectField<V extends string>({
  label,
  field,
  options,
  hint,
  hideLabel = false,
}: {
  label: ReactNode;
  field: FieldMetadata<V | undefined, Record<string, unknown>, string[]>;
  options: readonly { value: V; label: string }[];
  hint?: ReactNode;
  hideLabel?: boolean;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={field.id} className={hideLabel ? "sr-only" : "text-sm font-semibold text-ink"}>
        {label}
      </label>
      <Select {...getSelectProps(field)} key={field.key}>
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </Select>
      {hint && !field.errors?.length ? <p className="text-xs text-pencil">{hint}</p> : null}
      <FieldErrors id={field.errorId} errors={field.errors} />
    </div>
  );
}
