"use client";

import { getFormProps, getInputProps, getSelectProps, getTextareaProps, useForm, type FieldMetadata } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { startTransition, useActionState, useState, type FormEvent } from "react";
import type { z } from "zod";
import type { BenchOperation } from "@/db/bench";
import { SafetyNote } from "@/components/ui/safety-note";
import type { FormResult } from "@/lib/forms/form-action";
import type { SafetyCaution } from "@/lib/safety/cautions";
import { signOffAction, type SignOffResult } from "./actions";
import {
  defaultUnit,
  formatArea,
  formatIn,
  formatTolerance,
  holesArea,
  parseReading,
  toBenchSI,
  unitsFor,
  withinPlan,
  type BenchLengthUnit,
  type BenchUnit,
} from "./bench-units";
import { ShopTime } from "./shop-time";
import { visibleParameters } from "./operation-terms";
import { PhotoControl } from "./photo-control";
import { signOffSchema, type SignOffInput } from "@/lib/bench/sign-off-schema";

type Planned = BenchOperation["planned"][number];

type SignOffForm = z.input<typeof signOffSchema>;

interface Entry {
  text: string;
  unit: BenchUnit;
}

/**
 * One operation of the traveler as a card: what to do, with what, the hazard, the readings to take and
 * the Done button. Once signed it folds down to who signed, when, and what was measured.
 */
export function OperationCard({
  blockId,
  operation,
  caution,
  photoIds,
  canSign,
  maxPhotoBytes,
  timeZone,
}: {
  blockId: string;
  operation: BenchOperation;
  caution: SafetyCaution | null;
  photoIds: string[];
  canSign: boolean;
  maxPhotoBytes: number;
  /** The shop's time zone, from the server page: sign-off times print in it. */
  timeZone: string;
}) {
  // A second submit while or after the first one succeeded (a double tap) does not reach the server again.
  const [lastResult, dispatch, pending] = useActionState(
    async (previous: FormResult<SignOffResult> | undefined, formData: FormData) =>
      previous?.httpStatus === 200 ? previous : signOffAction(previous, formData),
    undefined,
  );
  const signed = operation.signOff !== null;
  const titleId = `op-${operation.id}-title`;
  return (
    <article
      aria-labelledby={titleId}
      data-testid="operation-card"
      data-operation-id={operation.id}
      data-signed={signed ? "yes" : "no"}
      className={`overflow-hidden rounded-[var(--radius-sheet)] border-2 ${signed ? "border-rule-strong bg-paper" : "border-ink bg-white"}`}
    >
      <header className="flex items-start gap-3 border-b-2 border-ink px-4 py-3">
        <span className="numeric text-4xl leading-none font-bold" aria-label={`Operation ${operation.number}`}>
          {operation.number}
        </span>
        <h2 id={titleId} className="flex-1 pt-0.5 text-lg leading-snug font-bold">
          <span className="sr-only">Operation {operation.number}: </span>
          {operation.title}
        </h2>
        {signed ? (
          <span className="rounded-full border-2 border-ink px-2 py-0.5 text-xs font-bold uppercase tracking-wider">✓ Signed</span>
        ) : null}
      </header>
      {signed ? (
        <SignedSummary operation={operation} caution={caution} photoIds={photoIds} lastResult={lastResult} timeZone={timeZone} />
      ) : (
        <div className="flex flex-col gap-4 px-4 py-4">
          <Work operation={operation} caution={caution} />
          {canSign ? (
            <SignOffForm
              blockId={blockId}
              operation={operation}
              photoIds={photoIds}
              maxPhotoBytes={maxPhotoBytes}
              lastResult={lastResult}
              dispatch={dispatch}
              pending={pending}
            />
          ) : (
            <PlannedReadings planned={operation.planned} />
          )}
        </div>
      )}
    </article>
  );
}

function Work({ operation, caution }: { operation: BenchOperation; caution: SafetyCaution | null }) {
  const parameters = visibleParameters(operation.parameters);
  return (
    <>
      <p className="text-base leading-relaxed">{operation.instructions}</p>
      {parameters.length ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 border-y border-rule-strong text-base" aria-label="Parameters">
          {parameters.map(([label, value]) => (
            <div key={label} className="col-span-2 grid grid-cols-subgrid border-b border-rule py-1.5 last:border-b-0">
              <dt className="text-graphite">{label}</dt>
              <dd className="numeric text-right font-semibold whitespace-normal">{value}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      {caution ? (
        <SafetyNote signal={caution.signal} title={caution.title} layout="stacked">
          {caution.text}
        </SafetyNote>
      ) : null}
    </>
  );
}

/** The readings a superseded or unreleased traveler asked for, without boxes to type into. */
function PlannedReadings({ planned }: { planned: Planned[] }) {
  if (planned.length === 0) return null;
  return (
    <ul className="flex flex-col gap-1 text-base" aria-label="Planned readings">
      {planned.map((m) => (
        <li key={m.key}>
          {m.label}: <span className="numeric font-semibold">{formatTolerance(m.minSi, m.maxSi, defaultUnit(m.quantity))}</span>
        </li>
      ))}
    </ul>
  );
}

function SignOffForm({
  blockId,
  operation,
  photoIds,
  maxPhotoBytes,
  lastResult,
  dispatch,
  pending,
}: {
  blockId: string;
  operation: BenchOperation;
  photoIds: string[];
  maxPhotoBytes: number;
  lastResult: FormResult<SignOffResult> | undefined;
  dispatch: (formData: FormData) => void;
  pending: boolean;
}) {
  const [entries, setEntries] = useState<Entry[]>(() => operation.planned.map((m) => ({ text: "", unit: defaultUnit(m.quantity) })));
  const [form, fields] = useForm<SignOffForm, SignOffInput>({
    id: `sign-off-${operation.id}`,
    lastResult,
    defaultValue: {
      operationId: operation.id,
      note: "",
      readings: operation.planned.map((m) => ({ key: m.key, value: "", unit: defaultUnit(m.quantity) })),
    },
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: signOffSchema }),
    // In a transition rather than as the form's action: React would empty every box after a form action,
    // and a refused sign-off must keep what was typed.
    onSubmit(event: FormEvent<HTMLFormElement>, context: { formData: FormData }) {
      event.preventDefault();
      startTransition(() => dispatch(context.formData));
    },
  });
  const readingFields = fields.readings.getFieldList();
  const update = (index: number, change: Partial<Entry>) =>
    setEntries((current) => current.map((entry, i) => (i === index ? { ...entry, ...change } : entry)));
  const refused = lastResult && lastResult.httpStatus !== 200 ? (form.errors?.length ? form.errors : ["Check the readings marked below."]) : undefined;
  return (
    <form {...getFormProps(form)} aria-label={`Sign off operation ${operation.number}`} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name={fields.operationId.name} value={operation.id} />
      {operation.planned.map((m, i) => {
        const field = readingFields[i];
        if (!field) return null;
        return <ReadingInput key={m.key} planned={m} field={field} entry={entries[i]!} onChange={(change) => update(i, change)} />;
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

function ReadingInput({
  planned,
  field,
  entry,
  onChange,
}: {
  planned: Planned;
  field: FieldMetadata<NonNullable<SignOffForm["readings"]>[number], SignOffForm>;
  entry: Entry;
  onChange: (change: Partial<Entry>) => void;
}) {
  const set = field.getFieldset();
  const value = parseReading(entry.text);
  const valueSi = value === undefined ? undefined : toBenchSI(value, entry.unit);
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
          onChange={(event) => onChange({ text: event.currentTarget.value })}
          className="numeric min-h-14 w-full min-w-0 flex-1 rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-3 text-xl aria-[invalid=true]:border-fault aria-[invalid=true]:bg-fault-soft"
        />
        <label htmlFor={set.unit.id} className="sr-only">
          Unit for {planned.label.toLowerCase()}
        </label>
        <select
          {...getSelectProps(set.unit)}
          key={set.unit.key}
          onChange={(event) => onChange({ unit: event.currentTarget.value as BenchUnit })}
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

function Verdict({ passed, testId, children }: { passed: boolean; testId?: string; children?: React.ReactNode }) {
  return (
    <p
      data-testid={testId}
      aria-live="polite"
      className={`flex items-center gap-2 rounded-[var(--radius-sheet)] border-2 px-3 py-1.5 text-base font-bold ${
        passed ? "border-accent bg-accent-soft text-accent-strong" : "border-fault bg-fault-soft text-fault"
      }`}
    >
      <span aria-hidden>{passed ? "✓" : "✗"}</span>
      <span>
        {passed ? "Within plan" : "Outside plan"}
        {children}
      </span>
    </p>
  );
}

/** Total flow area of the gauged holes against the planned area: the number the stage was sized by. */
function RestrictionArea({ planned, entries }: { planned: Planned[]; entries: Entry[] }) {
  const unit: BenchLengthUnit = entries[0]?.unit === "mm" ? "mm" : "in";
  const plannedArea = holesArea(planned.map((m) => m.plannedSi));
  const minArea = holesArea(planned.map((m) => m.minSi));
  const maxArea = holesArea(planned.map((m) => m.maxSi));
  const diameters = entries.map((entry) => {
    const value = parseReading(entry.text);
    return value === undefined ? undefined : toBenchSI(value, entry.unit);
  });
  const complete = diameters.every((d) => d !== undefined);
  const actual = complete ? holesArea(diameters as number[]) : undefined;
  return (
    <div className="flex flex-col gap-1.5 rounded-[var(--radius-sheet)] border-2 border-ink px-3 py-2" data-testid="restriction-area">
      <p className="text-base font-semibold">Total hole area</p>
      <p className="text-sm text-graphite">
        Plan <span className="numeric font-semibold text-ink">{formatArea(plannedArea, unit)}</span> · accept{" "}
        <span className="numeric font-semibold text-ink">
          {formatArea(minArea, unit).split(" ")[0]}–{formatArea(maxArea, unit)}
        </span>
      </p>
      {actual === undefined ? (
        <p className="text-sm text-graphite">Enter every hole to see the total.</p>
      ) : (
        <>
          <p className="text-base">
            Gauged <span className="numeric text-lg font-bold">{formatArea(actual, unit)}</span>
          </p>
          <Verdict passed={withinPlan(actual, minArea, maxArea)} testId="verdict-area">
            {actual > maxArea ? `: above ${formatArea(maxArea, unit)}` : actual < minArea ? `: below ${formatArea(minArea, unit)}` : null}
          </Verdict>
        </>
      )}
    </div>
  );
}

/** An error under its box; `about` names the reading, so the message reads on its own ("Hole 2 by pin gauge: …"). */
function FieldError({ id, errors, about }: { id?: string; errors?: string[]; about?: string }) {
  if (!errors?.length) return null;
  const text = errors.join(" ");
  return (
    <p id={id} role="alert" className="text-base font-semibold text-fault">
      {about && !text.toLowerCase().includes(about.toLowerCase()) ? `${about}: ${text.charAt(0).toLowerCase()}${text.slice(1)}` : text}
    </p>
  );
}

function SignedSummary({
  operation,
  caution,
  photoIds,
  lastResult,
  timeZone,
}: {
  operation: BenchOperation;
  caution: SafetyCaution | null;
  photoIds: string[];
  lastResult: FormResult<SignOffResult> | undefined;
  timeZone: string;
}) {
  const signOff = operation.signOff!;
  const already = lastResult?.httpStatus === 200 && lastResult.data?.recorded === false;
  return (
    <div className="flex flex-col gap-3 px-4 py-3">
      <p className="text-base" data-testid="signed-by">
        Signed by <strong>{signOff.by}</strong> at <ShopTime iso={signOff.at} timeZone={timeZone} withDay />
      </p>
      {already ? (
        <p role="status" className="rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-3 py-2 font-semibold">
          Already signed: nothing was recorded twice.
        </p>
      ) : lastResult?.httpStatus === 200 && lastResult.message && (lastResult.data?.failed.length || lastResult.data?.verified) ? (
        <p role="status" className={`font-semibold ${lastResult.data?.failed.length ? "text-fault" : "text-accent-strong"}`}>
          {lastResult.message}
        </p>
      ) : null}
      {operation.planned.length ? (
        <ul className="flex flex-col gap-1.5" aria-label="Recorded readings">
          {operation.planned.map((m) => {
            const reading = operation.recorded.find((r) => r.key === m.key);
            return (
              <li key={m.key} className="flex flex-wrap items-baseline justify-between gap-x-3 border-b border-rule pb-1">
                <span className="text-graphite">{m.label}</span>
                {reading ? (
                  <span className="flex items-baseline gap-2">
                    <span className="numeric font-semibold">{formatIn(reading.valueSi, defaultUnit(m.quantity))}</span>
                    <span className={`text-sm font-bold ${reading.passed ? "text-accent-strong" : "text-fault"}`}>
                      {reading.passed ? "✓ within plan" : "✗ outside plan"}
                    </span>
                  </span>
                ) : (
                  <span className="text-pencil">not recorded</span>
                )}
              </li>
            );
          })}
        </ul>
      ) : null}
      {signOff.note ? <p className="text-base">Note: {signOff.note}</p> : null}
      {photoIds.length ? (
        <ul className="grid grid-cols-4 gap-2" aria-label="Photos of this operation">
          {photoIds.map((id) => (
            <li key={id}>
              <a href={`/api/photos/${id}`} className="block">
                {/* eslint-disable-next-line @next/next/no-img-element -- our own thumbnail route */}
                <img src={`/api/photos/${id}?size=thumb`} alt="Photo of this operation" className="aspect-square w-full rounded-[var(--radius-sheet)] border-2 border-ink object-cover" />
              </a>
            </li>
          ))}
        </ul>
      ) : null}
      <details className="group">
        <summary className="flex min-h-11 cursor-pointer items-center font-semibold text-accent underline">Show the work again</summary>
        <div className="flex flex-col gap-3 pt-2">
          <Work operation={operation} caution={caution} />
        </div>
      </details>
    </div>
  );
}
