"use client";

import { parseWithZod } from "@conform-to/zod/v4";
import { CalculatorMessage, FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { Reading, Readings, ResultPanel, ResultPending } from "@/components/forms/readings";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { formatLength, type DisplayLengthUnit } from "@/lib/format/display";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";
import { pickupTubeAction } from "./actions";
import { pickupTubeSchema } from "./schema";

/** 5/16 in soft copper tube: common practice for the pickup extension. */
const COMMON_TUBE_OD = { in: 0.3125, mm: 7.94 } as const;

export function PickupTubeForm({ unit }: { unit: DisplayLengthUnit }) {
  const { form, fields, formProps, pending, data: result } = useServerForm(pickupTubeAction, {
    id: "pickup-tube",
    defaultValue: {
      firstRun: { unit },
      bendAngle: 90,
      radius: { unit },
      secondRun: { unit },
      thirdRun: { unit },
      swage: { unit },
      outsideDiameter: { value: COMMON_TUBE_OD[unit], unit },
      maxRearward: { unit },
      maxDownward: { unit },
    },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: pickupTubeSchema }),
  });
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,30rem)_1fr]">
      <form {...formProps} aria-label="Pickup tube" className="flex flex-col gap-5" noValidate>
        <CalculatorMessage errors={form.errors} />
        <FieldGroup title="Path along the centerline" columns={2}>
          <QuantityField label="First run" field={fields.firstRun} units={FORM_LENGTH_UNITS} hint="Straight, rearward from the inlet tip." />
          <NumberField label="Bend angle" field={fields.bendAngle} suffix="°" hint="Positive bends down." />
          <QuantityField label="Centerline radius" field={fields.radius} units={FORM_LENGTH_UNITS} hint="Of the bender's die." />
          <QuantityField label="Second run" field={fields.secondRun} units={FORM_LENGTH_UNITS} hint="Tangent to tangent." />
          <NumberField label="Second bend angle" field={fields.secondBendAngle} suffix="°" optional />
          <QuantityField label="Third run" field={fields.thirdRun} units={FORM_LENGTH_UNITS} optional />
        </FieldGroup>
        <FieldGroup title="Tube and room" columns={2}>
          <QuantityField label="Swage engagement" field={fields.swage} units={FORM_LENGTH_UNITS} hint="Pushed over the valve inlet." />
          <QuantityField label="Tube outside diameter" field={fields.outsideDiameter} units={FORM_LENGTH_UNITS} />
          <QuantityField label="Room rearward" field={fields.maxRearward} units={FORM_LENGTH_UNITS} optional hint="From the inlet tip." />
          <QuantityField label="Room downward" field={fields.maxDownward} units={FORM_LENGTH_UNITS} optional hint="So the bowl still comes off." />
        </FieldGroup>
        <Button type="submit" disabled={pending} className="self-start">
          {pending ? "Working…" : "Work out the cut length"}
        </Button>
      </form>
      {result ? (
        <ResultPanel title="Cut length" testId="pickup-tube-result">
          <p className="numeric text-3xl font-bold">{formatLength(result.cutLength, unit)}</p>
          <Readings label="Cut length parts">
            <Reading label="Straight runs">{formatLength(result.straight, unit)}</Reading>
            <Reading label="Bends (arc length)">{formatLength(result.arcs, unit)}</Reading>
            <Reading label="Swage engagement">{formatLength(result.swage, unit)}</Reading>
            <Reading label="Reach rearward">{formatLength(result.reachRearward, unit)}</Reading>
            <Reading label="Reach downward">{formatLength(result.reachDownward, unit)}</Reading>
          </Readings>
          {result.fitsBowl ? null : (
            <p role="alert" className="rounded-[var(--radius-sheet)] border border-fault bg-fault-soft px-3 py-2 text-sm text-fault">
              Does not fit: the tube reaches further {result.exceeds.join(" and ")} than the room the bowl leaves, so the bowl may not
              come off. Shorten the run or bend less.
            </p>
          )}
        </ResultPanel>
      ) : (
        <ResultPending>Measure the runs along the centerline and the bend; the length to cut appears here.</ResultPending>
      )}
    </div>
  );
}
