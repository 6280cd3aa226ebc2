"use client";

import type { FieldMetadata } from "@conform-to/react";
import { QuantityField } from "@/components/forms/quantity-field";
import { SelectField } from "@/components/forms/select-field";
import { Button } from "@/components/ui/button";
import { FieldErrors } from "@/components/ui/field";
import { FORM_AREA_UNITS, FORM_OPENING_UNITS } from "@/lib/forms/quantity/units";
import { MAX_VALVES, type StagingInput } from "./schema";

type ValveFields = FieldMetadata<StagingInput["valves"], Record<string, unknown>, string[]>;

const KIND_OPTIONS = [
  { value: "vacuum", label: "Vacuum" },
  { value: "boost", label: "Boost" },
] as const;
const SIDE_OPTIONS = [
  { value: "primary", label: "Primary" },
  { value: "secondary", label: "Secondary" },
] as const;

/**
 * The power valves as table rows, one per valve, with add and remove. Conform's list intents work
 * without JavaScript too: the buttons submit the form, which comes back with the row added or removed.
 */
/** The props of a Conform intent button: a submit button that adds or removes a row. */
type IntentButton = { name: string; value: string; form: string; formNoValidate: boolean };

export function ValveRows({
  valves,
  addButton,
  removeButton,
}: {
  valves: ValveFields;
  addButton: IntentButton;
  removeButton: (index: number) => IntentButton;
}) {
  const rows = valves.getFieldList();
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-2 text-xs font-semibold uppercase tracking-[0.12em] text-pencil">Power valves</legend>
      <p className="text-xs text-pencil">
        A vacuum valve opens when the vacuum falls below its rating; a boost valve opens at its setpoint. Restriction area: the
        effective area its channel holes add when open.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" aria-label="Power valves">
          <thead>
            <tr className="text-left text-xs font-semibold uppercase tracking-wider text-graphite">
              <th className="w-10 border-b-2 border-ink px-2 py-2">No.</th>
              <th className="w-36 border-b-2 border-ink px-2 py-2">Kind</th>
              <th className="w-40 border-b-2 border-ink px-2 py-2">Side</th>
              <th className="border-b-2 border-ink px-2 py-2">Opens at (rating or setpoint)</th>
              <th className="border-b-2 border-ink px-2 py-2">Restriction area</th>
              <th className="w-24 border-b-2 border-ink px-2 py-2">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row, index) => {
              const valve = row.getFieldset();
              const n = index + 1;
              return (
                <tr key={row.key} className="align-top">
                  <td className="numeric border-b border-rule px-2 py-2 pt-4 font-semibold">{n}</td>
                  <td className="border-b border-rule px-2 py-2">
                    <SelectField label={`Valve ${n} kind`} field={valve.kind} options={KIND_OPTIONS} hideLabel />
                  </td>
                  <td className="border-b border-rule px-2 py-2">
                    <SelectField label={`Valve ${n} side`} field={valve.side} options={SIDE_OPTIONS} hideLabel />
                  </td>
                  <td className="border-b border-rule px-2 py-2">
                    <QuantityField label={`Valve ${n} opens at`} field={valve.opening} units={FORM_OPENING_UNITS} hideLabel />
                  </td>
                  <td className="border-b border-rule px-2 py-2">
                    <QuantityField label={`Valve ${n} restriction area`} field={valve.area} units={FORM_AREA_UNITS} hideLabel />
                  </td>
                  <td className="border-b border-rule px-2 py-2">
                    <Button type="submit" variant="quiet" {...removeButton(index)} aria-label={`Remove valve ${n}`}>
                      Remove
                    </Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <FieldErrors id={valves.errorId} errors={valves.errors} />
      {rows.length < MAX_VALVES ? (
        <Button
          type="submit"
          variant="secondary"
          className="self-start"
          {...addButton}
        >
          Add a valve
        </Button>
      ) : null}
    </fieldset>
  );
}
