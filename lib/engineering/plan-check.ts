// The plan proves itself: the mixture it predicts across manifold pressure in both throttle modes, beside the
// target, and each stage's mixture just after it opens, with graded warnings wherever they part.
//
// Conditions (all judgement calls, stated here once):
// * Calibration: the carburetor as jetted at the local ambient pressure (barometer, or the site elevation
//   through ISO 2533) and ambient temperature gives the atmospheric target with whatever is open at zero gauge.
// * Charge: ambient air at and below zero gauge; under boost the compressor outlet (isentropic, gamma 1.4,
//   with an efficiency) after the intercooler, or a measured charge temperature reached at peak boost with the
//   compressor's shape in between (see charge-temperature.ts).
// * Target: the cruise lambda under vacuum below the deepest vacuum power valve's opening (the engine cruises
//   there with the valve shut; common practice about 1.0), the atmospheric target from there to zero gauge,
//   then linear to the peak-boost target. Without a vacuum valve, every vacuum is cruise.
// * Full throttle cannot hold a vacuum deeper than where the vacuum valve opens, so full-throttle zones start
//   there (at zero gauge without a vacuum valve).

import { chargeModelFromPeak } from "./charge-temperature";
import { DANGEROUS_LEAN_FRACTION, type PlanWarning } from "./plan-warnings";
import { PA_PER_INHG, PA_PER_PSI } from "./unit-factors";
import type { StagePlan } from "./stage-sizing";
import {
  predictedMixtureAt,
  suppliedAreaAt,
  sweepStaging,
  valveIsOpenJustBelow,
  type ChargeTemperatureModel,
  type PowerValve,
  type StagingModel,
  type StagingSweep,
  type ThrottleMode,
} from "./staging";

export interface PlanConditions {
  /** Ambient pressure, absolute Pa: the calibration point. */
  ambientPressurePa: number;
  ambientTemperatureK: number;
  peakBoostPa: number;
  targetLambdaAtmosphere: number;
  targetLambdaPeak: number;
  cruiseLambda: number;
  /** Measured charge temperature at peak boost; else the compressor model below. */
  chargeTemperatureK?: number | undefined;
  compressorEfficiency: number;
  intercoolerEffectiveness?: number | undefined;
}

/** Acceptable mixture band: +/- 5 % of the fuel wanted (common practice, no published source). */
export const MIXTURE_BAND = 0.05;

function chargeModel(c: PlanConditions): ChargeTemperatureModel {
  if (c.chargeTemperatureK === undefined) {
    return { kind: "compressor", efficiency: c.compressorEfficiency, intercoolerEffectiveness: c.intercoolerEffectiveness };
  }
  const fromPeak = chargeModelFromPeak({
    ambientTemperatureK: c.ambientTemperatureK,
    ambientPressurePa: c.ambientPressurePa,
    peakBoostGaugePa: c.peakBoostPa,
    chargeAtPeakK: c.chargeTemperatureK,
  });
  if (!fromPeak) throw new RangeError("the charge temperature at peak boost cannot be cooler than the ambient air");
  return fromPeak;
}

/** Where the engine leaves cruise: the deepest vacuum valve's opening, or zero gauge without one. */
export function cruiseEndsGaugePa(valves: readonly PowerValve[]): number {
  return Math.min(0, ...valves.filter((v) => v.kind === "vacuum").map((v) => -v.ratingPa));
}

/** The whole carburetor as a staging model, in lambda. */
export function planStagingModel(c: PlanConditions, mainJets: { primary: number; secondary: number }, valves: readonly PowerValve[]): StagingModel {
  return {
    mainJets,
    valves,
    ambient: { pressurePa: c.ambientPressurePa, temperatureK: c.ambientTemperatureK },
    target: {
      atmosphereAfr: c.targetLambdaAtmosphere,
      peakBoostAfr: c.targetLambdaPeak,
      peakBoostGaugePa: c.peakBoostPa,
      cruiseAfr: c.cruiseLambda,
      cruiseBelowGaugePa: cruiseEndsGaugePa(valves),
    },
    charge: chargeModel(c),
  };
}

export interface StageOutcome {
  stageId: string;
  /** The mixture the stage is meant to give just after it opens (its own target, or the curve's there). */
  targetLambda: number;
  /** The mixture the model predicts just after it opens, with every valve that opens there. */
  achievedLambda: number;
  /** The mixture the model predicts just below it, before it opens. */
  beforeLambda: number;
}

const LAMBDA_DIGITS = 3;

type StageTarget = { kind: string; from?: number; to?: number };

/** A mixture stage's from and to in lambda (AFR through the fuel's stoichiometric ratio). */
function lambdaOfTarget(target: StageTarget | undefined, stoichAfr: number): { from?: number | undefined; to: number } | undefined {
  if (target?.kind === "lambda") return { from: target.from, to: target.to as number };
  if (target?.kind === "afr") return { from: (target.from as number) / stoichAfr, to: (target.to as number) / stoichAfr };
  return undefined;
}

function openAreaJustAbove(model: StagingModel, gaugePa: number, mode: ThrottleMode): number {
  // Right limit: every valve open just above the point (a vacuum valve at its rating, a boost valve at its setpoint).
  let area = suppliedAreaAt(model, gaugePa, mode, true);
  for (const v of model.valves) {
    if (mode === "part" && v.side === "secondary") continue;
    const opensHere = v.kind === "vacuum" ? -v.ratingPa === gaugePa : v.setpointPa === gaugePa;
    if (opensHere && !valveIsOpenJustBelow(v, gaugePa)) area += v.restrictionAreaM2;
  }
  return area;
}

export function stageOutcomes(
  model: StagingModel,
  stages: readonly StagePlan[],
  targets: ReadonlyMap<string, StageTarget>,
  stoichAfr: number,
): StageOutcome[] {
  return stages.map((stage) => {
    const below = suppliedAreaAt(model, stage.openingGaugePa, stage.mode, true);
    const above = openAreaJustAbove(model, stage.openingGaugePa, stage.mode);
    const mixture = lambdaOfTarget(targets.get(stage.stageId), stoichAfr);
    const curve = model.target as { atmosphereAfr: number };
    const targetLambda = mixture?.to ?? targetCurveJustAbove(model, stage.openingGaugePa, curve.atmosphereAfr);
    return {
      stageId: stage.stageId,
      targetLambda,
      achievedLambda: predictedMixtureAt(model, stage.openingGaugePa, stage.mode, above),
      beforeLambda: predictedMixtureAt(model, stage.openingGaugePa, stage.mode, below),
    };
  });
}

function targetCurveJustAbove(model: StagingModel, gaugePa: number, atmosphere: number): number {
  const t = model.target;
  if (typeof t === "function") return t(gaugePa);
  if (gaugePa < 0) return gaugePa >= (t.cruiseBelowGaugePa ?? -Infinity) ? atmosphere : (t.cruiseAfr ?? atmosphere);
  if (gaugePa >= t.peakBoostGaugePa) return t.peakBoostAfr;
  return t.atmosphereAfr + ((t.peakBoostAfr - t.atmosphereAfr) * gaugePa) / t.peakBoostGaugePa;
}

const fmt = (lambda: number) => lambda.toFixed(LAMBDA_DIGITS);

/** Warnings for stages whose predicted mixture leaves the band of their target. */
export function stageWarnings(
  stages: readonly StagePlan[],
  outcomes: readonly StageOutcome[],
  targets: ReadonlyMap<string, StageTarget>,
  stoichAfr: number,
  label: (stage: StagePlan) => string,
): PlanWarning[] {
  const warnings: PlanWarning[] = [];
  outcomes.forEach((o, i) => {
    const stage = stages[i] as StagePlan;
    const about = { blockId: stage.blockId, stageId: stage.stageId };
    const miss = o.achievedLambda / o.targetLambda - 1;
    if (Math.abs(miss) > MIXTURE_BAND) {
      const lean = miss > 0;
      const underBoost = stage.openingGaugePa > 0;
      warnings.push({
        code: "stage_off_target",
        level: lean && underBoost && miss > DANGEROUS_LEAN_FRACTION ? "danger" : "caution",
        message: `${label(stage)}: the plan predicts lambda ${fmt(o.achievedLambda)} just after it opens, ${lean ? "leaner" : "richer"} than its target ${fmt(o.targetLambda)} by ${(Math.abs(miss) * 100).toFixed(1)} %.`,
        ...about,
      });
    }
    const mixture = lambdaOfTarget(targets.get(stage.stageId), stoichAfr);
    if (mixture?.from !== undefined && Math.abs(o.beforeLambda / mixture.from - 1) > MIXTURE_BAND) {
      warnings.push({
        code: "stage_before_differs",
        level: "caution",
        message: `${label(stage)}: the stage was sized from lambda ${fmt(mixture.from)} before it opens; the plan predicts ${fmt(o.beforeLambda)} there. Check the reading or the stages below it.`,
        ...about,
      });
    }
  });
  return warnings;
}

export interface MixtureSweep {
  sweep: StagingSweep;
  /** Lowest gauge pressure of the full-throttle curve. */
  fullThrottleFromGaugePa: number;
}

/** The sweep from a vacuum to peak boost, in lambda, with full throttle from where it can happen. */
export function mixtureSweep(model: StagingModel, fromGaugePa: number, points: number): MixtureSweep {
  // Just above the vacuum valve's opening (1 Pa): at the opening itself the valve is still shut and the engine cruising.
  const cruiseEnds = cruiseEndsGaugePa(model.valves);
  const fullThrottleFromGaugePa = cruiseEnds < 0 ? cruiseEnds + 1 : 0;
  const target = model.target as { peakBoostGaugePa: number };
  const sweep = sweepStaging(model, { fromGaugePa, toGaugePa: target.peakBoostGaugePa, points, band: MIXTURE_BAND, fullThrottleFromGaugePa });
  return { sweep, fullThrottleFromGaugePa };
}

const psiText = (pa: number) => `${(pa / PA_PER_PSI).toFixed(1)} psi`;
const inHgText = (pa: number) => `${(-pa / PA_PER_INHG).toFixed(1)} inHg`;
const pressureText = (pa: number) => (pa < 0 ? `${inHgText(pa)} vacuum` : `${psiText(pa)} boost`);

/** Warnings for the sweep's zones: lean under boost graded by how lean, lean under vacuum, rich anywhere. */
export function sweepWarnings(sweep: StagingSweep): PlanWarning[] {
  const warnings: PlanWarning[] = [];
  for (const zone of sweep.zones) {
    const mode = zone.mode === "part" ? "Part" : "Full";
    const span =
      zone.fromGaugePa === zone.toGaugePa
        ? `${mode} throttle at ${pressureText(zone.fromGaugePa)}`
        : `${mode} throttle from ${pressureText(zone.fromGaugePa)} to ${pressureText(zone.toGaugePa)}`;
    const leanBy = 1 / zone.worstRatio - 1;
    if (zone.kind === "lean" && zone.toGaugePa > 0) {
      warnings.push({
        code: "lean_under_boost",
        level: leanBy > DANGEROUS_LEAN_FRACTION ? "danger" : "caution",
        message: `${span} runs lean: up to ${(leanBy * 100).toFixed(1)} % leaner than the target.`,
      });
    } else if (zone.kind === "lean") {
      warnings.push({
        code: "lean_under_vacuum",
        level: "caution",
        message: `${span} runs lean of the target by up to ${(leanBy * 100).toFixed(1)} %: under vacuum the main jets (or the vacuum valve) set the mixture, not the boost stages.`,
      });
    } else {
      warnings.push({ code: "rich_zone", level: "notice", message: `${span} runs rich: up to ${((1 - 1 / zone.worstRatio) * 100).toFixed(1)} % richer than the target.` });
    }
  }
  return warnings;
}
