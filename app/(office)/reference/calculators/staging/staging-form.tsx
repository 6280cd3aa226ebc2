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
import { areaUnitFor, FORM_AREA_UNITS, FORM_BOOST_UNITS, FORM_LENGTH_UNITS, FORM_TEMPERATURE_UNITS } from "@/lib/forms/quantity/units";
import { stagingAction } from "./actions";
import { stagingSchema } from "./schema";
import { StagingResults } from "./staging-results";
import { ValveRows } from "./valve-rows";

const FUEL_OPTIONS = [
  { value: "gasoline", label: "Gasoline" },
  { value: "E10", label: "E10" },
  { value: "E30", label: "E30" },
  { value: "E85", label: "E85" },
  { value: "ethanol", label: "Ethanol" },
  { value: "methanol", label: "Methanol" },
] as const;

const SCALE_OPTIONS = [
  { value: "afr", label: "AFR (mass ratio)" },
  { value: "lambda", label: "Lambda" },
] as const;

export function StagingForm({ unit }: { unit: DisplayLengthUnit }) {
  const areaUnit = areaUnitFor(unit);
  const { form, fields, formProps, pending, data: result } = useServerForm(stagingAction, {
    id: "staging",
    defaultValue: {
      primaryJet: { unit },
      primaryJets: 2,
      secondaryJet: { unit },
      secondaryJets: 2,
      valves: [
        { kind: "vacuum", side: "primary", opening: { unit: "inHg" }, area: { unit: areaUnit } },
        { kind: "boost", side: "primary", opening: { unit: "psi" }, area: { unit: areaUnit } },
        { kind: "boost", side: "secondary", opening: { unit: "psi" }, area: { unit: areaUnit } },
      ],
      fuel: "gasoline",
      targetScale: "afr",
      peakBoost: { unit: "psi" },
      ambientTemperature: { unit: "°F" },
      chargeTemperature: { unit: "°F" },
      band: 5,
      proposeValves: 2,
      boostWindow: { unit: areaUnit },
    },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: stagingSchema }),
  });
  return (
    <div className="flex flex-col gap-6">
      <form {...formProps} aria-label="Staging" className="flex flex-col gap-6" noValidate>
        <CalculatorMessage errors={form.errors} />
        <FieldGroup title="Main jets, measured" columns={4}>
          <QuantityField label="Primary jet bore" field={fields.primaryJet} units={FORM_LENGTH_UNITS} />
          <NumberField label="Primary jets" field={fields.primaryJets} suffix="jets" />
          <QuantityField label="Secondary jet bore" field={fields.secondaryJet} units={FORM_LENGTH_UNITS} />
          <NumberField label="Secondary jets" field={fields.secondaryJets} suffix="jets" />
        </FieldGroup>
        <ValveRows
          valves={fields.valves}
          addButton={form.insert.getButtonProps({
            name: fields.valves.name,
            defaultValue: { kind: "boost", side: "secondary", opening: { unit: "psi" }, area: { unit: areaUnit } },
          })}
          removeButton={(index) => form.remove.getButtonProps({ name: fields.valves.name, index })}
        />
        <FieldGroup title="Fuel, target and air" columns={4}>
          <SelectField label="Fuel" field={fields.fuel} options={FUEL_OPTIONS} />
          <SelectField label="Target given as" field={fields.targetScale} options={SCALE_OPTIONS} />
          <NumberField label="Target without boost" field={fields.targetAtmosphere} hint="At 0 psi and under vacuum." />
          <NumberField label="Target at peak boost" field={fields.targetPeak} hint="Straight line in between." />
          <NumberField label="Target at cruise" field={fields.targetCruise} optional hint="Under vacuum, vacuum valve shut." />
          <QuantityField label="Peak boost" field={fields.peakBoost} units={FORM_BOOST_UNITS} hint="Gauge pressure." />
          <QuantityField label="Ambient temperature" field={fields.ambientTemperature} units={FORM_TEMPERATURE_UNITS} hint="The air the jets were set in." />
          <QuantityField label="Charge temperature at peak boost" field={fields.chargeTemperature} units={FORM_TEMPERATURE_UNITS} hint="At the carburetor hat." />
          <NumberField label="Accepted band" field={fields.band} suffix="± %" hint="Mixture within this is on target." />
        </FieldGroup>
        <FieldGroup title="Proposal" columns={4}>
          <NumberField label="Boost valves to propose" field={fields.proposeValves} suffix="valves" hint="Primary first, then alternating." />
          <QuantityField label="Boost-valve window area" field={fields.boostWindow} units={FORM_AREA_UNITS} optional hint="Caps what one valve adds." />
        </FieldGroup>
        <div className="flex flex-wrap gap-3">
          <Button type="submit" name="command" value="chart" disabled={pending}>
            {pending ? "Working…" : "Draw the chart"}
          </Button>
          <Button type="submit" name="command" value="propose" variant="secondary" disabled={pending}>
            Propose setpoints
          </Button>
        </div>
      </form>
      {result ? (
        <StagingResults result={result} unit={unit} />
      ) : (
        <ResultPending>Enter the jets, the valves and the target; the chart of area needed against area supplied appears here.</ResultPending>
      )}
    </div>
  );
}
