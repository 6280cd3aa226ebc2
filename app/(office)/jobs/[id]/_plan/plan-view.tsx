import "server-only";
import type { BlockRow } from "@/db/jobs";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { Sheet } from "@/components/ui/sheet";
import { BenchWork } from "./bench-work";
import { BlockInputs } from "./block-inputs";
import { PlanSafety } from "./plan-safety";
import { PlanSummary } from "./plan-summary";
import { PlanWarnings } from "./plan-warnings";
import { StagePlanView, type ChooseLayout } from "./stage-plan";
import { StagingPanel } from "./staging-panel";
import { valveMarks } from "./staging-dto";

const SIDE_TITLE = { primary: "Primary metering block", secondary: "Secondary metering block" } as const;

/**
 * The solved plan beside the inputs it came from: stages and hole layouts per block, the fuel curve, and the
 * bench work with its safety notes. Read-only unless `choose` is given.
 */
export function PlanView({
  blocks,
  plan,
  unit,
  choose,
}: {
  blocks: BlockRow[];
  plan: ConversionPlan;
  unit: DisplayLengthUnit;
  choose?: ChooseLayout | undefined;
}) {
  const marks = valveMarks(blocks);
  return (
    <div className="flex flex-col gap-6">
      <PlanWarnings warnings={plan.warnings} />
      <Sheet title="At a glance">
        <PlanSummary blocks={blocks} plan={plan} marks={marks} unit={unit} />
      </Sheet>
      {plan.blocks.map((blockPlan) => {
        const block = blocks.find((b) => b.id === blockPlan.blockId);
        if (!block) return null;
        return (
          <Sheet key={block.id} title={SIDE_TITLE[block.side]}>
            <div className="grid gap-6 lg:grid-cols-[minmax(17rem,20rem)_minmax(0,1fr)]">
              <div className="self-start">
                <BlockInputs block={block} unit={unit} />
              </div>
              <section className="flex min-w-0 flex-col gap-4" aria-label={`${block.side} stages`}>
                {blockPlan.stages.map((stagePlan, i) => {
                  const stage = block.stages.find((s) => s.id === stagePlan.stageId);
                  return stage ? <StagePlanView key={stage.id} index={i} mark={marks.get(stage.id) ?? ""} stage={stage} plan={stagePlan} unit={unit} choose={choose} /> : null;
                })}
              </section>
            </div>
          </Sheet>
        );
      })}
      <Sheet title="Fuel curve across manifold pressure">
        <StagingPanel plan={plan} blocks={blocks} unit={unit} />
      </Sheet>
      <Sheet title="Bench work">
        <div className="flex flex-col gap-6">
          <PlanSafety plan={plan} />
          {plan.blocks.map((blockPlan) => (
            <section key={blockPlan.blockId} aria-label={`${blockPlan.side} bench work`} className="flex flex-col gap-3">
              <h3 className="border-b-2 border-ink pb-1 font-semibold">{SIDE_TITLE[blockPlan.side]}</h3>
              <BenchWork plan={blockPlan} unit={unit} />
            </section>
          ))}
        </div>
      </Sheet>
    </div>
  );
}
