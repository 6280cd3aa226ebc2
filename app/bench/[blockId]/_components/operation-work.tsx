import type { BenchOperation } from "@/db/bench";
import { SafetyNote } from "@/components/ui/safety-note";
import type { SafetyCaution } from "@/lib/safety/cautions";
import { defaultUnit, formatTolerance } from "../bench-units";
import { visibleParameters } from "../operation-terms";

type Planned = BenchOperation["planned"][number];

/** What to do, with what parameters, and the hazard: shown above the form, and again on request once signed. */
export function OperationWork({ operation, caution }: { operation: BenchOperation; caution: SafetyCaution | null }) {
  const parameters = visibleParameters(operation.parameters);
  return (
    <>
      <p className="text-base leading-relaxed">{operation.instructions}</p>
      {parameters.length ? (
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 border-y border-rule-strong text-base" aria-label="Parameters">
          {parameters.map(([label, value]) => (
            <div key={label} className="col-span-2 grid grid-cols-subgrid border-b border-rule py-1.5 last:border-b-0">
              <dt className="text-graphite">{label}</dt>
              <dd className="numeric text-right font-semibold whitespace-normal">{value}</dd>
            </div>
          ))}
        </dl>
      ) : null}
      {caution ? (
        <SafetyNote signal={caution.signal} title={caution.title} layout="stacked">
          {caution.text}
        </SafetyNote>
      ) : null}
    </>
  );
}

/** The readings a superseded or unreleased traveler asked for, without boxes to type into. */
export function PlannedReadings({ planned }: { planned: Planned[] }) {
  if (planned.length === 0) return null;
  return (
    <ul className="flex flex-col gap-1 text-base" aria-label="Planned readings">
      {planned.map((m) => (
        <li key={m.key}>
          {m.label}: <span className="numeric font-semibold">{formatTolerance(m.minSi, m.maxSi, defaultUnit(m.quantity))}</span>
        </li>
      ))}
    </ul>
  );
}
