"use client";

import { getTextareaProps } from "@conform-to/react";
import type { BenchOperation } from "@/db/bench";
import { useServerForm } from "@/components/forms/use-server-form";
import type { AmendSignOffFields, AmendSignOffInput } from "@/lib/bench/sign-off-schema";
import { amendAction, type AmendResult } from "../actions";
import { defaultUnit, fromBenchSI, parseReading, type BenchUnit } from "../bench-units";
import { ReadingInput, type Entry } from "./reading-input";
import { FieldError } from "./reading-feedback";

/**
 * Correcting a signed operation's readings (a slip of the unit, a typo): the readings as they should have
 * been, in the units the machinist chooses, and why. The first readings stay in the record.
 */
export function AmendForm({ operation }: { operation: BenchOperation }) {
  const { form, fields, formProps, lastResult, pending } = useServerForm<AmendSignOffFields, AmendSignOffInput, AmendResult>(amendAction, {
    id: `amend-${operation.id}`,
    defaultValue: {
      operationId: operation.id,
      reason: "",
      readings: operation.planned.map((m) => {
        const unit = defaultUnit(m.quantity);
        const recorded = operation.recorded.find((r) => r.key === m.key);
        return { key: m.key, value: recorded ? String(Number(fromBenchSI(recorded.valueSi, unit).toPrecision(6))) : "", unit };
      }),
    },
    // Checked on the server only: the phone loads no schema library for a form it rarely needs.
    shouldValidate: "onSubmit",
  });
  const readingFields = fields.readings.getFieldList();
  const entries: Entry[] = operation.planned.map((m, i) => {
    const set = readingFields[i]?.getFieldset();
    return { value: parseReading(set?.value.value ?? ""), unit: (set?.unit.value as BenchUnit | undefined) ?? defaultUnit(m.quantity) };
  });
  const refused = lastResult && lastResult.httpStatus !== 200 ? (form.errors?.length ? form.errors : ["Check the readings marked below."]) : undefined;
  return (
    <details className="group" open={Boolean(refused)}>
      <summary className="flex min-h-11 cursor-pointer items-center font-semibold text-accent underline">Correct a reading</summary>
      <form {...formProps} aria-label={`Correct the readings of operation ${operation.number}`} className="flex flex-col gap-4 pt-2" noValidate>
        <input type="hidden" name={fields.operationId.name} value={operation.id} />
        {operation.planned.map((m, i) => {
          const field = readingFields[i];
          if (!field) return null;
          return <ReadingInput key={m.key} planned={m} field={field} entry={entries[i]!} />;
        })}
        <div className="flex flex-col gap-1">
          <label htmlFor={fields.reason.id} className="text-base font-semibold">
            Why it is corrected
          </label>
          <textarea
            {...getTextareaProps(fields.reason)}
            key={fields.reason.key}
            rows={2}
            className="min-h-14 w-full rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-3 py-2 text-base aria-[invalid=true]:border-fault"
          />
          <FieldError id={fields.reason.errorId} errors={fields.reason.errors} />
        </div>
        {refused ? (
          <div role="alert" className="rounded-[var(--radius-sheet)] border-2 border-fault bg-fault-soft px-3 py-2 text-base font-semibold text-fault">
            {refused.join(" ")}
          </div>
        ) : lastResult?.httpStatus === 200 && lastResult.message ? (
          <p role="status" className="font-semibold text-accent-strong">
            {lastResult.message}
          </p>
        ) : null}
        <button
          type="submit"
          disabled={pending}
          className="flex min-h-14 w-full items-center justify-center rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-4 text-lg font-bold active:bg-accent-soft disabled:opacity-60"
        >
          {pending ? "Correcting…" : "Record the correction"}
        </button>
      </form>
    </details>
  );
}
