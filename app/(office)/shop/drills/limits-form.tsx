"use client";

import { getSelectProps } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { QuantityField } from "@/components/forms/quantity-field";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Select } from "@/components/ui/field";
import { FORM_LENGTH_UNITS, type FormLengthUnit } from "@/lib/forms/quantity/units";
import { saveShopLimitsAction } from "./actions";
import { shopLimitsSchema } from "./schema";

export interface DrillChoiceGroup {
  title: string;
  drills: { label: string; size: string }[];
}

/** One restriction limit as the page shows it: what is in force, and what the shop stored (null: default). */
export interface LimitValue {
  /** In force, written for the viewer: "#70 (0.0280 in)" or "0.0200 in". */
  shown: string;
  isDefault: boolean;
  /** What the form starts from: the stored label or length in the viewer's unit, "" for the default. */
  stored: string;
}

export interface ShopLimitsValues {
  smallestRestrictionDrill: LimitValue;
  largestRestrictionDrill: LimitValue;
  minWeb: LimitValue;
  /** The defaults, written for the viewer. */
  defaults: { smallestRestrictionDrill: string; largestRestrictionDrill: string; minWeb: string };
}

/** The shop's restriction limits: an admin edits them, everyone else reads them. */
export function ShopLimits({
  values,
  groups,
  unit,
  canEdit,
}: {
  values: ShopLimitsValues;
  groups: DrillChoiceGroup[];
  unit: FormLengthUnit;
  canEdit: boolean;
}) {
  if (!canEdit) {
    const rows: [string, LimitValue][] = [
      ["Smallest restriction drill", values.smallestRestrictionDrill],
      ["Largest restriction drill", values.largestRestrictionDrill],
      ["Least web between holes", values.minWeb],
    ];
    return (
      <div className="flex flex-col gap-3">
        <dl className="grid grid-cols-[max-content_1fr] gap-x-6 gap-y-1 text-sm">
          {rows.map(([term, value]) => (
            <div key={term} className="contents">
              <dt className="text-graphite">{term}</dt>
              <dd className="numeric font-semibold text-ink">
                {value.shown}
                {value.isDefault ? <span className="ml-2 font-normal text-pencil">(default)</span> : null}
              </dd>
            </div>
          ))}
        </dl>
        <p className="text-sm text-pencil">Only an admin changes the limits.</p>
      </div>
    );
  }
  return <ShopLimitsForm values={values} groups={groups} unit={unit} />;
}

function ShopLimitsForm({ values, groups, unit }: { values: ShopLimitsValues; groups: DrillChoiceGroup[]; unit: FormLengthUnit }) {
  const { form, fields, formProps, lastResult, pending } = useServerForm(saveShopLimitsAction, {
    id: "shop-limits",
    defaultValue: {
      smallestRestrictionDrill: values.smallestRestrictionDrill.stored,
      largestRestrictionDrill: values.largestRestrictionDrill.stored,
      minWeb: { value: values.minWeb.stored, unit },
    },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: shopLimitsSchema }),
  });
  const drillSelect = (field: typeof fields.smallestRestrictionDrill, label: string, fallback: string, hint: string) => (
    <Field label={label} htmlFor={field.id} errors={field.errors} errorId={field.errorId} hint={hint}>
      <Select {...getSelectProps(field)} key={field.key} className="numeric">
        <option value="">Default: {fallback}</option>
        {groups.map((group) => (
          <optgroup key={group.title} label={group.title}>
            {group.drills.map((drill) => (
              <option key={drill.label} value={drill.label}>
                {drill.label} ({drill.size})
              </option>
            ))}
          </optgroup>
        ))}
      </Select>
    </Field>
  );
  return (
    <form {...formProps} aria-label="Restriction limits" className="flex max-w-xl flex-col gap-4" noValidate>
      <FormMessage errors={form.errors} success={lastResult?.httpStatus === 200 ? lastResult.message : undefined} />
      {drillSelect(
        fields.smallestRestrictionDrill,
        "Smallest restriction drill",
        values.defaults.smallestRestrictionDrill,
        "Smaller drills break easily and their holes are hard to check with pin gauges.",
      )}
      {drillSelect(
        fields.largestRestrictionDrill,
        "Largest restriction drill",
        values.defaults.largestRestrictionDrill,
        "Larger holes hardly restrict next to the valve's own flow window.",
      )}
      <QuantityField
        label="Least web between holes"
        field={fields.minWeb}
        units={FORM_LENGTH_UNITS}
        optional
        hint={`Metal left between neighbouring holes in a channel. Empty: ${values.defaults.minWeb}.`}
      />
      <div>
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : "Save limits"}
        </Button>
      </div>
    </form>
  );
}
