// Reading a plan kept by an older revision. Snapshots are immutable: what was approved stays as it was. Plans
// approved before the whole-engine model kept their warnings as plain sentences and no staging model or
// predicted mixtures; those parts are filled in here for display only (the warnings as notes, the model of the
// drilled layouts under the present physics), never written back.

import type { BlockInput, BlockPlan, ConversionPlan, EngineInput, SolvedStage } from "./conversion-plan";
import { mixtureSweep, planStagingModel, type StageOutcome } from "./plan-check";
import type { PlanWarning } from "./plan-warnings";
import { jetAreaOf, mainJetsBySide, stageMode, stageOpeningGaugePa } from "./stage-sizing";
import type { PowerValve } from "./staging";

const note = (w: PlanWarning | string): PlanWarning => (typeof w === "string" ? { code: "plan_note", level: "caution", message: w } : w);

/** True when the plan already has everything the present screens read. */
export function isCurrentPlan(plan: ConversionPlan): boolean {
  return plan.staging?.model !== undefined && plan.warnings.every((w) => typeof w !== "string");
}

export function upgradePlan(plan: ConversionPlan, engine: EngineInput, blocks: readonly BlockInput[]): ConversionPlan {
  if (isCurrentPlan(plan)) return plan;
  const valves: PowerValve[] = [];
  const blockPlans: BlockPlan[] = plan.blocks.map((blockPlan) => {
    const block = blocks.find((b) => b.id === blockPlan.blockId);
    const stages = blockPlan.stages.map((stage): SolvedStage => {
      const input = block?.stages.find((s) => s.id === stage.stageId);
      const openingGaugePa = input ? stageOpeningGaugePa(input.valve) : 0;
      const area = stage.chosen?.effectiveAreaM2 ?? 0;
      if (input) {
        valves.push(
          input.valve.kind === "vacuum"
            ? { id: input.id, side: blockPlan.side, kind: "vacuum", ratingPa: input.valve.ratingPa, restrictionAreaM2: area }
            : { id: input.id, side: blockPlan.side, kind: "boost", setpointPa: input.valve.setpointPa, restrictionAreaM2: area },
        );
      }
      const outcome: Omit<StageOutcome, "stageId"> = { targetLambda: Number.NaN, achievedLambda: Number.NaN, beforeLambda: Number.NaN };
      return {
        ...outcome,
        ...stage,
        blockId: blockPlan.blockId,
        side: blockPlan.side,
        mode: stage.mode ?? (input ? stageMode(input, blockPlan.side) : "full"),
        openingGaugePa: stage.openingGaugePa ?? openingGaugePa,
        basis: stage.basis ?? "block",
        basisAreaM2: stage.basisAreaM2 ?? blockPlan.mainJetAreaM2,
        warnings: (stage.warnings as (PlanWarning | string)[]).map(note),
      };
    });
    return { ...blockPlan, stages, warnings: (blockPlan.warnings as (PlanWarning | string)[]).map(note) };
  });
  const mainJets = mainJetsBySide(blocks.map((b) => ({ side: b.side, mainJetAreaM2: jetAreaOf(b.mainJetDiameterM, b.mainJetCount) })));
  const model = planStagingModel(engine, mainJets, valves);
  const { sweep, fullThrottleFromGaugePa } = mixtureSweep(model, plan.staging.sweep.gaugePa[0] ?? 0, 61);
  return {
    blocks: blockPlans,
    staging: { model, sweep, fullThrottleFromGaugePa, balance: plan.staging.balance },
    warnings: (plan.warnings as (PlanWarning | string)[]).map(note),
  };
}
