"use client";

import { useServerForm } from "@/components/forms/use-server-form";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { setLengthUnitAction } from "./actions";

const CHOICES: { unit: DisplayLengthUnit; label: string; title: string }[] = [
  { unit: "in", label: "in", title: "Show sizes in inches" },
  { unit: "mm", label: "mm", title: "Show sizes in millimetres" },
];

/** Two-way inch/mm switch. Works without JavaScript: each half is a submit button of one small form. */
export function LengthUnitSwitch({ unit }: { unit: DisplayLengthUnit }) {
  const { formProps, lastResult: result, pending } = useServerForm(setLengthUnitAction, { id: "length-unit" });
  const failed = result && result.httpStatus !== 200;
  return (
    <form {...formProps} className="no-print flex items-center gap-2" aria-label="Length unit">
      <span className="text-xs font-semibold uppercase tracking-wider text-pencil" id="length-unit-label">
        Sizes in
      </span>
      <div role="group" aria-labelledby="length-unit-label" className="inline-flex rounded-[var(--radius-sheet)] border border-rule-strong bg-white">
        {CHOICES.map((choice) => {
          const active = choice.unit === unit;
          return (
            <button
              key={choice.unit}
              type="submit"
              name="lengthUnit"
              value={choice.unit}
              title={choice.title}
              aria-pressed={active}
              disabled={pending}
              className={`numeric min-h-10 min-w-12 px-3 text-sm font-semibold first:rounded-l-[var(--radius-sheet)] last:rounded-r-[var(--radius-sheet)] ${
                active ? "bg-ink text-white" : "text-graphite hover:bg-accent-soft"
              }`}
            >
              {choice.label}
            </button>
          );
        })}
      </div>
      {failed ? (
        <span role="alert" className="text-sm text-fault">
          {result.error?.[""]?.join(" ") ?? "Not saved."}
        </span>
      ) : null}
    </form>
  );
}
