// A log read against the revision the engine ran on: the plan's staging model (as approved), the stages as
// drilled, the shop's rack and limits. What comes out is kept with the log, so the analysis the tuner accepted
// stays as it was even when the rack or the settings change later.

import type { AirFuelRow } from "@/lib/engineering/air-fuel-log";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import { correctFromLog } from "@/lib/engineering/log-correction";
import { MIXTURE_BAND } from "@/lib/engineering/plan-check";
import type { RestrictionDrillLimits } from "@/lib/engineering/restriction-limits";
import type { CorrectionLimit } from "@/lib/engineering/stage-correction";
import {
  predictedMixtureAt,
  suppliedAreaAt,
  targetAfrAt,
  valveOpeningGaugePa,
  type CarburetorSide,
  type StagingModel,
  type ThrottleMode,
} from "@/lib/engineering/staging";
import type { Drill } from "@/lib/engineering/types";
import type { BlockRow } from "@/db/jobs";

/** One pressure bin as kept: no line numbers (a long log has hundreds of thousands). */
export interface AnalysedBin {
  mode: ThrottleMode;
  fromPa: number;
  toPa: number;
  gaugePa: number;
  count: number;
  lambda: number;
  spread: number;
  enough: boolean;
  targetLambda: number;
  /** What the revision's model predicts there, in the bin's mode. */
  predictedLambda: number;
  use: "stage" | "cruise" | "none";
}

export interface AnalysedCorrection {
  stageId: string;
  side: CarburetorSide;
  index: number;
  mode: ThrottleMode;
  openingGaugePa: number;
  binsUsed: number;
  currentAreaM2: number;
  proposedAreaM2: number;
  clamped: boolean;
  changePct: number | null;
  layout: { count: number; drill: { label: string } } | null;
  limitedBy: CorrectionLimit;
  opening: { currentGaugePa: number; proposedGaugePa: number; direction: "earlier" | "later" } | null;
  /** The change as the machinist reads it. */
  change: string;
  /** Whether accepting it changes anything (a new layout or a moved opening). */
  changes: boolean;
}

export interface LogAnalysis {
  bins: AnalysedBin[];
  corrections: AnalysedCorrection[];
  jetAdvice: { side: "primary"; message: string; ratio: number; currentDiameterM: number; proposedDiameterM: number } | null;
  /** The plan's predicted mixture and the target across pressure, per mode, for the chart. */
  curves: Record<ThrottleMode, { gaugePa: number; predictedLambda: number; targetLambda: number }[]>;
  openings: { stageId: string; side: CarburetorSide; index: number; mode: ThrottleMode; gaugePa: number }[];
  counts: { used: number; setAside: { fastThrottle: number; cold: number }; band: number };
}

export interface LogAnalysisInput {
  rows: readonly AirFuelRow[];
  plan: ConversionPlan;
  blocks: readonly BlockRow[];
  ambientPa: number;
  fuelStoichAfr: number;
  drills: readonly Drill[];
  limits: RestrictionDrillLimits;
  minWebM: number;
  settings: { fullThrottleAbovePct: number; binWidthPa: number };
}

const CURVE_POINTS = 60;

function curve(model: StagingModel, mode: ThrottleMode, fromPa: number, toPa: number): LogAnalysis["curves"][ThrottleMode] {
  const points = [];
  for (let i = 0; i < CURVE_POINTS; i++) {
    const gaugePa = fromPa + ((toPa - fromPa) * i) / (CURVE_POINTS - 1);
    points.push({
      gaugePa,
      predictedLambda: predictedMixtureAt(model, gaugePa, mode, suppliedAreaAt(model, gaugePa, mode)),
      targetLambda: targetAfrAt(model.target, gaugePa),
    });
  }
  return points;
}

/** The analysis to keep, and the rows the engineering checks refused (lambda or pressure out of range). */
export function analyseLog(input: LogAnalysisInput): { analysis: LogAnalysis; rejected: { line: number; reason: string }[] } {
  const model = input.plan.staging.model;
  const primary = input.blocks.find((b) => b.side === "primary") ?? input.blocks[0];
  if (!primary) throw new RangeError("blocks: the revision has no metering block");
  const stageRows = new Map(input.blocks.flatMap((b) => b.stages.map((s) => [s.id, { stage: s, block: b }] as const)));
  const stages = input.plan.blocks.flatMap((blockPlan) =>
    blockPlan.stages.map((stage, i) => {
      const row = stageRows.get(stage.stageId);
      return {
        valveId: stage.stageId,
        mode: stage.mode,
        index: i + 1,
        layout: { count: stage.chosen.count, drill: { label: stage.chosen.drill.label } },
        maxHoles: row?.stage.maxHoles ?? 4,
        valveWindowAreaM2: row?.stage.valveWindowAreaM2 ?? undefined,
        channelLengthM: row?.block.channelLengthM ?? undefined,
        minWebM: row?.block.minWebM ?? undefined,
      };
    }),
  );
  const result = correctFromLog({
    rows: input.rows,
    ambientPa: input.ambientPa,
    fuelStoichAfr: input.fuelStoichAfr,
    steady: { fullThrottleAbovePct: input.settings.fullThrottleAbovePct, modeWithoutThrottle: "full" },
    bins: { widthPa: input.settings.binWidthPa },
    correction: {
      model,
      stages,
      drills: input.drills,
      limits: input.limits,
      minWebM: input.minWebM,
      primaryMainJetDiameterM: primary.mainJetDiameterM,
    },
  });
  const bins: AnalysedBin[] = result.bins.map((b) => ({
    mode: b.mode,
    fromPa: b.fromPa,
    toPa: b.toPa,
    gaugePa: b.gaugePa,
    count: b.count,
    lambda: b.lambda,
    spread: b.spread,
    enough: b.enough,
    targetLambda: b.targetLambda,
    predictedLambda: predictedMixtureAt(model, b.gaugePa, b.mode, suppliedAreaAt(model, b.gaugePa, b.mode)),
    use: b.use.kind,
  }));
  const pressures = [...bins.map((b) => b.gaugePa), ...model.valves.map(valveOpeningGaugePa), 0];
  const fromPa = Math.min(...pressures);
  const toPa = Math.max(...pressures, model.target && typeof model.target === "object" ? model.target.peakBoostGaugePa : 0);
  const span = toPa - fromPa || 1;
  const lo = fromPa - span * 0.05;
  const hi = toPa + span * 0.05;
  const analysis: LogAnalysis = {
    bins,
    corrections: result.corrections.map((c) => ({
      stageId: c.stageId,
      side: c.side,
      index: c.index,
      mode: c.mode,
      openingGaugePa: c.openingGaugePa,
      binsUsed: c.binsUsed,
      currentAreaM2: c.currentAreaM2,
      proposedAreaM2: c.proposedAreaM2,
      clamped: c.clamped,
      changePct: c.changePct,
      layout: c.layout ? { count: c.layout.count, drill: { label: c.layout.drill.label } } : null,
      limitedBy: c.limitedBy,
      opening: c.opening,
      change: c.change,
      changes: c.opening !== null || (c.layout !== null && Math.abs(c.drilledAreaM2 - c.currentAreaM2) > 1e-12),
    })),
    jetAdvice: result.jetAdvice
      ? {
          side: result.jetAdvice.side,
          message: result.jetAdvice.message,
          ratio: result.jetAdvice.ratio,
          currentDiameterM: result.jetAdvice.currentDiameterM,
          proposedDiameterM: result.jetAdvice.proposedDiameterM,
        }
      : null,
    curves: { part: curve(model, "part", lo, Math.min(hi, 0)), full: curve(model, "full", Math.max(lo, input.plan.staging.fullThrottleFromGaugePa), hi) },
    openings: input.plan.blocks.flatMap((bp) =>
      bp.stages.map((s, i) => ({ stageId: s.stageId, side: bp.side, index: i + 1, mode: s.mode, gaugePa: s.openingGaugePa })),
    ),
    counts: { used: result.usedReadings, setAside: result.setAside, band: MIXTURE_BAND },
  };
  return { analysis, rejected: result.rejected };
}
