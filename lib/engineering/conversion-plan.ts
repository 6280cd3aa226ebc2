// The plan for converting one carburetor's metering blocks: the restriction holes of every enrichment stage,
// the plug for the vacuum passage, the clearance grind, the secondary's pickup tube, the staging of the whole
// carburetor across manifold pressure, and the operations at the bench in the order the work is done.
// Pure composition of the other trade computations; SI units throughout.

import { addedAreaForExtraFuel, extraFuelFromAfr, extraFuelFromLambda } from "./enrichment";
import { planGrind, type GrindPlan } from "./grind-plan";
import { solveHoleLayout, type HoleLayoutCandidate } from "./hole-layout";
import { circleArea } from "./orifice";
import { planPickupTube, COMMON_PICKUP_TUBE_OD_M, type PickupTubePlan } from "./pickup-tube";
import {
  stagingBalance,
  sweepStaging,
  type CarburetorSide,
  type PowerValve,
  type StagingBalance,
  type StagingModel,
  type StagingSweep,
} from "./staging";
import { passagePlug, UNIFIED_THREADS, type PassagePlug } from "./threads";
import type { Drill, FuelProperties } from "./types";
import { PA_PER_INHG, STANDARD_ATMOSPHERE_PA } from "./units";

const M_PER_IN = 0.0254;
const PA_PER_PSI = 6894.757;

// Bench tolerances (common practice, no published source): a twist drill in a small hole cuts within about
// a thousandth of an inch of size; a boost valve is set within half a psi; a grind may stop a few
// thousandths short of plan when the clay shows clearance.
export const HOLE_DIAMETER_TOLERANCE_M = 0.001 * M_PER_IN;
export const OPENING_PRESSURE_TOLERANCE_PA = 0.5 * PA_PER_PSI;
export const GRIND_DEPTH_SHORTFALL_M = 0.005 * M_PER_IN;
/** Default running clearance between a boost valve and the ground boss (common practice, no published source). */
export const DEFAULT_RUNNING_CLEARANCE_M = 0.03 * M_PER_IN;
/** Default least wall left behind the ground boss (common practice, no published source). */
export const DEFAULT_MIN_BOSS_WALL_M = 0.06 * M_PER_IN;
/** Default depth of one light pass with a die grinder (common practice, no published source). */
export const DEFAULT_GRIND_PASS_M = 0.01 * M_PER_IN;
/** Manifold vacuum at the bottom of the staging chart: a healthy idle, 20 inHg. */
export const STAGING_CHART_VACUUM_PA = 20 * PA_PER_INHG;
/** Acceptable mixture band for the staging chart: +/- 5 % of the fuel wanted (common practice, no published source). */
export const STAGING_BAND = 0.05;

export type EnrichmentTarget =
  | { kind: "afr"; from: number; to: number }
  | { kind: "lambda"; from: number; to: number }
  | { kind: "percentMainJet"; percent: number }
  | { kind: "area"; areaM2: number };

export interface StageInput {
  id: string;
  valve: { kind: "vacuum"; ratingPa: number } | { kind: "boost"; setpointPa: number };
  target: EnrichmentTarget;
  valveWindowAreaM2?: number | undefined;
  maxHoles: number;
  /** The tuner's pick among the candidates; the solver's first when absent or no longer offered. */
  chosen?: { count: number; drillLabel: string } | undefined;
}

export interface BlockInput {
  id: string;
  side: CarburetorSide;
  mainJetDiameterM: number;
  mainJetCount: number;
  channelLengthM?: number | undefined;
  minWebM?: number | undefined;
  passage?: { diameterM: number; wallM: number; depthM: number } | undefined;
  grind?: { valveProtrusionM: number; measuredGapM: number; bossWallM: number; runningClearanceM?: number | undefined } | undefined;
  tube?: { runsM: number[]; bendDeg: number; bendRadiusM: number; swageM: number } | undefined;
  stages: StageInput[];
}

export interface EngineInput {
  fuel: FuelProperties;
  peakBoostPa: number;
  targetLambdaAtmosphere: number;
  targetLambdaPeak: number;
  ambientTemperatureK: number;
  /** Measured charge temperature; else estimated from the compressor (and intercooler when given). */
  chargeTemperatureK?: number | undefined;
  compressorEfficiency: number;
  intercoolerEffectiveness?: number | undefined;
}

export interface StagePlan {
  stageId: string;
  extraFuelFraction: number;
  targetAreaM2: number;
  candidates: HoleLayoutCandidate[];
  chosen: HoleLayoutCandidate;
  chosenBy: "tuner" | "solver";
  warnings: string[];
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

export interface BlockPlan {
  blockId: string;
  side: CarburetorSide;
  mainJetAreaM2: number;
  stages: StagePlan[];
  plug?: PassagePlug | undefined;
  grind?: GrindPlan | undefined;
  tube?: PickupTubePlan | undefined;
  operations: PlannedOperation[];
  warnings: string[];
}

export interface ConversionPlan {
  blocks: BlockPlan[];
  staging: { sweep: StagingSweep; balance: StagingBalance };
  warnings: string[];
}

const CANDIDATES_SHOWN = 6;

const inches = (m: number, digits = 4) => `${(m / M_PER_IN).toFixed(digits)} in`;
const psi = (pa: number) => `${(pa / PA_PER_PSI).toFixed(1)} psi`;
const inHg = (pa: number) => `${(pa / PA_PER_INHG).toFixed(1)} inHg`;

export function extraFuelFraction(target: EnrichmentTarget, mainJetAreaM2: number): number {
  switch (target.kind) {
    case "afr":
      return extraFuelFromAfr(target.from, target.to);
    case "lambda":
      return extraFuelFromLambda(target.from, target.to);
    case "percentMainJet":
      return target.percent / 100;
    case "area":
      return target.areaM2 / mainJetAreaM2;
  }
}

function planStage(stage: StageInput, block: BlockInput, mainJetAreaM2: number, drills: readonly Drill[]): StagePlan {
  const extra = extraFuelFraction(stage.target, mainJetAreaM2);
  const targetAreaM2 =
    stage.target.kind === "area" ? stage.target.areaM2 : addedAreaForExtraFuel({ extraFuelFraction: extra, mainJetAreaM2 });
  const ranked = solveHoleLayout({
    targetEffectiveAreaM2: targetAreaM2,
    drills,
    maxHoles: stage.maxHoles,
    valveWindowAreaM2: stage.valveWindowAreaM2,
    channelLengthM: block.channelLengthM,
    minWebM: block.minWebM,
  });
  const best = ranked[0];
  if (!best) throw new RangeError("drills: no drill to choose from");
  const picked = stage.chosen
    ? ranked.find((c) => c.count === stage.chosen!.count && c.drill.label === stage.chosen!.drillLabel)
    : undefined;
  const chosen = picked ?? best;
  const warnings: string[] = [];
  if (stage.chosen && !picked) warnings.push(`${stage.chosen.count} x ${stage.chosen.drillLabel} is no longer offered (drill not stocked?): the solver's first layout is used.`);
  if (!chosen.fits) warnings.push("The holes do not fit the channel with the minimum web between them.");
  if (chosen.valveLimited) warnings.push("The valve's own flow window limits this stage: more hole area adds little.");
  if (Math.abs(chosen.errorPct) > 10) warnings.push(`The closest layout misses the target area by ${chosen.errorPct.toFixed(1)} %.`);
  const topCandidates = ranked.slice(0, CANDIDATES_SHOWN);
  if (!topCandidates.includes(chosen)) topCandidates.push(chosen);
  return { stageId: stage.id, extraFuelFraction: extra, targetAreaM2, candidates: topCandidates, chosen, chosenBy: picked ? "tuner" : "solver", warnings };
}

function blockOperations(block: BlockInput, plan: Omit<BlockPlan, "operations">): PlannedOperation[] {
  const ops: Omit<PlannedOperation, "number">[] = [];
  const hasBoostValve = block.stages.some((s) => s.valve.kind === "boost");

  if (plan.grind && plan.grind.grindNeeded) {
    const g = plan.grind;
    ops.push({
      kind: "grind",
      title: "Clearance grind of the boss",
      instructions: g.ok
        ? `Press clay between block and main body to confirm the gap. Grind the boss ${inches(g.depthM)} deep in ${g.passes.length} light passes, checking with clay after passes ${g.passes.filter((p) => p.clayCheck).map((p) => p.pass).join(", ")}. Stop if the wall left drops below plan. Deburr, wash and blow out every passage.`
        : `Do not grind: ${g.reason?.message ?? "the wall cannot spare the depth"}. Refer back to the tuner.`,
      parameters: { depth: inches(g.depthM), passes: g.passes.length, wallLeft: inches(g.remainingWallM) },
      measurements: g.ok
        ? [{ key: "grind-depth", label: "Grind depth", quantity: "length", plannedSi: g.depthM, minSi: g.depthM - GRIND_DEPTH_SHORTFALL_M, maxSi: g.depthM + Math.max(0, g.remainingWallM - DEFAULT_MIN_BOSS_WALL_M) }]
        : [],
      caution: "grinding",
    });
  }

  if (hasBoostValve && plan.plug) {
    const p = plan.plug;
    ops.push({
      kind: "plug",
      title: "Plug the vacuum passage",
      instructions: `Drill the passage with ${p.drill.label} (${inches(p.drill.diameterM)}) to ${inches(p.drillDepthM, 3)} deep, tap ${p.tapLabel} to ${inches(p.tapDepthM, 3)}, and seal it with a ${p.setScrew?.label ?? "set screw"} set screw in fuel-resistant thread sealant. Blow out the chips.`,
      parameters: {
        drill: p.drill.label,
        drillSize: inches(p.drill.diameterM),
        thread: p.thread.label,
        tap: p.tapLabel,
        drillDepth: inches(p.drillDepthM, 3),
        tapDepth: inches(p.tapDepthM, 3),
        setScrew: p.setScrew?.label ?? "none fits",
        engagement: `${p.engagementPct.toFixed(0)} %`,
      },
      measurements: [],
      caution: "drilling",
    });
  }

  if (block.side === "secondary" && hasBoostValve && plan.tube) {
    const t = plan.tube;
    ops.push({
      kind: "pickupTube",
      title: "Pickup extension on the secondary power valve",
      instructions: `Cut ${inches(t.cutLengthM, 3)} of 5/16 in soft copper tube. Swage ${inches(t.swageM, 3)} onto the valve inlet, crimping in small steps until tight. Bend ${block.tube?.bendDeg ?? 0}° rearward and down to about jet-extension level; check the bowl still comes off.`,
      parameters: { cutLength: inches(t.cutLengthM, 3), swage: inches(t.swageM, 3), bend: `${block.tube?.bendDeg ?? 0}°`, fitsBowl: t.fitsBowl ? "yes" : "no" },
      measurements: [],
      caution: "drilling",
    });
  }

  for (const stage of plan.stages) {
    const input = block.stages.find((s) => s.id === stage.stageId)!;
    const c = stage.chosen;
    const valve = input.valve.kind === "vacuum" ? `vacuum valve (${inHg(input.valve.ratingPa)})` : `boost valve (${psi(input.valve.setpointPa)})`;
    ops.push({
      kind: "restriction",
      title: `Channel restriction for the ${valve}`,
      instructions: `Drill ${c.count} hole${c.count > 1 ? "s" : ""} with ${c.drill.label} (${inches(c.drill.diameterM)}) through the power-valve channel. Check every hole with pin gauges and record the size.`,
      parameters: { count: c.count, drill: c.drill.label, drillSize: inches(c.drill.diameterM), area: `${(c.holesAreaM2 / (M_PER_IN * M_PER_IN)).toFixed(5)} in²` },
      measurements: Array.from({ length: c.count }, (_, i) => ({
        key: `hole-${i + 1}`,
        label: `Hole ${i + 1} by pin gauge`,
        quantity: "length" as const,
        plannedSi: c.drill.diameterM,
        minSi: c.drill.diameterM - HOLE_DIAMETER_TOLERANCE_M,
        maxSi: c.drill.diameterM + HOLE_DIAMETER_TOLERANCE_M,
      })),
      caution: "drilling",
      stageId: stage.stageId,
    });
  }

  for (const input of block.stages) {
    if (input.valve.kind !== "boost") continue;
    const setpoint = input.valve.setpointPa;
    ops.push({
      kind: "valveSetting",
      title: `Set the boost valve to open at ${psi(setpoint)}`,
      instructions: `Turn the adjuster, then verify the opening on the bench with regulated air, rising slowly. Record the pressure at which it opens.`,
      parameters: { setpoint: psi(setpoint), tolerance: `± ${psi(OPENING_PRESSURE_TOLERANCE_PA)}` },
      measurements: [
        {
          key: "opening-pressure",
          label: "Opening pressure",
          quantity: "pressure",
          plannedSi: setpoint,
          minSi: setpoint - OPENING_PRESSURE_TOLERANCE_PA,
          maxSi: setpoint + OPENING_PRESSURE_TOLERANCE_PA,
        },
      ],
      caution: "pressurizedBowls",
      stageId: input.id,
    });
  }

  ops.push({
    kind: "finish",
    title: "Wash, blow out and assemble",
    instructions: "Wash the block, blow out every passage, install the valves with new gaskets and check that the block seats flat.",
    parameters: {},
    measurements: [],
    caution: "fuel",
  });
  return ops.map((op, i) => ({ ...op, number: (i + 1) * 10 }));
}

function planBlock(block: BlockInput, drills: readonly Drill[], inchDrills: readonly Drill[]): BlockPlan {
  const mainJetAreaM2 = block.mainJetCount * circleArea(block.mainJetDiameterM);
  const stages = block.stages.map((stage) => planStage(stage, block, mainJetAreaM2, drills));
  const warnings = stages.flatMap((s) => s.warnings);
  const plugResult = block.passage
    ? passagePlug({
        passageDiameterM: block.passage.diameterM,
        wallThicknessM: block.passage.wallM,
        depthAvailableM: block.passage.depthM,
        threads: UNIFIED_THREADS,
        drills: inchDrills.length ? inchDrills : undefined,
      })
    : undefined;
  const plug = plugResult?.ok ? plugResult.plug : undefined;
  if (plugResult && !plugResult.ok) warnings.push(plugResult.message);
  if (plug) warnings.push(...plug.warnings);
  const grind = block.grind
    ? planGrind({
        valveProtrusionM: block.grind.valveProtrusionM,
        runningClearanceM: block.grind.runningClearanceM ?? DEFAULT_RUNNING_CLEARANCE_M,
        measuredGapM: block.grind.measuredGapM,
        maxDepthPerPassM: DEFAULT_GRIND_PASS_M,
        wallThicknessM: block.grind.bossWallM,
        minRemainingWallM: DEFAULT_MIN_BOSS_WALL_M,
      })
    : undefined;
  if (grind && !grind.ok && grind.reason) warnings.push(grind.reason.message);
  const tube =
    block.tube && block.side === "secondary"
      ? planPickupTube({
          segments: [
            ...(block.tube.runsM[0] !== undefined ? [{ kind: "straight" as const, lengthM: block.tube.runsM[0] }] : []),
            { kind: "bend" as const, angleRad: (block.tube.bendDeg * Math.PI) / 180, centerlineRadiusM: block.tube.bendRadiusM },
            ...block.tube.runsM.slice(1).map((lengthM) => ({ kind: "straight" as const, lengthM })),
          ],
          swageEngagementM: block.tube.swageM,
          outsideDiameterM: COMMON_PICKUP_TUBE_OD_M,
        })
      : undefined;
  const partial = { blockId: block.id, side: block.side, mainJetAreaM2, stages, plug, grind, tube, warnings };
  return { ...partial, operations: blockOperations(block, partial) };
}

/** The staging model of the whole carburetor with the chosen layouts. */
export function stagingModelFor(engine: EngineInput, blocks: readonly BlockInput[], plans: readonly BlockPlan[]): StagingModel {
  const jets = (side: CarburetorSide) => {
    const block = blocks.find((b) => b.side === side);
    return block ? block.mainJetCount * circleArea(block.mainJetDiameterM) : 0;
  };
  const valves: PowerValve[] = blocks.flatMap((block) =>
    block.stages.map((stage): PowerValve => {
      const stagePlan = plans.find((p) => p.blockId === block.id)?.stages.find((s) => s.stageId === stage.id);
      const restrictionAreaM2 = stagePlan?.chosen.effectiveAreaM2 ?? 0;
      return stage.valve.kind === "vacuum"
        ? { id: stage.id, side: block.side, kind: "vacuum", ratingPa: stage.valve.ratingPa, restrictionAreaM2 }
        : { id: stage.id, side: block.side, kind: "boost", setpointPa: stage.valve.setpointPa, restrictionAreaM2 };
    }),
  );
  return {
    mainJets: { primary: jets("primary"), secondary: jets("secondary") },
    valves,
    ambient: { pressurePa: STANDARD_ATMOSPHERE_PA, temperatureK: engine.ambientTemperatureK },
    target: {
      atmosphereAfr: engine.targetLambdaAtmosphere * engine.fuel.stoichAfr,
      peakBoostAfr: engine.targetLambdaPeak * engine.fuel.stoichAfr,
      peakBoostGaugePa: engine.peakBoostPa,
    },
    charge:
      engine.chargeTemperatureK !== undefined
        ? { kind: "fixed", temperatureK: engine.chargeTemperatureK }
        : { kind: "compressor", efficiency: engine.compressorEfficiency, intercoolerEffectiveness: engine.intercoolerEffectiveness },
  };
}

/**
 * Plans every block. `drills` is what the solver may choose from (the shop's rack or the whole series);
 * inch drills among them are used for the vacuum-passage plug, which takes a Unified thread.
 */
export function planConversion(input: { engine: EngineInput; blocks: readonly BlockInput[]; drills: readonly Drill[] }): ConversionPlan {
  const inchDrills = input.drills.filter((d) => d.system !== "metric");
  const blocks = input.blocks.map((block) => planBlock(block, input.drills, inchDrills));
  const model = stagingModelFor(input.engine, input.blocks, blocks);
  const sweep = sweepStaging(model, { fromGaugePa: -STAGING_CHART_VACUUM_PA, toGaugePa: input.engine.peakBoostPa, points: 61, band: STAGING_BAND });
  const balance = stagingBalance(model);
  const warnings = blocks.flatMap((b) => b.warnings.map((w) => `${b.side}: ${w}`));
  if (balance.secondaryFirst) warnings.push("Enrichment reaches the secondary before the primary: bring the primary in first to keep the carburetor square.");
  for (const zone of sweep.zones) {
    if (zone.kind === "lean" && zone.toGaugePa > 0) {
      warnings.push(`${zone.mode === "part" ? "Part" : "Full"} throttle runs lean from ${psi(zone.fromGaugePa)} to ${psi(zone.toGaugePa)} boost.`);
    }
  }
  return { blocks, staging: { sweep, balance }, warnings };
}
