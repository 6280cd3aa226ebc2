"use client";

import { parseWithZod } from "@conform-to/zod/v4";
import { CalculatorMessage, FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { ResultPending } from "@/components/forms/readings";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";
import { grindPlanAction } from "./actions";
import { GrindResults } from "./grind-results";
import { grindSchema } from "./schema";

export function GrindForm({ unit }: { unit: DisplayLengthUnit }) {
  const { form, fields, formProps, pending, data: result } = useServerForm(grindPlanAction, {
    id: "grind",
    defaultValue: {
      protrusion: { unit },
      clearance: { unit },
      clayGap: { unit },
      wall: { unit },
      minWall: { unit },
      perPass: { unit },
      clayEvery: 1,
    },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: grindSchema }),
  });
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,30rem)_1fr]">
      <form {...formProps} aria-label="Clearance grind" className="flex flex-col gap-5" noValidate>
        <CalculatorMessage errors={form.errors} />
        <FieldGroup title="Measured" columns={2}>
          <QuantityField label="Valve protrusion" field={fields.protrusion} units={FORM_LENGTH_UNITS} hint="How far the valve stands into the boss." />
          <QuantityField label="Clay gap" field={fields.clayGap} units={FORM_LENGTH_UNITS} hint="Gap the clay shows; 0 if they touch." />
          <QuantityField label="Wall thickness" field={fields.wall} units={FORM_LENGTH_UNITS} hint="Of the boss where it is ground." />
        </FieldGroup>
        <FieldGroup title="Shop rules" columns={2}>
          <QuantityField label="Running clearance" field={fields.clearance} units={FORM_LENGTH_UNITS} hint="Wanted between valve and boss." />
          <QuantityField label="Least wall to leave" field={fields.minWall} units={FORM_LENGTH_UNITS} />
          <QuantityField label="Depth per pass" field={fields.perPass} units={FORM_LENGTH_UNITS} hint="Deepest light pass." />
          <NumberField label="Clay check every" field={fields.clayEvery} suffix="passes" hint="And always after the last." />
        </FieldGroup>
        <Button type="submit" disabled={pending} className="self-start">
          {pending ? "Planning…" : "Plan the grind"}
        </Button>
      </form>
      {result ? <GrindResults result={result} unit={unit} /> : <ResultPending>Measure the protrusion, the clay gap and the wall.</ResultPending>}
    </div>
  );
}
