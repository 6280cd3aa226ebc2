"use client";

import { getInputProps, getSelectProps, type FieldMetadata } from "@conform-to/react";
import type { ReactNode } from "react";
import { FieldErrors, Input, Select } from "@/components/ui/field";

type Quantity<U extends string> = { value?: number; unit?: U } | undefined;

function joinErrors(...lists: (string[] | undefined)[]): string[] | undefined {
  const all = lists.flatMap((list) => list ?? []);
  return all.length ? [...new Set(all)] : undefined;
}

/**
 * A measured quantity: the number and its unit side by side under one label. The error sits under the
 * pair and names the field, whichever half it is about.
 */
export function QuantityField<U extends string>({
  label,
  field,
  units,
  hint,
  optional = false,
  hideLabel = false,
}: {
  label: string;
  field: FieldMetadata<Quantity<U>, Record<string, unknown>, string[]>;
  units: readonly U[];
  hint?: ReactNode;
  optional?: boolean;
  /** In a table row the column heading says what it is: the label is kept for screen readers only. */
  hideLabel?: boolean;
}) {
  const { value, unit } = field.getFieldset();
  const errors = joinErrors(value.errors, unit.errors, field.errors);
  const hintId = `${value.id}-hint`;
  return (
    <div className="flex flex-col gap-1">
      <div className={hideLabel ? "sr-only" : "flex items-baseline gap-1"}>
        <label htmlFor={value.id} className="text-sm font-semibold text-ink">
          {label}
        </label>
        {optional ? <span className="text-sm text-pencil">(optional)</span> : null}
      </div>
      <div className="flex">
        <div className="min-w-0 flex-1">
          <Input
            {...getInputProps(value, { type: "text", ariaAttributes: false })}
            key={value.key}
            inputMode="decimal"
            autoComplete="off"
            aria-invalid={errors ? true : undefined}
            aria-describedby={errors ? value.errorId : hint ? hintId : undefined}
            className="numeric rounded-r-none text-right"
          />
        </div>
        <div className="w-24 shrink-0">
          <Select
            {...getSelectProps(unit, { ariaAttributes: false })}
            key={unit.key}
            aria-label={`${label} unit`}
            aria-invalid={unit.errors ? true : undefined}
            className="numeric rounded-l-none border-l-0 bg-paper text-sm"
          >
            {units.map((u) => (
              <option key={u} value={u}>
                {u}
              </option>
            ))}
          </Select>
        </div>
      </div>
      {hint && !errors ? (
        <p id={hintId} className="text-xs text-pencil">
          {hint}
        </p>
      ) : null}
      <FieldErrors id={value.errorId} errors={errors} />
    </div>
  );
}
