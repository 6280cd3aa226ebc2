"use client";

import { getInputProps, getTextareaProps } from "@conform-to/react";
import { FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { SelectField } from "@/components/forms/select-field";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button, ButtonLink } from "@/components/ui/button";
import { Field, FormMessage, Input, Textarea } from "@/components/ui/field";
import type { FormResult } from "@/lib/forms/form-action";
import { CheckboxField } from "@/components/forms/checkbox-field";
import { BOOST_UNITS, DISPLACEMENT_UNITS, FUEL_OPTIONS, POWER_UNITS, TEMPERATURE_UNITS, type JobFieldsForm } from "../../job-fields-shape";
import { SiteFields } from "../../site-fields";

/** Engine, fuel and boost of one job. Checked on the server; what was typed stays after an error. */
export function JobFieldsEditor({
  action,
  defaultValue,
  cancelHref,
}: {
  action: (previous: FormResult | undefined, formData: FormData) => Promise<FormResult>;
  defaultValue: JobFieldsForm;
  cancelHref: string;
}) {
  const { form, fields, formProps, pending } = useServerForm(action, {
    id: "job-fields",
    defaultValue,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onSubmit",
  });
  const fuel = fields.fuelKind.value ?? defaultValue.fuelKind;
  return (
    <form {...formProps} aria-label="Engine and fuel" className="flex flex-col gap-6" noValidate>
      <FormMessage errors={form.errors} />
      <FieldGroup title="Carburetor and engine" columns={3}>
        <Field label="Carburetor" htmlFor={fields.carburetor.id} errors={fields.carburetor.errors} errorId={fields.carburetor.errorId}>
          <Input {...getInputProps(fields.carburetor, { type: "text" })} key={fields.carburetor.key} />
        </Field>
        <QuantityField label="Displacement" field={fields.displacement} units={DISPLACEMENT_UNITS} />
        <QuantityField label="Target power" field={fields.targetPower} units={POWER_UNITS} optional />
      </FieldGroup>
      <FieldGroup title="Fuel" columns={3}>
        <SelectField label="Fuel" field={fields.fuelKind} options={FUEL_OPTIONS} />
        {fuel === "blend" ? <NumberField label="Ethanol content" field={fields.ethanolPct} suffix="%" hint="85 for E85." /> : null}
        {fuel === "custom" ? (
          <>
            <NumberField label="Fuel density" field={fields.fuelDensityKgM3} suffix="kg/m³" />
            <NumberField label="Stoichiometric AFR" field={fields.fuelStoichAfr} suffix=": 1" />
          </>
        ) : null}
      </FieldGroup>
      <FieldGroup title="Boost and target mixture" columns={3}>
        <QuantityField label="Peak boost" field={fields.peakBoost} units={BOOST_UNITS} />
        <NumberField label="Target lambda at 0 psi" field={fields.targetLambdaAtmosphere} suffix="λ" />
        <NumberField label="Target lambda at peak boost" field={fields.targetLambdaPeak} suffix="λ" />
      </FieldGroup>
      <SiteFields fields={{ ambientPressure: fields.ambientPressure, siteElevation: fields.siteElevation, cruiseLambda: fields.cruiseLambda, drillSystem: fields.drillSystem }} />
      <FieldGroup title="Charge air" columns={3}>
        <QuantityField label="Ambient temperature" field={fields.ambientTemperature} units={TEMPERATURE_UNITS} />
        <QuantityField
          label="Charge temperature"
          field={fields.chargeTemperature}
          units={TEMPERATURE_UNITS}
          optional
          hint="Measured; leave empty to estimate it from the compressor."
        />
        <NumberField label="Compressor efficiency" field={fields.compressorEfficiencyPct} suffix="%" />
        <CheckboxField field={fields.intercooled} label="Intercooled" />
        <NumberField label="Intercooler effectiveness" field={fields.intercoolerEffectivenessPct} suffix="%" />
      </FieldGroup>
      <FieldGroup title="Solving" columns={2}>
        <CheckboxField field={fields.useAllDrills} label="Solve with every standard drill" hint="Otherwise only the drills on the shop's rack." />
        <Field label="Notes" htmlFor={fields.notes.id} errors={fields.notes.errors} errorId={fields.notes.errorId}>
          <Textarea {...getTextareaProps(fields.notes)} key={fields.notes.key} />
        </Field>
      </FieldGroup>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : "Save engine and fuel"}
        </Button>
        <ButtonLink href={cancelHref} variant="quiet">
          Back to the job
        </ButtonLink>
      </div>
    </form>
  );
}
