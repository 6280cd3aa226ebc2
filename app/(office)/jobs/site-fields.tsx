"use client";

import type { FieldMetadata } from "@conform-to/react";
import { FieldGroup } from "@/components/forms/calculator-form";
import { NumberField } from "@/components/forms/number-field";
import { QuantityField } from "@/components/forms/quantity-field";
import { SelectField } from "@/components/forms/select-field";
import { AMBIENT_PRESSURE_UNITS, DRILL_SYSTEM_OPTIONS, ELEVATION_UNITS, type JobFieldsForm } from "./job-fields-shape";

type Field<K extends keyof JobFieldsForm> = FieldMetadata<JobFieldsForm[K], Record<string, unknown>, string[]>;

/**
 * Where the carburetor is jetted and how the engine cruises: the calibration point of the plan (a barometer
 * reading, or the site's elevation through the standard atmosphere), the cruise lambda under vacuum, and the
 * drill sizes the plan may use. Shared by the new-job and edit forms.
 */
export function SiteFields({
  fields,
}: {
  fields: { ambientPressure: Field<"ambientPressure">; siteElevation: Field<"siteElevation">; cruiseLambda: Field<"cruiseLambda">; drillSystem: Field<"drillSystem"> };
}) {
  return (
    <FieldGroup title="Site and cruise" columns={2}>
      <QuantityField
        label="Ambient pressure"
        field={fields.ambientPressure}
        units={AMBIENT_PRESSURE_UNITS}
        optional
        hint="A barometer's station reading (not the sea-level figure a weather report gives)."
      />
      <QuantityField label="Site elevation" field={fields.siteElevation} units={ELEVATION_UNITS} optional hint="Instead of a barometer: the standard atmosphere there." />
      <NumberField label="Cruise lambda" field={fields.cruiseLambda} suffix="λ" optional hint="The mixture wanted under vacuum; about 1.0 is usual." />
      <SelectField label="Drill sizes for the holes" field={fields.drillSystem} options={DRILL_SYSTEM_OPTIONS} />
    </FieldGroup>
  );
}
