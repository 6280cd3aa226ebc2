import type { BenchOperation } from "@/db/bench";
import type { FormResult } from "@/lib/forms/form-action";
import type { SafetyCaution } from "@/lib/safety/cautions";
import type { SignOffResult } from "../actions";
import { defaultUnit, formatIn } from "../bench-units";
import { ShopTime } from "../shop-time";
import { AmendForm } from "./amend-form";
import { OperationWork } from "./operation-work";

/** A signed operation folded down: who signed and when, what was measured, the note and photos; the work on request. */
export function SignedSummary({
  operation,
  caution,
  photoIds,
  lastResult,
  timeZone,
  canAmend,
}: {
  operation: BenchOperation;
  caution: SafetyCaution | null;
  photoIds: string[];
  lastResult: FormResult<SignOffResult> | undefined;
  timeZone: string;
  /** The signer or an admin, while the job is in machining. */
  canAmend: boolean;
}) {
  const signOff = operation.signOff!;
  const already = lastResult?.httpStatus === 200 && lastResult.data?.recorded === false;
  return (
    <div className="flex flex-col gap-3 px-4 py-3">
      <p className="text-base" data-testid="signed-by">
        Signed by <strong>{signOff.by}</strong> at <ShopTime iso={signOff.at} timeZone={timeZone} withDay />
      </p>
      {already ? (
        <p role="status" className="rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-3 py-2 font-semibold">
          Already signed: nothing was recorded twice.
        </p>
      ) : lastResult?.httpStatus === 200 && lastResult.message && (lastResult.data?.failed.length || lastResult.data?.verified) ? (
        <p role="status" className={`font-semibold ${lastResult.data?.failed.length ? "text-fault" : "text-accent-strong"}`}>
          {lastResult.message}
        </p>
      ) : null}
      {operation.planned.length ? (
        <ul className="flex flex-col gap-1.5" aria-label="Recorded readings">
          {operation.planned.map((m) => {
            const reading = operation.recorded.find((r) => r.key === m.key);
            return (
              <li key={m.key} className="flex flex-wrap items-baseline justify-between gap-x-3 border-b border-rule pb-1">
                <span className="text-graphite">{m.label}</span>
                {reading ? (
                  <span className="flex items-baseline gap-2">
                    <span className="numeric font-semibold">{formatIn(reading.valueSi, defaultUnit(m.quantity))}</span>
                    <span className={`text-sm font-bold ${reading.passed ? "text-accent-strong" : "text-fault"}`}>
                      {reading.passed ? "✓ within plan" : "✗ outside plan"}
                    </span>
                  </span>
                ) : (
                  <span className="text-pencil">not recorded</span>
                )}
              </li>
            );
          })}
        </ul>
      ) : null}
      {operation.amendments.length ? (
        <ul className="flex flex-col gap-1 text-sm" aria-label="Corrected readings">
          {operation.amendments.map((a, i) => {
            const planned = operation.planned.find((m) => m.key === a.key);
            const unit = defaultUnit(planned?.quantity ?? "length");
            return (
              <li key={i} className="border-l-4 border-rule-strong pl-2">
                <span className="font-semibold">{planned?.label ?? a.key}</span> corrected from <span className="numeric line-through">{formatIn(a.previousValueSi, unit)}</span> to{" "}
                <span className="numeric font-semibold">{formatIn(a.valueSi, unit)}</span> by {a.by} at <ShopTime iso={a.at} timeZone={timeZone} withDay />: {a.reason}
              </li>
            );
          })}
        </ul>
      ) : null}
      {signOff.note ? <p className="text-base">Note: {signOff.note}</p> : null}
      {canAmend && operation.planned.length ? <AmendForm operation={operation} /> : null}
      {photoIds.length ? (
        <ul className="grid grid-cols-4 gap-2" aria-label="Photos of this operation">
          {photoIds.map((id) => (
            <li key={id}>
              <a href={`/api/photos/${id}`} className="block">
                {/* eslint-disable-next-line @next/next/no-img-element -- our own thumbnail route */}
                <img src={`/api/photos/${id}?size=thumb`} alt="Photo of this operation" className="aspect-square w-full rounded-[var(--radius-sheet)] border-2 border-ink object-cover" />
              </a>
            </li>
          ))}
        </ul>
      ) : null}
      <details className="group">
        <summary className="flex min-h-11 cursor-pointer items-center font-semibold text-accent underline">Show the work again</summary>
        <div className="flex flex-col gap-3 pt-2">
          <OperationWork operation={operation} caution={caution} />
        </div>
      </details>
    </div>
  );
}
