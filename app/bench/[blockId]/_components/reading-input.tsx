import { getInputProps, getSelectProps, type FieldMetadata } from "@conform-to/react";
import type { BenchOperation } from "@/db/bench";
import { formatIn, formatTolerance, toBenchSI, unitsFor, withinPlan, type BenchUnit } from "../bench-units";
import { FieldError, Verdict } from "./reading-feedback";

type Planned = BenchOperation["planned"][number];

/** What the machinist has typed for one reading, as the form holds it. */
export interface Entry {
  value: number | undefined;
  unit: BenchUnit;
}

/** One planned reading: its box and unit, the tolerance in the chosen unit, and the verdict as it is typed. */
export function ReadingInput({
  planned,
  field,
  entry,
}: {
  planned: Planned;
  field: FieldMetadata<{ key: string; value?: number; unit: BenchUnit }>;
  entry: Entry;
}) {
  const set = field.getFieldset();
  const valueSi = entry.value === undefined ? undefined : toBenchSI(entry.value, entry.unit);
  const passed = valueSi === undefined ? undefined : withinPlan(valueSi, planned.minSi, planned.maxSi);
  const describedBy = [`${set.value.id}-tolerance`, set.value.errors?.length ? set.value.errorId : ""].filter(Boolean).join(" ");
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className="sr-only">{planned.label}</legend>
      <input type="hidden" name={set.key.name} value={planned.key} />
      <label htmlFor={set.value.id} className="text-base font-semibold">
        {planned.label}
      </label>
      <p id={`${set.value.id}-tolerance`} className="text-sm text-graphite">
        Plan <span className="numeric font-semibold text-ink">{formatIn(planned.plannedSi, entry.unit)}</span> · accept{" "}
        <span className="numeric font-semibold text-ink">{formatTolerance(planned.minSi, planned.maxSi, entry.unit)}</span>
      </p>
      <div className="flex gap-2">
        <input
          {...getInputProps(set.value, { type: "text" })}
          key={set.value.key}
          inputMode="decimal"
          autoComplete="off"
          enterKeyHint="next"
          aria-describedby={describedBy}
          className="numeric min-h-14 w-full min-w-0 flex-1 rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-3 text-xl aria-[invalid=true]:border-fault aria-[invalid=true]:bg-fault-soft"
        />
        <label htmlFor={set.unit.id} className="sr-only">
          Unit for {planned.label.toLowerCase()}
        </label>
        <select
          {...getSelectProps(set.unit)}
          key={set.unit.key}
          className="min-h-14 w-24 rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-2 text-lg font-semibold"
        >
          {unitsFor(planned.quantity).map((unit) => (
            <option key={unit} value={unit}>
              {unit}
            </option>
          ))}
        </select>
      </div>
      {passed === undefined || valueSi === undefined ? null : (
        <Verdict passed={passed} testId={`verdict-${planned.key}`}>
          {passed ? null : valueSi > planned.maxSi ? `: above ${formatIn(planned.maxSi, entry.unit)}` : `: below ${formatIn(planned.minSi, entry.unit)}`}
        </Verdict>
      )}
      <FieldError id={set.value.errorId} errors={set.value.errors} about={planned.label} />
      <FieldError id={set.unit.errorId} errors={set.unit.errors} about={planned.label} />
    </fieldset>
  );
}
