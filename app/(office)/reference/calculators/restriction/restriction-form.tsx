"use client";

import { parseWithZod } from "@conform-to/zod/v4";
import { CalculatorMessage, FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { ResultPending } from "@/components/forms/readings";
import { SelectField } from "@/components/forms/select-field";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { areaUnitFor, FORM_AREA_UNITS, FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";
import { restrictionAction } from "./actions";
import { RestrictionResults } from "./restriction-results";
import { restrictionSchema } from "./schema";

const TARGET_OPTIONS = [
  { value: "area", label: "Effective area" },
  { value: "afr", label: "AFR change (enrichment)" },
  { value: "percent", label: "Percent of main-jet area" },
] as const;

const DRILL_OPTIONS = [
  { value: "inch", label: "Inch drills (number, letter, fraction)" },
  { value: "number", label: "Number drills only" },
  { value: "fraction", label: "Fractional drills only" },
  { value: "metric", label: "Metric drills" },
  { value: "all", label: "Every standard drill" },
] as const;

export function RestrictionForm({ unit }: { unit: DisplayLengthUnit }) {
  const { form, fields, formProps, pending, data: result } = useServerForm(restrictionAction, {
    id: "restriction",
    defaultValue: {
      targetKind: "area",
      targetArea: { unit: areaUnitFor(unit) },
      mainJet: { unit },
      maxHoles: 4,
      drillSet: "inch",
      valveWindow: { unit: areaUnitFor(unit) },
      channelLength: { unit },
      minWeb: { unit },
    },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: restrictionSchema }),
  });
  const kind = fields.targetKind.value ?? "area";
  return (
    <div className="flex flex-col gap-6">
      <form {...formProps} aria-label="Restriction holes" className="flex flex-col gap-5" noValidate>
        <CalculatorMessage errors={form.errors} />
        <FieldGroup title="Target" columns={4}>
          <SelectField label="Target given as" field={fields.targetKind} options={TARGET_OPTIONS} />
          {kind === "area" ? (
            <QuantityField label="Target area" field={fields.targetArea} units={FORM_AREA_UNITS} hint="Effective area the channel should pass." />
          ) : null}
          {kind === "afr" ? (
            <>
              <NumberField label="AFR before" field={fields.afrBefore} suffix=": 1" hint="Measured without this stage." />
              <NumberField label="AFR wanted" field={fields.afrAfter} suffix=": 1" />
            </>
          ) : null}
          {kind === "percent" ? <NumberField label="Enrichment" field={fields.percent} suffix="%" hint="Extra fuel over the main jets." /> : null}
          {kind !== "area" ? (
            <>
              <QuantityField label="Main-jet bore" field={fields.mainJet} units={FORM_LENGTH_UNITS} hint="Measured diameter, one jet." />
              <NumberField label="Main jets" field={fields.mainJetCount} suffix="jets" hint="On the side this valve feeds." />
            </>
          ) : null}
        </FieldGroup>
        <FieldGroup title="Channel and drills" columns={4}>
          <NumberField label="Most holes" field={fields.maxHoles} suffix="holes" hint="1 to 4 in one channel." />
          <SelectField label="Drills to pick from" field={fields.drillSet} options={DRILL_OPTIONS} />
          <QuantityField label="Valve window area" field={fields.valveWindow} units={FORM_AREA_UNITS} optional hint="The valve's own flow area." />
          <QuantityField label="Channel length" field={fields.channelLength} units={FORM_LENGTH_UNITS} optional hint="Usable length for the row." />
          <QuantityField label="Least web" field={fields.minWeb} units={FORM_LENGTH_UNITS} optional hint="Metal between holes." />
        </FieldGroup>
        <Button type="submit" disabled={pending} className="self-start">
          {pending ? "Solving…" : "Find hole layouts"}
        </Button>
      </form>
      {result ? (
        <RestrictionResults result={result} unit={unit} />
      ) : (
        <ResultPending>Give a target area or an enrichment; the layouts that come closest appear here.</ResultPending>
      )}
    </div>
  );
}
