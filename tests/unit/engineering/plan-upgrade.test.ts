import { describe, expect, it } from "vitest";
import { planConversion, type BlockInput, type ConversionPlan, type EngineInput } from "@/lib/engineering/conversion-plan";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { GASOLINE } from "@/lib/engineering/fuels";
import { isCurrentPlan, upgradePlan } from "@/lib/engineering/plan-upgrade";
import { M_PER_IN, PA_PER_INHG, PA_PER_PSI, PA_STANDARD_ATMOSPHERE } from "./nist-factors";

const engine: EngineInput = {
  fuel: GASOLINE,
  peakBoostPa: 8 * PA_PER_PSI,
  targetLambdaAtmosphere: 0.88,
  targetLambdaPeak: 0.8,
  cruiseLambda: 1,
  ambientPressurePa: PA_STANDARD_ATMOSPHERE,
  ambientTemperatureK: 298.15,
  compressorEfficiency: 0.7,
  intercoolerEffectiveness: 0.7,
};
const blocks: BlockInput[] = [
  {
    id: "p",
    side: "primary",
    mainJetDiameterM: 0.076 * M_PER_IN,
    mainJetCount: 2,
    stages: [
      { id: "v", valve: { kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG }, target: { kind: "percentMainJet", percent: 12 }, maxHoles: 4 },
      { id: "b", valve: { kind: "boost", setpointPa: 3 * PA_PER_PSI }, target: { kind: "percentMainJet", percent: 20 }, maxHoles: 4 },
    ],
  },
];

/** The plan as a revision approved before the whole-engine model kept it: sentences, no model, no mixtures. */
function earlierShape(plan: ConversionPlan): ConversionPlan {
  const { model: _model, fullThrottleFromGaugePa: _full, ...staging } = plan.staging;
  return {
    blocks: plan.blocks.map((b) => ({
      ...b,
      warnings: ["The holes do not fit the channel with the minimum web between them."],
      stages: b.stages.map(({ stageId, extraFuelFraction, targetAreaM2, candidates, chosen, chosenBy }) => ({ stageId, extraFuelFraction, targetAreaM2, candidates, chosen, chosenBy, warnings: [] })),
    })),
    staging,
    warnings: ["primary: The holes do not fit the channel with the minimum web between them."],
  } as unknown as ConversionPlan;
}

describe("reading a plan kept by an older revision", () => {
  const current = planConversion({ engine, blocks, drills: ALL_DRILLS });
  const old = earlierShape(current);

  it("leaves a current plan as it is", () => {
    expect(isCurrentPlan(current)).toBe(true);
    expect(upgradePlan(current, engine, blocks)).toBe(current);
  });

  it("turns sentences into notes and rebuilds the model of the drilled layouts, keeping the layouts", () => {
    expect(isCurrentPlan(old)).toBe(false);
    const upgraded = upgradePlan(old, engine, blocks);
    expect(isCurrentPlan(upgraded)).toBe(true);
    expect(upgraded.warnings).toEqual([{ code: "plan_note", level: "caution", message: "primary: The holes do not fit the channel with the minimum web between them." }]);
    expect(upgraded.blocks[0]!.stages.map((s) => s.chosen)).toEqual(current.blocks[0]!.stages.map((s) => s.chosen));
    // The same drilled areas under the same physics give the same supplied area at peak.
    expect(upgraded.staging.sweep.full.suppliedM2.at(-1)).toBeCloseTo(current.staging.sweep.full.suppliedM2.at(-1)!, 12);
    expect(Number.isNaN(upgraded.blocks[0]!.stages[0]!.achievedLambda)).toBe(true);
  });
});
