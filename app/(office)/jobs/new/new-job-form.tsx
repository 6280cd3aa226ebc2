"use client";

import { getInputProps, getTextareaProps } from "@conform-to/react";
import Link from "next/link";
import { FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { SelectField } from "@/components/forms/select-field";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button, buttonClass } from "@/components/ui/button";
import { Field, FormMessage, Input, Textarea } from "@/components/ui/field";
import { createJobAction } from "./actions";
import {
  BOOST_UNITS,
  DISPLACEMENT_UNITS,
  FUEL_OPTIONS,
  POWER_UNITS,
  TEMPERATURE_UNITS,
  type JobFieldsForm,
} from "../job-fields-shape";
import { CheckboxField } from "@/components/forms/checkbox-field";
import { SiteFields } from "../site-fields";

type NewJobFields = JobFieldsForm & { customerId?: string; newCustomerName?: string; tunerId?: string };

interface Choice {
  id: string;
  name: string;
}

const NEW_CUSTOMER = "";

/** Imperial shops get in³, hp, psi and °F first; metric shops litres, kW, kPa and °C. */
function startingValues(system: "imperial" | "metric", tunerId: string): NewJobFields {
  const imperial = system === "imperial";
  return {
    customerId: NEW_CUSTOMER,
    tunerId,
    fuelKind: "gasoline",
    displacement: { unit: imperial ? "in³" : "L" },
    targetPower: { unit: imperial ? "hp" : "kW" },
    peakBoost: { unit: imperial ? "psi" : "kPa" },
    targetLambdaAtmosphere: 0.88,
    targetLambdaPeak: 0.78,
    chargeTemperature: { unit: imperial ? "°F" : "°C" },
    ambientTemperature: imperial ? { value: 77, unit: "°F" } : { value: 25, unit: "°C" },
    compressorEfficiencyPct: 70,
    intercoolerEffectivenessPct: 70,
    ambientPressure: { unit: imperial ? "inHg" : "kPa" },
    siteElevation: { unit: imperial ? "ft" : "m" },
    cruiseLambda: 1.0,
    drillSystem: imperial ? "inch" : "metric",
  };
}

export function NewJobForm({
  customers,
  tuners,
  me,
  unitSystem,
}: {
  customers: Choice[];
  /** Tuners an admin may hand the job to; empty for a tuner, who opens jobs in their own name. */
  tuners: Choice[];
  me: Choice;
  unitSystem: "imperial" | "metric";
}) {
  const { form, fields, formProps, pending } = useServerForm(createJobAction, {
    id: "new-job",
    defaultValue: startingValues(unitSystem, me.id),
    // Checked on the server only (the unit conversion lives there): no round trip per keystroke.
    shouldValidate: "onSubmit",
    shouldRevalidate: "onSubmit",
  });
  const newCustomer = (fields.customerId.value ?? NEW_CUSTOMER) === NEW_CUSTOMER;
  const fuel = fields.fuelKind.value ?? "gasoline";
  const intercooled = fields.intercooled.value === "on";

  return (
    <form {...formProps} aria-label="New job" className="flex flex-col gap-7" noValidate>
      <FormMessage errors={form.errors} />

      <FieldGroup title="Customer and tuner" columns={3}>
        <SelectField
          label="Customer"
          field={fields.customerId}
          options={[{ value: NEW_CUSTOMER, label: "New customer (type the name)" }, ...customers.map((c) => ({ value: c.id, label: c.name }))]}
        />
        {newCustomer ? (
          <Field
            label="New customer's name"
            htmlFor={fields.newCustomerName.id}
            errors={fields.newCustomerName.errors}
            errorId={fields.newCustomerName.errorId}
            hint="Added to the customer list with this job."
          >
            <Input {...getInputProps(fields.newCustomerName, { type: "text" })} key={fields.newCustomerName.key} autoComplete="off" />
          </Field>
        ) : (
          <div aria-hidden className="hidden sm:block" />
        )}
        {tuners.length ? (
          <SelectField label="Tuner" field={fields.tunerId} options={tuners.map((t) => ({ value: t.id, label: t.name }))} hint="Who owns the fuel calibration." />
        ) : (
          <div className="flex flex-col gap-1 text-sm">
            <span className="font-semibold">Tuner</span>
            <span className="flex min-h-10 items-center text-graphite">{me.name} (you)</span>
          </div>
        )}
      </FieldGroup>

      <FieldGroup title="Engine" columns={3}>
        <Field
          label="Carburetor"
          htmlFor={fields.carburetor.id}
          errors={fields.carburetor.errors}
          errorId={fields.carburetor.errorId}
          hint="Size and build as written on the work order: four-barrel, cfm, secondary type."
        >
          <Input {...getInputProps(fields.carburetor, { type: "text" })} key={fields.carburetor.key} autoComplete="off" />
        </Field>
        <QuantityField label="Displacement" field={fields.displacement} units={DISPLACEMENT_UNITS} hint="Swept volume of the whole engine." />
        <QuantityField label="Target power" field={fields.targetPower} units={POWER_UNITS} optional hint="At the flywheel; sizes fuel demand from BSFC." />
      </FieldGroup>

      <FieldGroup title="Fuel" columns={3}>
        <SelectField label="Fuel" field={fields.fuelKind} options={FUEL_OPTIONS} />
        {fuel === "blend" ? (
          <NumberField label="Ethanol content" field={fields.ethanolPct} suffix="% vol" hint="85 for E85; the rest is gasoline." />
        ) : null}
        {fuel === "custom" ? (
          <>
            <NumberField label="Fuel density" field={fields.fuelDensityKgM3} suffix="kg/m³" hint="Near room temperature." />
            <NumberField label="Stoichiometric AFR" field={fields.fuelStoichAfr} suffix=": 1" hint="Air to fuel by mass." />
          </>
        ) : null}
      </FieldGroup>

      <FieldGroup title="Boost and mixture" columns={3}>
        <QuantityField label="Peak boost" field={fields.peakBoost} units={BOOST_UNITS} hint="Gauge pressure at the top of the boost range." />
        <NumberField
          label="Target lambda, atmospheric"
          field={fields.targetLambdaAtmosphere}
          suffix="λ"
          hint="0.88 is common practice for a boosted gasoline engine (no published source)."
        />
        <NumberField
          label="Target lambda, peak boost"
          field={fields.targetLambdaPeak}
          suffix="λ"
          hint="0.78 is common practice at peak boost on gasoline (no published source); the target runs straight between the two."
        />
      </FieldGroup>

      <SiteFields fields={{ ambientPressure: fields.ambientPressure, siteElevation: fields.siteElevation, cruiseLambda: fields.cruiseLambda, drillSystem: fields.drillSystem }} />
      <FieldGroup title="Charge air" columns={3}>
        <CheckboxField field={fields.intercooled} label="Intercooled" hint="Tick when the charge passes an intercooler before the carburetor." />
        <QuantityField
          label="Charge temperature"
          field={fields.chargeTemperature}
          units={TEMPERATURE_UNITS}
          optional
          hint="Measured at the carburetor hat at peak boost. Leave empty to estimate it from the compressor and intercooler."
        />
        <QuantityField label="Ambient temperature" field={fields.ambientTemperature} units={TEMPERATURE_UNITS} hint="Air at the compressor inlet." />
        <NumberField label="Compressor efficiency" field={fields.compressorEfficiencyPct} suffix="%" hint="Isentropic, at peak boost; 70 % when unknown." />
        <NumberField
          label="Intercooler effectiveness"
          field={fields.intercoolerEffectivenessPct}
          suffix="%"
          hint={intercooled ? "Share of the compressor's temperature rise it removes; 70 % when unknown." : "Used only when intercooled."}
        />
      </FieldGroup>

      <FieldGroup title="Planning" columns={2}>
        <CheckboxField
          field={fields.useAllDrills}
          label="Use every standard drill instead of the rack"
          hint="The solver normally picks from the drills on the shop's rack only."
        />
        <Field label="Notes" htmlFor={fields.notes.id} errors={fields.notes.errors} errorId={fields.notes.errorId}>
          <Textarea {...getTextareaProps(fields.notes)} key={fields.notes.key} rows={3} />
        </Field>
      </FieldGroup>

      <div className="flex flex-wrap items-center gap-3 border-t border-rule pt-5">
        <Button type="submit" disabled={pending}>
          {pending ? "Opening…" : "Open the job"}
        </Button>
        <Link href="/jobs" className={buttonClass("quiet")}>
          Cancel
        </Link>
      </div>
    </form>
  );
}
