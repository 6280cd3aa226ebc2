import "server-only";
import type { StageRow } from "@/db/jobs";
import type { SolvedStage } from "@/lib/engineering/conversion-plan";
import type { DisplayLengthUnit } from "@/lib/format/display";
import type { FormResult } from "@/lib/forms/form-action";
import { Tag } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { areaBoth, drillSize, signedPercent } from "./format";
import { PlanWarningItem } from "./plan-warnings";
import { UseLayoutButton } from "./use-layout-button";
import { targetText, valveText } from "./stage-terms";

const MODE_TEXT = { part: "part throttle (primary side alone)", full: "full throttle (both sides)" } as const;
const BASIS_TEXT = {
  engine: (mode: "part" | "full", area: string) => `Sized on the whole engine: all the metering area open in ${MODE_TEXT[mode]} just below its opening, ${area}.`,
  block: (_mode: "part" | "full", area: string) => `A per-block figure: a percent of this block's own main jets, ${area}; the other side is not counted.`,
  area: () => "An area given directly.",
} as const;

export type ChooseLayout = (previous: FormResult | undefined, formData: FormData) => Promise<FormResult>;

/**
 * One enrichment stage: what the tuner asked for, the area that takes, and the solver's hole layouts with
 * the one in use marked. `choose` is absent where the page is read-only.
 */
export function StagePlanView({
  index,
  mark,
  stage,
  plan,
  unit,
  choose,
}: {
  index: number;
  /** The valve's mark on the staging chart: P1, S2 … */
  mark: string;
  stage: StageRow;
  plan: SolvedStage;
  unit: DisplayLengthUnit;
  choose?: ChooseLayout | undefined;
}) {
  const target = areaBoth(plan.targetAreaM2, unit);
  const chosen = plan.chosen;
  return (
    <article aria-label={`Stage ${index + 1}`} className="flex flex-col gap-3 border-t border-rule pt-4 first:border-t-0 first:pt-0">
      <header className="grid gap-x-6 gap-y-1 sm:grid-cols-[auto_1fr_auto] sm:items-baseline">
        <h4 className="font-semibold">
          Stage {index + 1} <span className="numeric text-graphite">· {mark}</span>
        </h4>
        <p className="text-sm text-graphite">
          {valveText(stage)} · target {targetText(stage, unit)} ({signedPercent(plan.extraFuelFraction * 100)} fuel)
          {stage.valveWindowAreaM2 !== null ? <> · valve window {areaBoth(stage.valveWindowAreaM2, unit).first}</> : null}
        </p>
        <p className="text-sm" data-testid="stage-target-area">
          needs <span className="numeric font-semibold">{target.first}</span> <span className="numeric text-graphite">· {target.second}</span>
        </p>
        <p className="text-sm text-graphite sm:col-span-3" data-testid="stage-basis">
          {BASIS_TEXT[plan.basis](plan.mode, areaBoth(plan.basisAreaM2, unit).first)}
          {Number.isFinite(plan.achievedLambda) ? (
            <>
              {" "}
              Predicted lambda <span className="numeric">{plan.beforeLambda.toFixed(3)}</span> before it opens,{" "}
              <span className="numeric font-semibold" data-testid="stage-achieved-lambda">
                {plan.achievedLambda.toFixed(3)}
              </span>{" "}
              after, against <span className="numeric">{plan.targetLambda.toFixed(3)}</span>.
            </>
          ) : (
            " Approved before plans predicted each stage's mixture."
          )}
        </p>
      </header>
      <Table aria-label={`Hole layouts for stage ${index + 1}`}>
        <thead>
          <tr>
            <Th>Layout</Th>
            <Th numeric>Drill size</Th>
            <Th numeric>Effective area</Th>
            <Th numeric>{unit === "in" ? "mm²" : "in²"}</Th>
            <Th numeric>Error</Th>
            <Th>Fits</Th>
            <Th>Valve-limited</Th>
            <Th className="no-print">
              <span className="sr-only">Choice</span>
            </Th>
          </tr>
        </thead>
        <tbody>
          {plan.candidates.map((candidate) => {
            const isChosen = candidate.count === chosen.count && candidate.drill.label === chosen.drill.label;
            const effective = areaBoth(candidate.effectiveAreaM2, unit);
            const layout = `${candidate.count} × ${candidate.drill.label}`;
            return (
              <tr key={`${candidate.count}-${candidate.drill.label}`} className={isChosen ? "bg-accent-soft font-semibold" : ""} data-chosen={isChosen || undefined}>
                <Td className="numeric">{layout}</Td>
                <Td numeric>{drillSize(candidate.drill.diameterM, unit)}</Td>
                <Td numeric>{effective.first}</Td>
                <Td numeric className="text-graphite">
                  {effective.second}
                </Td>
                <Td numeric>{signedPercent(candidate.errorPct)}</Td>
                <Td>{candidate.fits ? "yes" : <Tag tone="fault">no</Tag>}</Td>
                <Td>{candidate.valveLimited ? <Tag tone="fault">limited</Tag> : "no"}</Td>
                <Td className="no-print text-right">
                  {isChosen ? (
                    <span className="whitespace-nowrap">
                      <Tag tone="accent">chosen · by {plan.chosenBy}</Tag>
                    </span>
                  ) : choose ? (
                    <UseLayoutButton action={choose} stageId={stage.id} count={candidate.count} drillLabel={candidate.drill.label} layout={layout} />
                  ) : null}
                </Td>
              </tr>
            );
          })}
        </tbody>
      </Table>
      <p className="text-xs text-pencil">
        In use: {chosen.count} × {chosen.drill.label}, {signedPercent(chosen.errorPct)} against the target
        {plan.chosenBy === "tuner" ? ", picked by the tuner." : ", the solver's closest layout."}
      </p>
      {plan.warnings.length ? (
        <ul className="flex flex-col gap-1 text-sm">
          {plan.warnings.map((w, i) => (
            <PlanWarningItem key={`${w.code}-${i}`} warning={w} />
          ))}
        </ul>
      ) : null}
    </article>
  );
}
