// New restriction areas (and holes) for the enrichment stages from a judged log, on the whole-engine model.
//
// * A stage is corrected from the bins where it is the last stage open, read in its own mode (bin-judgement.ts);
//   only bins with enough readings count. Without one, the stage stays as it is, limited by "readings".
// * Stages are settled from the lowest opening up (at one opening, part-throttle stages first). Each bin asks
//   for a whole-engine change dA; the corrections already settled below that are open at the bin's pressure
//   in its mode already give part of it, so the stage takes the rest. Its change is the median of that rest
//   over its bins (robust against one odd bin).
// * Stages opening together in one mode share the change in proportion to their present areas (equally when
//   all are closed).
// * A change that would take a stage below zero closes the channel: the stage stays rich, and only the change
//   that really happens (the drilled area, or zero, less the present area) is carried to the stages above.
//   The drilled layout's area, not the ideal one, is what the stages above build on.
// * Opening point instead of area (a simple rule): when the stage's lowest bin is rich beyond the band and its
//   highest lean beyond it, the valve comes in too early; the reverse, too late. Its area is left alone and its
//   opening moved by one step (default one bin width) later or earlier, never across zero gauge (a vacuum
//   valve's rating stays a vacuum, a boost valve's setpoint a boost); read again after the move.
// * Cruise errors under vacuum are the main jets' (jet-advice.ts): no stage absorbs them, and the stages are
//   corrected with the jets as they are.

import { judgeBins, type JudgedBin } from "./bin-judgement";
import { requireInRange, requirePositive } from "./checks";
import { solveHoleLayout, type HoleLayoutCandidate } from "./hole-layout";
import { cruiseJetAdvice, type JetAdvice } from "./jet-advice";
import { DEFAULT_BIN_WIDTH_PA, median, type MixtureBin } from "./log-bins";
import { MIXTURE_BAND } from "./plan-check";
import type { RestrictionDrillLimits } from "./restriction-limits";
import {
  sideCounts,
  valveIsOpen,
  valveOpeningGaugePa,
  type CarburetorSide,
  type PowerValve,
  type StagingModel,
  type ThrottleMode,
} from "./staging";
import type { Drill } from "./types";
import { fromSI } from "./units";

export interface StageToCorrect {
  /** The stage's valve in model.valves. */
  valveId: string;
  /** Mode the stage is read in (a secondary stage only in full throttle). */
  mode: ThrottleMode;
  /** The stage's place within its block, from 1. */
  index: number;
  /** Holes drilled now (null: none, or not known). */
  layout: { count: number; drill: Pick<Drill, "label"> } | null;
  maxHoles: number;
  valveWindowAreaM2?: number | undefined;
  channelLengthM?: number | undefined;
  minWebM?: number | undefined;
}

export interface StageCorrectionInput {
  /** The whole carburetor as built, in lambda (the plan's staging model). */
  model: Pick<StagingModel, "mainJets" | "valves" | "target">;
  stages: readonly StageToCorrect[];
  bins: readonly MixtureBin[];
  /** The shop's drills; only those within `limits` are used. */
  drills: readonly Drill[];
  limits?: RestrictionDrillLimits | undefined;
  /** The shop's least web, where a stage gives none. */
  minWebM?: number | undefined;
  /** Diameter of one primary main jet, m (for the cruise advice). */
  primaryMainJetDiameterM: number;
  /** Half-width of the acceptable band (fraction). Default MIXTURE_BAND, 5 %. */
  band?: number | undefined;
  /** How far an opening point is moved, Pa. Default one bin width, DEFAULT_BIN_WIDTH_PA. */
  openingStepPa?: number | undefined;
}

/** What keeps the stage from its ideal correction. */
export type CorrectionLimit = null | "valve" | "channel" | "rack" | "readings";

export interface StageCorrection {
  stageId: string;
  side: CarburetorSide;
  index: number;
  mode: ThrottleMode;
  openingGaugePa: number;
  /** Bins with enough readings the stage was corrected from. */
  binsUsed: number;
  /** What the corrections below it already add at its bins, m² (median over them). */
  appliedBelowM2: number;
  currentAreaM2: number;
  /** Present area plus the change asked for; below zero when the readings ask for less than a closed channel. */
  wantedAreaM2: number;
  /** The area to build, never below zero, m². */
  proposedAreaM2: number;
  clamped: boolean;
  /** proposed / current - 1 in percent; null for a stage that is closed now. */
  changePct: number | null;
  /** Holes for the proposed area; null when the channel closes or the stage is not changed. */
  layout: HoleLayoutCandidate | null;
  /** Effective area the stage will pass after the correction, m². */
  drilledAreaM2: number;
  /** drilledAreaM2 - currentAreaM2: the change carried to the stages above. */
  realisedChangeM2: number;
  limitedBy: CorrectionLimit;
  opening: { currentGaugePa: number; proposedGaugePa: number; direction: "earlier" | "later" } | null;
  /** The change as the machinist reads it: "secondary stage 1: 2 x #44 -> 3 x #44". */
  change: string;
}

export interface StageCorrectionResult {
  bins: JudgedBin[];
  /** In the order the stages were given. */
  corrections: StageCorrection[];
  jetAdvice: JetAdvice | null;
  /**
   * The model's valves with the areas the corrections leave (drilled), for a new staging model. Openings stay as
   * they are: a proposed move is in corrections[].opening, for the tuner to set and read again.
   */
  valves: PowerValve[];
}

interface Prepared {
  stage: StageToCorrect;
  valve: PowerValve;
  order: number;
}

const holesText = (layout: { count: number; drill: Pick<Drill, "label"> } | null) =>
  layout === null ? "no holes" : `${layout.count} x ${layout.drill.label}`;

function openingText(valve: PowerValve, gaugePa: number): string {
  return valve.kind === "vacuum"
    ? `${fromSI("pressure", -gaugePa, "inHg").toFixed(1)} inHg`
    : `${fromSI("pressure", gaugePa, "psi").toFixed(1)} psi`;
}

function prepare(input: StageCorrectionInput): Prepared[] {
  const seen = new Set<string>();
  return input.stages.map((stage, i) => {
    const valve = input.model.valves.find((v) => v.id === stage.valveId);
    if (valve === undefined) throw new RangeError(`stages[${i}].valveId: no valve ${stage.valveId} in the model`);
    if (seen.has(stage.valveId)) throw new RangeError(`stages[${i}].valveId: ${stage.valveId} is named twice`);
    seen.add(stage.valveId);
    if (stage.mode !== "part" && stage.mode !== "full") throw new RangeError(`stages[${i}].mode must be "part" or "full"`);
    if (valve.side === "secondary" && stage.mode === "part") {
      throw new RangeError(`stages[${i}].mode: a secondary stage is read in full throttle (the secondaries are shut at part throttle)`);
    }
    return { stage, valve, order: i };
  });
}

export function correctStages(input: StageCorrectionInput): StageCorrectionResult {
  const band = requireInRange("band", input.band ?? MIXTURE_BAND, 0, 1);
  const step = requirePositive("openingStepPa", input.openingStepPa ?? DEFAULT_BIN_WIDTH_PA);
  const prepared = prepare(input);
  const modes = new Map(prepared.map((p) => [p.stage.valveId, p.stage.mode] as const));
  const bins = judgeBins(input.model, input.bins, modes);
  const jetAdvice = cruiseJetAdvice(bins, { primaryMainJetDiameterM: input.primaryMainJetDiameterM, band });

  // Groups of stages that open together in one mode, lowest opening first, part before full.
  const groups = new Map<string, Prepared[]>();
  for (const p of prepared) {
    const key = `${valveOpeningGaugePa(p.valve)} ${p.stage.mode}`;
    groups.set(key, [...(groups.get(key) ?? []), p]);
  }
  const ordered = [...groups.values()].sort((a, b) => {
    const x = a[0] as Prepared;
    const y = b[0] as Prepared;
    return valveOpeningGaugePa(x.valve) - valveOpeningGaugePa(y.valve) || (x.stage.mode === "part" ? 0 : 1) - (y.stage.mode === "part" ? 0 : 1);
  });

  const settled: { valve: PowerValve; realised: number }[] = [];
  const results = new Map<string, StageCorrection>();
  for (const group of ordered) {
    const first = group[0] as Prepared;
    const mode = first.stage.mode;
    const ids = new Set(group.map((p) => p.valve.id));
    const own = bins
      .filter((b) => b.enough && b.mode === mode && b.use.kind === "stage" && b.use.valveIds.some((id) => ids.has(id)))
      .sort((a, b) => a.gaugePa - b.gaugePa);
    const applied = own.map((b) =>
      settled.reduce((sum, s) => sum + (sideCounts(mode, s.valve.side) && valveIsOpen(s.valve, b.gaugePa) ? s.realised : 0), 0),
    );
    const appliedBelowM2 = own.length > 0 ? median(applied) : 0;
    const timing = own.length >= 2 ? openingMove(own, band) : null;
    const groupChange = own.length === 0 || timing !== null ? 0 : median(own.map((b, i) => b.wantedChangeM2 - (applied[i] as number)));
    const groupArea = group.reduce((sum, p) => sum + p.valve.restrictionAreaM2, 0);

    for (const p of group) {
      const share = groupArea > 0 ? p.valve.restrictionAreaM2 / groupArea : 1 / group.length;
      const opening = valveOpeningGaugePa(p.valve);
      const result = correctOne(input, p, {
        binsUsed: own.length,
        appliedBelowM2,
        change: groupChange * share,
        opening: timing === null ? null : { currentGaugePa: opening, proposedGaugePa: movedOpening(p.valve, timing, step), direction: timing },
      });
      results.set(p.valve.id, result);
      settled.push({ valve: p.valve, realised: result.realisedChangeM2 });
    }
  }

  const corrections = prepared.map((p) => results.get(p.valve.id) as StageCorrection);
  const valves = input.model.valves.map((v) => {
    const c = results.get(v.id);
    return c === undefined ? v : { ...v, restrictionAreaM2: c.drilledAreaM2 };
  });
  return { bins, corrections, jetAdvice, valves };
}

/** One step later or earlier; a vacuum valve stays a vacuum valve and a boost valve a boost valve (zero at most). */
function movedOpening(valve: PowerValve, direction: "earlier" | "later", step: number): number {
  const moved = valveOpeningGaugePa(valve) + (direction === "later" ? step : -step);
  return valve.kind === "vacuum" ? Math.min(moved, 0) : Math.max(moved, 0);
}

/** The opening-point rule: rich at the bottom and lean at the top: later; the reverse: earlier. */
function openingMove(own: readonly JudgedBin[], band: number): "earlier" | "later" | null {
  const low = (own[0] as JudgedBin).error;
  const high = (own[own.length - 1] as JudgedBin).error;
  if (low < -band && high > band) return "later";
  if (low > band && high < -band) return "earlier";
  return null;
}

function correctOne(
  input: StageCorrectionInput,
  p: Prepared,
  found: { binsUsed: number; appliedBelowM2: number; change: number; opening: StageCorrection["opening"] },
): StageCorrection {
  const { stage, valve } = p;
  const current = valve.restrictionAreaM2;
  const label = `${valve.side} stage ${stage.index}`;
  const base = {
    stageId: valve.id,
    side: valve.side,
    index: stage.index,
    mode: stage.mode,
    openingGaugePa: valveOpeningGaugePa(valve),
    binsUsed: found.binsUsed,
    appliedBelowM2: found.appliedBelowM2,
    currentAreaM2: current,
    opening: found.opening,
  };
  const unchanged = (limitedBy: CorrectionLimit, change: string): StageCorrection => ({
    ...base,
    wantedAreaM2: current,
    proposedAreaM2: current,
    clamped: false,
    changePct: current > 0 ? 0 : null,
    layout: null,
    drilledAreaM2: current,
    realisedChangeM2: 0,
    limitedBy,
    change,
  });
  if (found.binsUsed === 0) return unchanged("readings", `${label}: ${holesText(stage.layout)}, unchanged: no bin with enough readings`);
  if (found.opening !== null) {
    const { proposedGaugePa, direction } = found.opening;
    return unchanged(
      null,
      `${label}: ${holesText(stage.layout)}, unchanged; set the valve to open at ${openingText(valve, proposedGaugePa)} ` +
        `(now ${openingText(valve, base.openingGaugePa)}): it comes in too ${direction === "later" ? "early" : "late"}`,
    );
  }

  const wanted = current + found.change;
  const proposed = Math.max(wanted, 0);
  const changePct = current > 0 ? (proposed / current - 1) * 100 : null;
  if (proposed === 0) {
    return {
      ...base,
      wantedAreaM2: wanted,
      proposedAreaM2: 0,
      clamped: wanted < 0,
      changePct,
      layout: null,
      drilledAreaM2: 0,
      realisedChangeM2: -current,
      limitedBy: null,
      change: `${label}: ${holesText(stage.layout)} -> no holes (close the channel${wanted < 0 ? "; still rich" : ""})`,
    };
  }
  const solved = solveHoleLayout({
    targetEffectiveAreaM2: proposed,
    drills: input.drills,
    limits: input.limits,
    maxHoles: stage.maxHoles,
    valveWindowAreaM2: stage.valveWindowAreaM2,
    channelLengthM: stage.channelLengthM,
    minWebM: stage.minWebM ?? input.minWebM,
    limit: 1,
  });
  const best = solved.candidates[0];
  if (best === undefined) {
    // Nothing the shop may drill: the stage stays as it is.
    return { ...unchanged("rack", `${label}: ${holesText(stage.layout)}, unchanged: ${solved.message ?? "no drill within the shop's limits"}`), wantedAreaM2: wanted, proposedAreaM2: proposed, changePct };
  }
  let limitedBy: CorrectionLimit = null;
  if (solved.limitedBy === "valve-window") limitedBy = "valve";
  else if (solved.unattainable) limitedBy = "rack";
  else if (!best.fits) limitedBy = "channel";
  else if (best.valveLimited) limitedBy = "valve";
  return {
    ...base,
    wantedAreaM2: wanted,
    proposedAreaM2: proposed,
    clamped: false,
    changePct,
    layout: best,
    drilledAreaM2: best.effectiveAreaM2,
    realisedChangeM2: best.effectiveAreaM2 - current,
    limitedBy,
    change: `${label}: ${holesText(stage.layout)} -> ${holesText(best)}`,
  };
}
