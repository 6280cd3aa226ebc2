"use client";

import { getInputProps } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { CalculatorMessage } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { Reading, Readings, ResultPanel, ResultPending } from "@/components/forms/readings";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { drillSize, fixed, formatLength, type DisplayLengthUnit } from "@/lib/format/display";
import { ALL_THREADS } from "@/lib/engineering/threads";
import { tapDrillAction } from "./actions";
import { tapDrillSchema } from "./schema";

export function TapDrillForm({ unit }: { unit: DisplayLengthUnit }) {
  const { form, fields, formProps, pending, data: result } = useServerForm(tapDrillAction, {
    id: "tap-drill",
    defaultValue: { engagement: 75 },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: tapDrillSchema }),
  });
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,30rem)_1fr]">
      <form {...formProps} aria-label="Tap drill" className="flex flex-col gap-4" noValidate>
        <CalculatorMessage errors={form.errors} />
        <Field label="Thread" htmlFor={fields.thread.id} errors={fields.thread.errors} errorId={fields.thread.errorId} hint="4-40, #10-32, 1/4-20 UNC, M3x0.5, M8x1">
          <Input {...getInputProps(fields.thread, { type: "text" })} key={fields.thread.key} list="thread-labels" autoComplete="off" className="numeric" />
        </Field>
        <datalist id="thread-labels">
          {ALL_THREADS.map((thread) => (
            <option key={thread.label} value={thread.label} />
          ))}
        </datalist>
        <NumberField label="Thread engagement" field={fields.engagement} suffix="%" hint="75 % is the usual figure, 60-80 % for a plug; at most 83.3 % (the basic minor diameter)." />
        <Button type="submit" disabled={pending} className="self-start">
          {pending ? "Finding…" : "Find tap drill"}
        </Button>
      </form>
      {result ? (
        <ResultPanel title={`Tap drill for ${result.thread.label} at ${fixed(result.engagementAskedPct, 0)} %`} testId="tap-drill-result">
          <p className="flex items-baseline gap-3">
            <span className="numeric text-3xl font-bold" data-testid="tap-drill-label">
              {result.drill.label}
            </span>
            <span className="numeric text-lg text-graphite">
              {drillSize(result.drill, unit)} {unit}
            </span>
          </p>
          <Readings label="Tap drill details">
            <Reading label="Engagement this drill gives">{fixed(result.engagementPct, 1)} %</Reading>
            <Reading label="Exact size for the engagement asked">{formatLength(result.ideal, unit)}</Reading>
            <Reading label="Major diameter">{formatLength(result.thread.major, unit)}</Reading>
            <Reading label="Pitch">{result.thread.tpi !== null ? `${result.thread.tpi} tpi` : `${fixed(result.thread.pitch.mm, 2)} mm`}</Reading>
            <Reading label="Close clearance drill">
              {result.closeClearance.label} · {drillSize(result.closeClearance, unit)} {unit}
            </Reading>
            <Reading label="Free clearance drill">
              {result.freeClearance.label} · {drillSize(result.freeClearance, unit)} {unit}
            </Reading>
          </Readings>
        </ResultPanel>
      ) : (
        <ResultPending>Enter a thread to see its tap drill, the engagement it gives and the clearance drills.</ResultPending>
      )}
    </div>
  );
}
