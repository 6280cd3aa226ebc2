// The plan for converting one carburetor's metering blocks: the restriction holes of every enrichment stage
// (sized on the whole engine's mixture, see stage-sizing.ts), the plug for the vacuum passage, the clearance
// grind, the secondary's pickup tube, the staging of the whole carburetor across manifold pressure with the
// mixture it predicts (plan-check.ts), and the operations at the bench in the order the work is done.
// Pure composition of the other trade computations; SI units throughout.

import { blockOperations, DEFAULT_MIN_BOSS_WALL_M } from "./bench-operations";
import { planGrind, type GrindPlan } from "./grind-plan";
import {
  MIXTURE_BAND,
  mixtureSweep,
  planStagingModel,
  stageOutcomes,
  stageWarnings,
  sweepWarnings,
  type PlanConditions,
  type StageOutcome,
} from "./plan-check";
import { byGravity, type PlanWarning } from "./plan-warnings";
import type { RestrictionDrillLimits } from "./restriction-limits";
import { planPickupTube, COMMON_PICKUP_TUBE_OD_M, type PickupTubePlan } from "./pickup-tube";
import { jetAreaOf, mainJetsBySide, sizeStages, stageMode, type StageInput, type StagePlan } from "./stage-sizing";
import { stagingBalance, type CarburetorSide, type StagingBalance, type StagingModel, type StagingSweep } from "./staging";
import { passagePlug, type MissingTooling, type PassagePlug, type PassagePlugResult } from "./passage-plug";
import { UNIFIED_THREADS } from "./threads";
import type { Drill, FuelProperties } from "./types";
import { M_PER_IN, PA_PER_INHG, PA_PER_PSI } from "./unit-factors";

export type { EnrichmentTarget, StageInput, StagePlan } from "./stage-sizing";
export type { PlanWarning } from "./plan-warnings";

/** Default running clearance between a boost valve and the ground boss (common practice, no published source). */
export const DEFAULT_RUNNING_CLEARANCE_M = 0.03 * M_PER_IN;
/** Default depth of one light pass with a die grinder (common practice, no published source). */
export const DEFAULT_GRIND_PASS_M = 0.01 * M_PER_IN;
/** Manifold vacuum at the bottom of the staging chart: a healthy idle, 20 inHg. */
export const STAGING_CHART_VACUUM_PA = 20 * PA_PER_INHG;
/** Acceptable mixture band for the staging chart and the stages: +/- 5 % of the fuel wanted. */
export const STAGING_BAND = MIXTURE_BAND;
/** Points of the plan's sweep (plus every valve's opening point). */
export const STAGING_SWEEP_POINTS = 61;

export interface BlockInput {
  id: string;
  side: CarburetorSide;
  mainJetDiameterM: number;
  mainJetCount: number;
  channelLengthM?: number | undefined;
  minWebM?: number | undefined;
  passage?: { diameterM: number; wallM: number; depthM: number } | undefined;
  grind?: { valveProtrusionM: number; measuredGapM: number; bossWallM: number; runningClearanceM?: number | undefined } | undefined;
  tube?:
    | {
        runsM: number[];
        bendDeg: number;
        bendRadiusM: number;
        swageM: number;
        /** Room the bowl leaves from the inlet tip; without it the fit is not checked. */
        maxReach?: { rearwardM?: number | undefined; downwardM?: number | undefined } | undefined;
      }
    | undefined;
  stages: StageInput[];
}

export interface EngineInput extends Omit<PlanConditions, "targetLambdaAtmosphere"> {
  fuel: FuelProperties;
  targetLambdaAtmosphere: number;
}

export type CautionTopic = "grinding" | "drilling" | "fuel" | "pressurizedBowls";

export interface PlannedMeasurement {
  key: string;
  label: string;
  quantity: "length" | "pressure";
  plannedSi: number;
  minSi: number;
  maxSi: number;
}

export interface PlannedOperation {
  number: number;
  kind: "grind" | "plug" | "pickupTube" | "restriction" | "valveSetting" | "finish";
  title: string;
  instructions: string;
  parameters: Record<string, string | number>;
  measurements: PlannedMeasurement[];
  caution: CautionTopic;
  /** The stage this operation serves, when it serves one. */
  stageId?: string | undefined;
}

/** A stage as planned, with the mixture the plan predicts around its opening point. */
export type SolvedStage = StagePlan & Omit<StageOutcome, "stageId">;

export interface BlockPlan {
  blockId: string;
  side: CarburetorSide;
  mainJetAreaM2: number;
  /** The block's stages in the order they were given. */
  stages: SolvedStage[];
  plug?: PassagePlug | undefined;
  /** Why the vacuum passage has no plug: nothing the shop has can plug it (what is missing is named). */
  plugRefusal?: { message: string; missing: MissingTooling } | undefined;
  grind?: GrindPlan | undefined;
  tube?: PickupTubePlan | undefined;
  operations: PlannedOperation[];
  warnings: PlanWarning[];
}

export interface ConversionPlan {
  blocks: BlockPlan[];
  staging: {
    /** The whole carburetor with the drilled layouts, in lambda; the chart and the API read it. */
    model: StagingModel;
    sweep: StagingSweep;
    fullThrottleFromGaugePa: number;
    balance: StagingBalance;
  };
  /** Every warning of the plan, most serious first. */
  warnings: PlanWarning[];
}

const psi = (pa: number) => `${(pa / PA_PER_PSI).toFixed(1)} psi`;
const inHg = (pa: number) => `${(pa / PA_PER_INHG).toFixed(1)} inHg`;

/** How a stage is named in messages: "Primary stage 2 (boost valve at 3.0 psi)". */
export function stageLabel(block: Pick<BlockInput, "side" | "stages">, stageId: string): string {
  const index = block.stages.findIndex((s) => s.id === stageId);
  const stage = block.stages[index];
  const valve = stage?.valve.kind === "vacuum" ? `vacuum valve at ${inHg(stage.valve.ratingPa)}` : `boost valve at ${psi(stage?.valve.setpointPa ?? 0)}`;
  return `${block.side === "primary" ? "Primary" : "Secondary"} stage ${index + 1} (${valve})`;
}

function plugOf(block: BlockInput, inchDrills: readonly Drill[]): PassagePlugResult | undefined {
  if (!block.passage) return undefined;
  return passagePlug({
    passageDiameterM: block.passage.diameterM,
    wallThicknessM: block.passage.wallM,
    depthAvailableM: block.passage.depthM,
    threads: UNIFIED_THREADS,
    drills: inchDrills.length ? inchDrills : undefined,
  });
}

function grindOf(block: BlockInput): GrindPlan | undefined {
  if (!block.grind) return undefined;
  return planGrind({
    valveProtrusionM: block.grind.valveProtrusionM,
    runningClearanceM: block.grind.runningClearanceM ?? DEFAULT_RUNNING_CLEARANCE_M,
    measuredGapM: block.grind.measuredGapM,
    maxDepthPerPassM: DEFAULT_GRIND_PASS_M,
    wallThicknessM: block.grind.bossWallM,
    minRemainingWallM: DEFAULT_MIN_BOSS_WALL_M,
  });
}

function tubeOf(block: BlockInput): PickupTubePlan | undefined {
  if (!block.tube || block.side !== "secondary") return undefined;
  const t = block.tube;
  return planPickupTube({
    segments: [
      ...(t.runsM[0] !== undefined ? [{ kind: "straight" as const, lengthM: t.runsM[0] }] : []),
      { kind: "bend" as const, angleRad: (t.bendDeg * Math.PI) / 180, centerlineRadiusM: t.bendRadiusM },
      ...t.runsM.slice(1).map((lengthM) => ({ kind: "straight" as const, lengthM })),
    ],
    swageEngagementM: t.swageM,
    outsideDiameterM: COMMON_PICKUP_TUBE_OD_M,
    maxReach: t.maxReach,
  });
}

function blockWarnings(
  block: BlockInput,
  stages: readonly StagePlan[],
  plug: PassagePlugResult | undefined,
  grind: GrindPlan | undefined,
  tube: PickupTubePlan | undefined,
): PlanWarning[] {
  const side = block.side === "primary" ? "Primary" : "Secondary";
  const about = { blockId: block.id };
  const warnings: PlanWarning[] = stages.flatMap((s) => s.warnings.map((w) => ({ ...w, message: `${stageLabel(block, s.stageId)}: ${w.message}` })));
  if (plug && !plug.ok) {
    // Without the plug a boost valve sees the same pressure on both sides and never opens.
    const boost = block.stages.some((s) => s.valve.kind === "boost");
    warnings.push({ code: "no_plug", level: boost ? "warning" : "caution", message: `${side} vacuum passage cannot be plugged with what the shop has: ${plug.message}`, ...about });
  }
  if (plug?.ok) for (const message of plug.plug.warnings) warnings.push({ code: "plug_note", level: "caution", message: `${side} passage plug: ${message}`, ...about });
  if (grind && !grind.ok && grind.reason) warnings.push({ code: "grind_refused", level: "warning", message: `${side} grind: ${grind.reason.message}`, ...about });
  if (tube && !tube.fitsBowl) {
    warnings.push({ code: "tube_does_not_fit", level: "warning", message: `${side} pickup tube reaches further than the bowl allows: shorten the runs or open the bend.`, ...about });
  }
  return warnings;
}

/**
 * Plans every block. `drills` is what the shop has (the rack, or the whole series); the restriction holes come
 * from those within `limits` (the plan's drill system and the shop's smallest and largest restriction drill,
 * defaults when absent), and inch drills among them serve the vacuum-passage plug, which takes a Unified
 * thread. `minWebM` is the shop's least web, used where a block gives none.
 */
export function planConversion(input: {
  engine: EngineInput;
  blocks: readonly BlockInput[];
  drills: readonly Drill[];
  limits?: RestrictionDrillLimits | undefined;
  minWebM?: number | undefined;
}): ConversionPlan {
  const { engine } = input;
  const inchDrills = input.drills.filter((d) => d.system !== "metric");
  for (const block of input.blocks) for (const stage of block.stages) stageMode(stage, block.side);

  const sized = sizeStages({
    blocks: input.blocks.map((b) => ({ ...b, mainJetAreaM2: jetAreaOf(b.mainJetDiameterM, b.mainJetCount) })),
    drills: input.drills,
    limits: input.limits,
    minWebM: input.minWebM,
  });
  const mainJets = mainJetsBySide(input.blocks.map((b) => ({ side: b.side, mainJetAreaM2: jetAreaOf(b.mainJetDiameterM, b.mainJetCount) })));
  const model = planStagingModel(engine, mainJets, sized.valves);
  const targets = new Map(input.blocks.flatMap((b) => b.stages.map((s) => [s.id, s.target] as const)));
  const outcomes = stageOutcomes(model, sized.stages, targets, engine.fuel.stoichAfr);
  const blockOf = (stage: StagePlan) => input.blocks.find((b) => b.id === stage.blockId) as BlockInput;
  const mixtureWarnings = stageWarnings(sized.stages, outcomes, targets, engine.fuel.stoichAfr, (s) => stageLabel(blockOf(s), s.stageId));
  const solved = new Map(sized.stages.map((s, i) => [s.stageId, { ...s, ...(outcomes[i] as StageOutcome) }]));

  const blocks = input.blocks.map((block): BlockPlan => {
    const stages = block.stages.map((s) => solved.get(s.id) as SolvedStage);
    const plug = plugOf(block, inchDrills);
    const grind = grindOf(block);
    const tube = tubeOf(block);
    const partial = {
      blockId: block.id,
      side: block.side,
      mainJetAreaM2: jetAreaOf(block.mainJetDiameterM, block.mainJetCount),
      stages,
      plug: plug?.ok ? plug.plug : undefined,
      plugRefusal: plug && !plug.ok ? { message: plug.message, missing: plug.missing } : undefined,
      grind,
      tube,
      warnings: blockWarnings(block, stages, plug, grind, tube),
    };
    return { ...partial, operations: blockOperations(block, partial) };
  });

  const { sweep, fullThrottleFromGaugePa } = mixtureSweep(model, -STAGING_CHART_VACUUM_PA, STAGING_SWEEP_POINTS);
  const balance = stagingBalance(model);
  const warnings = [...blocks.flatMap((b) => b.warnings), ...mixtureWarnings, ...sweepWarnings(sweep)];
  if (balance.secondaryFirst) {
    warnings.push({ code: "secondary_first", level: "notice", message: "Enrichment reaches the secondary before the primary: bring the primary in first to keep the carburetor square." });
  }
  return { blocks, staging: { model, sweep, fullThrottleFromGaugePa, balance }, warnings: byGravity(warnings) };
}
