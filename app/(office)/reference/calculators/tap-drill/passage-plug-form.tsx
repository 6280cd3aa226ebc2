"use client";

import { parseWithZod } from "@conform-to/zod/v4";
import { CalculatorMessage, FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { SelectField } from "@/components/forms/select-field";
import { Reading, Readings, ResultPanel, ResultPending, ResultWarnings } from "@/components/forms/readings";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Tag } from "@/components/ui/sheet";
import { drillSize, fixed, formatLength, type DisplayLengthUnit } from "@/lib/format/display";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";
import { passagePlugAction } from "./actions";
import { passagePlugSchema } from "./schema";

const THREAD_OPTIONS = [
  { value: "unified", label: "Unified inch (UNC, UNF)" },
  { value: "metric", label: "ISO metric" },
  { value: "both", label: "Both" },
] as const;

export function PassagePlugForm({ unit }: { unit: DisplayLengthUnit }) {
  const { form, fields, formProps, pending, data: result } = useServerForm(passagePlugAction, {
    id: "passage-plug",
    defaultValue: {
      passage: { unit },
      wall: { unit },
      depth: { unit },
      minWall: { unit },
      engagement: 75,
      threadSystem: unit === "in" ? "unified" : "metric",
    },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: passagePlugSchema }),
  });
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,30rem)_1fr]">
      <form {...formProps} aria-label="Passage plug" className="flex flex-col gap-4" noValidate>
        <CalculatorMessage errors={form.errors} />
        <FieldGroup columns={2}>
          <QuantityField label="Passage diameter" field={fields.passage} units={FORM_LENGTH_UNITS} hint="Measured with pin gauges." />
          <QuantityField label="Wall thickness" field={fields.wall} units={FORM_LENGTH_UNITS} hint="Bore to the nearest outside or passage." />
          <QuantityField label="Depth available" field={fields.depth} units={FORM_LENGTH_UNITS} hint="Along the passage, from the surface." />
          <NumberField label="Thread engagement" field={fields.engagement} suffix="%" />
          <SelectField label="Threads to choose from" field={fields.threadSystem} options={THREAD_OPTIONS} />
          <QuantityField label="Least wall to keep" field={fields.minWall} units={FORM_LENGTH_UNITS} optional hint="Default 0.030 in." />
        </FieldGroup>
        <Button type="submit" disabled={pending} className="self-start">
          {pending ? "Working…" : "Plan the plug"}
        </Button>
      </form>
      {result ? (
        <ResultPanel title="Plug for the passage" testId="passage-plug-result">
          <p className="flex flex-wrap items-baseline gap-x-3">
            <span className="numeric text-2xl font-bold">{result.thread.label}</span>
            <span className="text-graphite">
              drill <span className="numeric font-semibold text-ink">{result.drill.label}</span> ({drillSize(result.drill, unit)} {unit})
            </span>
            <Tag tone="accent">cleans up the passage</Tag>
          </p>
          <Readings label="Plug details">
            <Reading label="Tap">{result.tapLabel}</Reading>
            <Reading label="Engagement">{fixed(result.engagementPct, 1)} %</Reading>
            <Reading label="Full-thread depth">{formatLength(result.tapDepth, unit)}</Reading>
            <Reading label="Drill depth">{formatLength(result.drillDepth, unit)}</Reading>
            <Reading label="Wall left outside the thread">{formatLength(result.remainingWall, unit)}</Reading>
            <Reading label="Set screw">{result.setScrew ? result.setScrew.label : "none short enough"}</Reading>
          </Readings>
          <ResultWarnings warnings={result.warnings} />
          <p className="text-xs text-pencil">Seal the set screw with a fuel-resistant thread sealant.</p>
        </ResultPanel>
      ) : (
        <ResultPending>Measure the passage, the wall around it and the depth you can use.</ResultPending>
      )}
    </div>
  );
}
