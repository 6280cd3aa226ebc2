import { ALL_DRILLS } from "@/lib/engineering/drills";
import { planConversion, type BlockInput, type ConversionPlan, type EngineInput, type EnrichmentTarget } from "@/lib/engineering/conversion-plan";
import { fuelProperties, type FuelSpec } from "@/lib/engineering/fuels";
import type { Drill } from "@/lib/engineering/types";
import { restrictionDrillLimits } from "@/lib/engineering/restriction-limits";
import { isCurrentPlan, upgradePlan } from "@/lib/engineering/plan-upgrade";
import { STANDARD_ATMOSPHERE_PA } from "@/lib/engineering/units";
import type { Job } from "@/db/schema";
import type { BlockRow, StageRow } from "@/db/jobs";
import { RequestRefusal } from "@/db/refusal";

// Turns the stored job (SI columns) into the planner's inputs, and runs the planner.

export function fuelSpecOf(job: Pick<Job, "fuelKind" | "fuelEthanolPct" | "fuelDensityKgM3" | "fuelStoichAfr">): FuelSpec {
  switch (job.fuelKind) {
    case "blend":
      return { kind: "blend", ethanolPct: job.fuelEthanolPct ?? 85 };
    case "custom":
      return { kind: "custom", densityKgM3: job.fuelDensityKgM3 ?? 745, stoichAfr: job.fuelStoichAfr ?? 14.7 };
    default:
      return { kind: job.fuelKind };
  }
}

export function engineInputOf(job: Job): EngineInput {
  return {
    fuel: fuelProperties(fuelSpecOf(job)),
    peakBoostPa: job.peakBoostPa,
    ambientPressurePa: job.ambientPressurePa,
    cruiseLambda: job.cruiseLambda,
    targetLambdaAtmosphere: job.targetLambdaAtmosphere,
    targetLambdaPeak: job.targetLambdaPeak,
    ambientTemperatureK: job.ambientTemperatureK,
    chargeTemperatureK: job.chargeTemperatureK ?? undefined,
    compressorEfficiency: job.compressorEfficiency,
    intercoolerEffectiveness: job.intercooled ? job.intercoolerEffectiveness : undefined,
  };
}

function targetOf(stage: StageRow): EnrichmentTarget {
  switch (stage.targetKind) {
    case "afr":
      return { kind: "afr", from: stage.targetFrom ?? stage.targetTo, to: stage.targetTo };
    case "lambda":
      return { kind: "lambda", from: stage.targetFrom ?? stage.targetTo, to: stage.targetTo };
    case "percentMainJet":
      return { kind: "percentMainJet", percent: stage.targetTo };
    case "area":
      return { kind: "area", areaM2: stage.targetTo };
  }
}

const orUndefined = <T>(v: T | null): T | undefined => (v === null ? undefined : v);

export function blockInputOf(block: BlockRow): BlockInput {
  const hasPassage = block.passageDiameterM !== null && block.passageWallM !== null && block.passageDepthM !== null;
  const hasGrind = block.valveProtrusionM !== null && block.bossWallM !== null;
  const hasTube = block.tubeBendRadiusM !== null && block.tubeSwageM !== null;
  return {
    id: block.id,
    side: block.side,
    mainJetDiameterM: block.mainJetDiameterM,
    mainJetCount: block.mainJetCount,
    channelLengthM: orUndefined(block.channelLengthM),
    minWebM: orUndefined(block.minWebM),
    passage: hasPassage ? { diameterM: block.passageDiameterM!, wallM: block.passageWallM!, depthM: block.passageDepthM! } : undefined,
    grind: hasGrind
      ? {
          valveProtrusionM: block.valveProtrusionM!,
          measuredGapM: block.measuredGapM ?? 0,
          bossWallM: block.bossWallM!,
          runningClearanceM: orUndefined(block.runningClearanceM),
        }
      : undefined,
    tube: hasTube
      ? {
          runsM: block.tubeRunsM ?? [],
          bendDeg: block.tubeBendDeg ?? 0,
          bendRadiusM: block.tubeBendRadiusM!,
          swageM: block.tubeSwageM!,
          maxReach: { rearwardM: orUndefined(block.tubeMaxRearwardM), downwardM: orUndefined(block.tubeMaxDownwardM) },
        }
      : undefined,
    stages: block.stages.map((stage) => ({
      id: stage.id,
      valve:
        stage.valveKind === "vacuum"
          ? { kind: "vacuum" as const, ratingPa: stage.vacuumRatingPa ?? 0 }
          : { kind: "boost" as const, setpointPa: stage.setpointPa ?? 0 },
      target: targetOf(stage),
      mode: stage.mode,
      valveWindowAreaM2: orUndefined(stage.valveWindowAreaM2),
      maxHoles: stage.maxHoles,
      chosen: stage.chosenCount !== null && stage.chosenDrillLabel !== null ? { count: stage.chosenCount, drillLabel: stage.chosenDrillLabel } : undefined,
    })),
  };
}

/** Plans the job from its stored inputs. `stocked` is the rack; the job may ask for every standard drill. */
export function planJob(
  job: Job,
  blocks: BlockRow[],
  stocked: readonly Drill[],
  shop: { smallestRestrictionDrill: string; largestRestrictionDrill: string; minWebM: number },
): ConversionPlan {
  if (blocks.length === 0) throw new RequestRefusal(409, "Add the metering blocks and their stages before solving.", "blocks");
  const drills = job.useAllDrills ? ALL_DRILLS : stocked;
  if (drills.length === 0) throw new RequestRefusal(409, "The drill rack is empty: stock drills, or let this job use every standard drill.", "useAllDrills");
  try {
    const limits = restrictionDrillLimits({
      system: job.drillSystem,
      smallestDrillLabel: shop.smallestRestrictionDrill,
      largestDrillLabel: shop.largestRestrictionDrill,
    });
    return planConversion({ engine: engineInputOf(job), blocks: blocks.map(blockInputOf), drills, limits, minWebM: shop.minWebM });
  } catch (error) {
    if (error instanceof RangeError) throw new RequestRefusal(409, `The plan cannot be solved: ${error.message}`);
    throw error;
  }
}

/** Columns a job gained after some revisions were approved, with the values those revisions were planned on. */
const EARLIER_JOB_DEFAULTS = { ambientPressurePa: STANDARD_ATMOSPHERE_PA, siteElevationM: null, cruiseLambda: 1, drillSystem: "inch" } as const;

/** The job as an approved revision kept it, with the columns it did not yet have. */
export function snapshotJob(job: Record<string, unknown>): Job {
  return { ...EARLIER_JOB_DEFAULTS, ...job } as unknown as Job;
}

/** An approved revision's plan, ready for the present screens (see plan-upgrade.ts); the snapshot is not changed. */
export function snapshotPlan(snapshot: { job: Record<string, unknown>; blocks: BlockRow[]; plan: ConversionPlan }): ConversionPlan {
  if (isCurrentPlan(snapshot.plan)) return snapshot.plan;
  return upgradePlan(snapshot.plan, engineInputOf(snapshotJob(snapshot.job)), snapshot.blocks.map(blockInputOf));
}
