"use client";

import { getInputProps } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { QuantityField } from "@/components/forms/quantity-field";
import { useServerForm } from "@/components/forms/use-server-form";
import { Button } from "@/components/ui/button";
import { Field, FormMessage, Input } from "@/components/ui/field";
import { saveLogSettingsAction } from "./actions";
import { logSettingsSchema } from "./schema";

export interface LogSettingsValues {
  fullThrottleAbovePct: { shown: string; stored: string; isDefault: boolean };
  binWidth: { shown: string; stored: string; isDefault: boolean };
  defaults: { fullThrottleAbovePct: string; binWidth: string };
}

/** How dyno logs are read: an admin edits, everyone else reads. */
export function LogSettings({ values, canEdit }: { values: LogSettingsValues; canEdit: boolean }) {
  if (!canEdit) {
    return (
      <dl className="grid grid-cols-[max-content_1fr] gap-x-6 gap-y-1 text-sm">
        <dt className="text-graphite">Full throttle above</dt>
        <dd className="numeric font-semibold">
          {values.fullThrottleAbovePct.shown}
          {values.fullThrottleAbovePct.isDefault ? <span className="ml-2 font-normal text-pencil">(default)</span> : null}
        </dd>
        <dt className="text-graphite">Pressure bin width</dt>
        <dd className="numeric font-semibold">
          {values.binWidth.shown}
          {values.binWidth.isDefault ? <span className="ml-2 font-normal text-pencil">(default)</span> : null}
        </dd>
      </dl>
    );
  }
  return <LogSettingsForm values={values} />;
}

function LogSettingsForm({ values }: { values: LogSettingsValues }) {
  const { form, fields, formProps, lastResult, pending } = useServerForm(saveLogSettingsAction, {
    id: "log-settings",
    defaultValue: { fullThrottleAbovePct: values.fullThrottleAbovePct.stored, binWidth: { value: values.binWidth.stored, unit: "psi" } },
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) => parseWithZod(formData, { schema: logSettingsSchema }),
  });
  return (
    <form {...formProps} aria-label="Log settings" className="flex max-w-xl flex-col gap-4" noValidate>
      <FormMessage errors={form.errors} success={lastResult?.httpStatus === 200 ? lastResult.message : undefined} />
      <Field
        label="Full throttle above (%)"
        htmlFor={fields.fullThrottleAbovePct.id}
        errors={fields.fullThrottleAbovePct.errors}
        errorId={fields.fullThrottleAbovePct.errorId}
        hint={`A reading with the throttle opened further counts as full throttle. Empty: ${values.defaults.fullThrottleAbovePct}.`}
      >
        <Input {...getInputProps(fields.fullThrottleAbovePct, { type: "text" })} key={fields.fullThrottleAbovePct.key} inputMode="decimal" className="numeric" />
      </Field>
      <QuantityField
        label="Pressure bin width"
        field={fields.binWidth}
        units={["psi", "kPa"] as const}
        optional
        hint={`Readings are grouped by manifold pressure in steps this wide. Empty: ${values.defaults.binWidth}.`}
      />
      <div>
        <Button type="submit" disabled={pending}>
          {pending ? "Saving…" : "Save log settings"}
        </Button>
      </div>
    </form>
  );
}
