import type { BenchOperation } from "@/db/bench";
import { formatArea, holesArea, toBenchSI, withinPlan, type BenchLengthUnit } from "../bench-units";
import type { Entry } from "./reading-input";
import { Verdict } from "./reading-feedback";

type Planned = BenchOperation["planned"][number];

/** Total flow area of the gauged holes against the planned area: the number the stage was sized by. */
export function RestrictionArea({ planned, entries }: { planned: Planned[]; entries: Entry[] }) {
  const unit: BenchLengthUnit = entries[0]?.unit === "mm" ? "mm" : "in";
  const plannedArea = holesArea(planned.map((m) => m.plannedSi));
  const minArea = holesArea(planned.map((m) => m.minSi));
  const maxArea = holesArea(planned.map((m) => m.maxSi));
  const diameters = entries.map((entry) => (entry.value === undefined ? undefined : toBenchSI(entry.value, entry.unit)));
  const complete = diameters.every((d) => d !== undefined);
  const actual = complete ? holesArea(diameters as number[]) : undefined;
  return (
    <div className="flex flex-col gap-1.5 rounded-[var(--radius-sheet)] border-2 border-ink px-3 py-2" data-testid="restriction-area">
      <p className="text-base font-semibold">Total hole area</p>
      <p className="text-sm text-graphite">
        Plan <span className="numeric font-semibold text-ink">{formatArea(plannedArea, unit)}</span> · accept{" "}
        <span className="numeric font-semibold text-ink">
          {formatArea(minArea, unit).split(" ")[0]}–{formatArea(maxArea, unit)}
        </span>
      </p>
      {actual === undefined ? (
        <p className="text-sm text-graphite">Enter every hole to see the total.</p>
      ) : (
        <>
          <p className="text-base">
            Gauged <span className="numeric text-lg font-bold">{formatArea(actual, unit)}</span>
          </p>
          <Verdict passed={withinPlan(actual, minArea, maxArea)} testId="verdict-area">
            {actual > maxArea ? `: above ${formatArea(maxArea, unit)}` : actual < minArea ? `: below ${formatArea(minArea, unit)}` : null}
          </Verdict>
        </>
      )}
    </div>
  );
}
