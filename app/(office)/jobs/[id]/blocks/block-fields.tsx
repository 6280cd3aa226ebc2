"use client";

import type { FieldMetadata, FormMetadata } from "@conform-to/react";
import { FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { SelectField } from "@/components/forms/select-field";
import { Button } from "@/components/ui/button";
import { FieldErrors } from "@/components/ui/field";
import { FORM_LENGTH_UNITS, type FormLengthUnit } from "@/lib/forms/quantity/units";
import { newStage, SIDE_OPTIONS, type BlockForm, type BlocksForm } from "./form-shape";
import { StageFields } from "./stage-fields";

const MAX_STAGES = 6;

/** One metering block: what was measured on it, and its enrichment stages. */
export function BlockFields({
  form,
  block,
  listName,
  index,
  removable,
  unit,
}: {
  form: FormMetadata<BlocksForm, string[]>;
  block: FieldMetadata<BlockForm, BlocksForm, string[]>;
  listName: string;
  index: number;
  removable: boolean;
  unit: FormLengthUnit;
}) {
  const f = block.getFieldset();
  const side = f.side.value ?? "primary";
  const stages = f.stages.getFieldList();
  const title = side === "secondary" ? "Secondary block" : "Primary block";
  return (
    <section aria-label={title} className="flex flex-col gap-5 rounded-[var(--radius-sheet)] border-2 border-ink bg-sheet px-5 py-4">
      <header className="flex flex-wrap items-end justify-between gap-3 border-b border-rule pb-3">
        <h2 className="text-lg font-bold">{title}</h2>
        <div className="flex items-end gap-3">
          <div className="w-40">
            <SelectField label="Side" field={f.side} options={SIDE_OPTIONS} />
          </div>
          {removable ? (
            <Button type="submit" variant="quiet" {...form.remove.getButtonProps({ name: listName, index })}>
              Remove this block
            </Button>
          ) : null}
        </div>
      </header>
      <FieldGroup title="Main jets and channel" columns={4}>
        <QuantityField label="Main-jet diameter" field={f.mainJetDiameter} units={FORM_LENGTH_UNITS} hint="Measured bore, one jet." />
        <NumberField label="Main jets" field={f.mainJetCount} suffix="jets" />
        <QuantityField label="Channel length" field={f.channelLength} units={FORM_LENGTH_UNITS} optional hint="Usable length for the holes." />
        <QuantityField label="Least web" field={f.minWeb} units={FORM_LENGTH_UNITS} optional hint="Metal between holes." />
      </FieldGroup>
      <FieldGroup title="Vacuum passage to plug" columns={4}>
        <QuantityField label="Passage diameter" field={f.passageDiameter} units={FORM_LENGTH_UNITS} optional />
        <QuantityField label="Wall around it" field={f.passageWall} units={FORM_LENGTH_UNITS} optional />
        <QuantityField label="Depth available" field={f.passageDepth} units={FORM_LENGTH_UNITS} optional />
      </FieldGroup>
      <FieldGroup title="Clearance grind (clay)" columns={4}>
        <QuantityField label="Valve protrusion" field={f.valveProtrusion} units={FORM_LENGTH_UNITS} optional hint="How far the valve stands into the boss." />
        <QuantityField label="Clay gap" field={f.measuredGap} units={FORM_LENGTH_UNITS} optional hint="0 when they touch." />
        <QuantityField label="Boss wall" field={f.bossWall} units={FORM_LENGTH_UNITS} optional />
        <QuantityField label="Running clearance" field={f.runningClearance} units={FORM_LENGTH_UNITS} optional hint="Default 0.030 in." />
      </FieldGroup>
      {side === "secondary" ? (
        <FieldGroup title="Pickup tube" columns={4}>
          <QuantityField label="First straight run" field={f.tubeRun1} units={FORM_LENGTH_UNITS} optional hint="From the valve inlet." />
          <NumberField label="Bend" field={f.tubeBendDeg} suffix="°" optional hint="Rearward and down." />
          <QuantityField label="Bend radius" field={f.tubeBendRadius} units={FORM_LENGTH_UNITS} optional hint="Centreline." />
          <QuantityField label="Second straight run" field={f.tubeRun2} units={FORM_LENGTH_UNITS} optional />
          <QuantityField label="Swage engagement" field={f.tubeSwage} units={FORM_LENGTH_UNITS} optional />
          <QuantityField label="Room rearward" field={f.tubeMaxRearward} units={FORM_LENGTH_UNITS} optional hint="How far back the bowl lets the tube reach." />
          <QuantityField label="Room downward" field={f.tubeMaxDownward} units={FORM_LENGTH_UNITS} optional hint="How far down, so the bowl still comes off." />
        </FieldGroup>
      ) : null}
      <div className="flex flex-col gap-3">
        <h3 className="text-xs font-semibold uppercase tracking-[0.12em] text-pencil">Enrichment stages, in opening order</h3>
        <FieldErrors id={f.stages.errorId} errors={f.stages.errors} />
        {stages.map((stage, i) => (
          <StageFields key={stage.key} form={form} stage={stage} listName={f.stages.name} index={i} removable={stages.length > 1} side={side === "secondary" ? "secondary" : "primary"} />
        ))}
        {stages.length < MAX_STAGES ? (
          <Button type="submit" variant="secondary" className="self-start" {...form.insert.getButtonProps({ name: f.stages.name, defaultValue: newStage(unit, "boost", side === "secondary" ? "full" : "part") })}>
            Add a stage to the {side} block
          </Button>
        ) : null}
      </div>
    </section>
  );
}
