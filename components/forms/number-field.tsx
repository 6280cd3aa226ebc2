"use client";

import { getInputProps, type FieldMetadata } from "@conform-to/react";
import type { ReactNode } from "react";
import { FieldErrors, Input } from "@/components/ui/field";

/** A plain number (a count, a percentage, an angle) with its fixed unit written beside the box. */
export function NumberField({
  label,
  field,
  suffix,
  hint,
  optional = false,
}: {
  label: ReactNode;
  field: FieldMetadata<number | undefined, Record<string, unknown>, string[]>;
  suffix?: string;
  hint?: ReactNode;
  optional?: boolean;
}) {
  return (
    <div className="flex flex-col gap-1">
      <div className="flex items-baseline gap-1">
        <label htmlFor={field.id} className="text-sm font-semibold text-ink">
          {label}
        </label>
        {optional ? <span className="text-sm text-pencil">(optional)</span> : null}
      </div>
      <div className="flex">
        <div className="min-w-0 flex-1">
          <Input
            {...getInputProps(field, { type: "text" })}
            key={field.key}
            inputMode="decimal"
            autoComplete="off"
            className={`numeric text-right ${suffix ? "rounded-r-none" : ""}`}
          />
        </div>
        {suffix ? (
          <span className="numeric flex w-24 shrink-0 items-center rounded-r-[var(--radius-sheet)] border border-l-0 border-rule-strong bg-paper px-3 text-sm text-graphite">
            {suffix}
          </span>
        ) : null}
      </div>
      {hint && !field.errors?.length ? <p className="text-xs text-pencil">{hint}</p> : null}
      <FieldErrors id={field.errorId} errors={field.errors} />
    </div>
  );
}
