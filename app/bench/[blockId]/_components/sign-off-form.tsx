"use client";

import { getTextareaProps } from "@conform-to/react";
import type { BenchOperation } from "@/db/bench";
import { useServerForm } from "@/components/forms/use-server-form";
import type { FormResult } from "@/lib/forms/form-action";
import { checkSignOff } from "@/lib/bench/sign-off-check";
import type { SignOffFields, SignOffInput } from "@/lib/bench/sign-off-schema";
import { signOffAction, type SignOffResult } from "../actions";
import { defaultUnit, parseReading, type BenchUnit } from "../bench-units";
import { PhotoControl } from "../photo-control";
import { ReadingInput, type Entry } from "./reading-input";
import { FieldError } from "./reading-feedback";
import { RestrictionArea } from "./restriction-area";

// A second submit while or after the first one succeeded (a double tap) does not reach the server again.
async function signOffOnce(previous: FormResult<SignOffResult> | undefined, formData: FormData) {
  return previous?.httpStatus === 200 ? previous : signOffAction(previous, formData);
}

/**
 * The sign-off of one operation: Conform holds what was typed (the only copy), the server's last answer
 * with it. Kept by the card, whose signed summary reads the answer after the page refreshes.
 */
export function useSignOffForm(operation: BenchOperation) {
  return useServerForm<SignOffFields, SignOffInput, SignOffResult>(signOffOnce, {
    id: `sign-off-${operation.id}`,
    defaultValue: {
      operationId: operation.id,
      note: "",
      readings: operation.planned.map((m) => ({ key: m.key, value: "", unit: defaultUnit(m.quantity) })),
    },
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    // A small check on the phone (empty or garbled boxes); the server validates the whole sign-off.
    onValidate: ({ formData }) => checkSignOff(formData),
  });
}

export type SignOffFormState = ReturnType<typeof useSignOffForm>;

/** The readings the operation asks for, a note, photos and the Done button. */
export function SignOffForm({
  blockId,
  operation,
  photoIds,
  maxPhotoBytes,
  state,
}: {
  blockId: string;
  operation: BenchOperation;
  photoIds: string[];
  maxPhotoBytes: number;
  state: SignOffFormState;
}) {
  const { form, fields, formProps, lastResult, pending } = state;
  const readingFields = fields.readings.getFieldList();
  // What each box holds now, read from the form: the verdicts and the total area follow the typing.
  const entries: Entry[] = operation.planned.map((m, i) => {
    const set = readingFields[i]?.getFieldset();
    return { value: parseReading(set?.value.value ?? ""), unit: (set?.unit.value as BenchUnit | undefined) ?? defaultUnit(m.quantity) };
  });
  const refused = lastResult && lastResult.httpStatus !== 200 ? (form.errors?.length ? form.errors : ["Check the readings marked below."]) : undefined;
  return (
    <form {...formProps} aria-label={`Sign off operation ${operation.number}`} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name={fields.operationId.name} value={operation.id} />
      {operation.planned.map((m, i) => {
        const field = readingFields[i];
        if (!field) return null;
        return <ReadingInput key={m.key} planned={m} field={field} entry={entries[i]!} />;
      })}
      {operation.kind === "restriction" && operation.planned.length > 0 ? <RestrictionArea planned={operation.planned} entries={entries} /> : null}
      <div className="flex flex-col gap-1">
        <label htmlFor={fields.note.id} className="text-base font-semibold">
          Note <span className="font-normal text-graphite">(optional)</span>
        </label>
        <textarea
          {...getTextareaProps(fields.note)}
          key={fields.note.key}
          rows={2}
          className="min-h-14 w-full rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-3 py-2 text-base"
        />
        <FieldError id={fields.note.errorId} errors={fields.note.errors} />
      </div>
      <PhotoControl blockId={blockId} operationId={operation.id} initialPhotoIds={photoIds} maxBytes={maxPhotoBytes} />
      {refused ? (
        <div role="alert" className="rounded-[var(--radius-sheet)] border-2 border-fault bg-fault-soft px-3 py-2 text-base font-semibold text-fault">
          {refused.join(" ")}
        </div>
      ) : null}
      <button
        type="submit"
        disabled={pending}
        className="flex min-h-14 w-full items-center justify-center rounded-[var(--radius-sheet)] border-2 border-accent-strong bg-accent px-4 text-xl font-bold text-white active:bg-accent-strong disabled:opacity-60"
      >
        {pending ? "Signing…" : "Done"}
      </button>
    </form>
  );
}
