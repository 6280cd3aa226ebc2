"use client";

import type { FieldMetadata, FormMetadata } from "@conform-to/react";
import { FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { SelectField } from "@/components/forms/select-field";
import { Button } from "@/components/ui/button";
import { FORM_AREA_UNITS } from "@/lib/forms/quantity/units";
import { MODE_OPTIONS, SETPOINT_UNITS, TARGET_OPTIONS, VACUUM_UNITS, VALVE_OPTIONS, type BlocksForm, type StageForm } from "./form-shape";

/** One enrichment stage: the valve, when it opens, how much it must add, and the most holes allowed. */
export function StageFields({
  form,
  stage,
  listName,
  index,
  removable,
  side,
}: {
  form: FormMetadata<BlocksForm, string[]>;
  stage: FieldMetadata<StageForm, BlocksForm, string[]>;
  /** The block's side: a secondary stage is always read in full throttle. */
  side: "primary" | "secondary";
  listName: string;
  index: number;
  removable: boolean;
}) {
  const f = stage.getFieldset();
  const valve = f.valveKind.value ?? "boost";
  const target = f.targetKind.value ?? "afr";
  return (
    <fieldset aria-label={`Stage ${index + 1}`} className="flex flex-col gap-3 rounded-[var(--radius-sheet)] border border-rule-strong bg-white px-4 py-3">
      <div className="flex items-center justify-between gap-3">
        <span className="text-sm font-semibold">Stage {index + 1}</span>
        {removable ? (
          <Button type="submit" variant="quiet" className="min-h-8 px-2 text-xs" {...form.remove.getButtonProps({ name: listName, index })}>
            Remove stage {index + 1}
          </Button>
        ) : null}
      </div>
      <FieldGroup columns={4}>
        <SelectField label="Valve" field={f.valveKind} options={VALVE_OPTIONS} />
        {valve === "vacuum" ? (
          <QuantityField label="Vacuum rating" field={f.vacuumRating} units={VACUUM_UNITS} hint="Opens when vacuum falls below this." />
        ) : (
          <QuantityField label="Opening pressure" field={f.setpoint} units={SETPOINT_UNITS} hint="Boost at which it opens." />
        )}
        <SelectField label="Target given as" field={f.targetKind} options={TARGET_OPTIONS} />
        {target === "afr" || target === "lambda" ? (
          <>
            <NumberField label={target === "afr" ? "AFR before" : "Lambda before"} field={f.targetFrom} hint="Without this stage." />
            <NumberField label={target === "afr" ? "AFR after" : "Lambda after"} field={f.targetTo} hint="With it open: richer." />
            {side === "primary" ? (
              <SelectField label="Read in" field={f.mode} options={MODE_OPTIONS} hint="The whole engine's mixture in that mode." />
            ) : (
              <input type="hidden" name={f.mode.name} value="full" />
            )}
          </>
        ) : null}
        {target === "percentMainJet" ? <NumberField label="Enrichment" field={f.targetTo} suffix="%" hint="Of this block's own main-jet area." /> : null}
        {target === "area" ? <QuantityField label="Restriction area" field={f.targetArea} units={FORM_AREA_UNITS} /> : null}
        <QuantityField label="Valve window area" field={f.valveWindowArea} units={FORM_AREA_UNITS} optional hint="The valve's own flow area." />
        <NumberField label="Most holes" field={f.maxHoles} suffix="holes" hint="1 to 4 in the channel." />
      </FieldGroup>
    </fieldset>
  );
}
