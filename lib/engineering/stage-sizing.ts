// Sizing the enrichment stages of a whole carburetor, one stage at a time in the order they open.
//
// The engine is one mixture: a wideband reads the exhaust of every cylinder, fed by every metering orifice that
// has signal. At part throttle only the primary side meters (its main jets and its open restrictions); at full
// throttle both sides do. So a stage that must move the mixture from `before` to `after` adds
//     A_stage = (before / after - 1) x A_open
// where A_open is all the metering area open in the stage's throttle mode just below its opening point: every
// main jet of the sides that meter in that mode, and the drilled (effective) area of every stage already open.
// With equal discharge coefficients and one metering signal, fuel flow is proportional to area (m = Cd A
// sqrt(2 rho dP); Heywood, Internal Combustion Engine Fundamentals, ch. 7), so adding (before/after - 1) of the
// open area adds that fraction of fuel at the same air. The assumption of equal Cd is stated once, here: a
// drilled restriction and a main jet are both short sharp-edged holes in the same fuel.
//
// Stages given as a percent of main-jet area stay per-block figures (that block's own jets), and a stage given
// as an area is that area; both still count as open area for the stages above them.

import { solveHoleLayout, type HoleLayoutCandidate } from "./hole-layout";
import type { RestrictionDrillLimits } from "./restriction-limits";
import { circleArea } from "./orifice";
import { suppliedAreaAt, type CarburetorSide, type PowerValve, type ThrottleMode } from "./staging";
import type { PlanWarning } from "./plan-warnings";
import type { Drill } from "./types";

export type EnrichmentTarget =
  | { kind: "afr"; from: number; to: number }
  | { kind: "lambda"; from: number; to: number }
  | { kind: "percentMainJet"; percent: number }
  | { kind: "area"; areaM2: number };

export type StageValve = { kind: "vacuum"; ratingPa: number } | { kind: "boost"; setpointPa: number };

export interface StageInput {
  id: string;
  valve: StageValve;
  target: EnrichmentTarget;
  /** Throttle mode the mixture target is read in. Default: part on the primary, full on the secondary. */
  mode?: ThrottleMode | undefined;
  valveWindowAreaM2?: number | undefined;
  maxHoles: number;
  /** The tuner's pick among the candidates; the solver's first when absent or no longer offered. */
  chosen?: { count: number; drillLabel: string } | undefined;
}

export interface SizedBlock {
  id: string;
  side: CarburetorSide;
  mainJetAreaM2: number;
  channelLengthM?: number | undefined;
  minWebM?: number | undefined;
  stages: readonly StageInput[];
}

/** How a stage's area was found: on the engine's open area, on its block's main jets, or given. */
export type SizingBasis = "engine" | "block" | "area";

export interface StagePlan {
  stageId: string;
  blockId: string;
  side: CarburetorSide;
  mode: ThrottleMode;
  openingGaugePa: number;
  basis: SizingBasis;
  /** Metering area the stage's fraction applies to: the engine's open area, or the block's jets. */
  basisAreaM2: number;
  /** Extra fuel asked for, as a fraction of the fuel through basisAreaM2. */
  extraFuelFraction: number;
  targetAreaM2: number;
  candidates: HoleLayoutCandidate[];
  chosen: HoleLayoutCandidate;
  chosenBy: "tuner" | "solver";
  warnings: PlanWarning[];
}

const CANDIDATES_SHOWN = 6;

export function stageOpeningGaugePa(valve: StageValve): number {
  return valve.kind === "vacuum" ? -valve.ratingPa : valve.setpointPa;
}

export function stageMode(stage: Pick<StageInput, "mode">, side: CarburetorSide): ThrottleMode {
  const mode = stage.mode ?? (side === "primary" ? "part" : "full");
  // The secondary side has no signal until the secondaries open: a part-throttle target is the primary's alone.
  if (side === "secondary" && mode === "part") throw new RangeError("a secondary stage is read in full throttle: the secondaries are shut at part throttle");
  return mode;
}

/** Extra fuel a mixture change asks for: before / after - 1, for AFR and lambda alike. */
export function extraFuelForMixtureChange(before: number, after: number): number {
  if (!(before > 0 && after > 0)) throw new RangeError("mixtures must be positive");
  if (!(after < before)) throw new RangeError("an enrichment stage must make the mixture richer (a lower number)");
  return before / after - 1;
}

function stageValve(stage: StageInput, side: CarburetorSide, restrictionAreaM2: number): PowerValve {
  return stage.valve.kind === "vacuum"
    ? { id: stage.id, side, kind: "vacuum", ratingPa: stage.valve.ratingPa, restrictionAreaM2 }
    : { id: stage.id, side, kind: "boost", setpointPa: stage.valve.setpointPa, restrictionAreaM2 };
}

/** Main-jet area of each side (zero for a side with no block). */
export function mainJetsBySide(blocks: readonly Pick<SizedBlock, "side" | "mainJetAreaM2">[]): { primary: number; secondary: number } {
  const of = (side: CarburetorSide) => blocks.filter((b) => b.side === side).reduce((sum, b) => sum + b.mainJetAreaM2, 0);
  return { primary: of("primary"), secondary: of("secondary") };
}

export function jetAreaOf(mainJetDiameterM: number, mainJetCount: number): number {
  return mainJetCount * circleArea(mainJetDiameterM);
}

/**
 * Sizes every stage of every block in opening order (ties: block order, then stage order) and picks its holes.
 * Returns the plans in that order and the valves with their drilled areas.
 */
export function sizeStages(input: {
  blocks: readonly SizedBlock[];
  drills: readonly Drill[];
  limits?: RestrictionDrillLimits | undefined;
  minWebM?: number | undefined;
}): { stages: StagePlan[]; valves: PowerValve[] } {
  const mainJets = mainJetsBySide(input.blocks);
  const order = input.blocks
    .flatMap((block, b) => block.stages.map((stage, s) => ({ block, stage, b, s })))
    .sort((x, y) => stageOpeningGaugePa(x.stage.valve) - stageOpeningGaugePa(y.stage.valve) || x.b - y.b || x.s - y.s);
  const valves: PowerValve[] = [];
  const stages: StagePlan[] = [];
  for (const { block, stage } of order) {
    const mode = stageMode(stage, block.side);
    const openingGaugePa = stageOpeningGaugePa(stage.valve);
    let basis: SizingBasis;
    let basisAreaM2: number;
    let extra: number;
    let targetAreaM2: number;
    switch (stage.target.kind) {
      case "afr":
      case "lambda":
        basis = "engine";
        basisAreaM2 = suppliedAreaAt({ mainJets, valves }, openingGaugePa, mode, true);
        extra = extraFuelForMixtureChange(stage.target.from, stage.target.to);
        targetAreaM2 = extra * basisAreaM2;
        break;
      case "percentMainJet":
        basis = "block";
        basisAreaM2 = block.mainJetAreaM2;
        extra = stage.target.percent / 100;
        targetAreaM2 = extra * basisAreaM2;
        break;
      case "area":
        basis = "area";
        basisAreaM2 = block.mainJetAreaM2;
        targetAreaM2 = stage.target.areaM2;
        extra = targetAreaM2 / basisAreaM2;
        break;
    }
    if (!(targetAreaM2 > 0)) throw new RangeError(`stage ${stage.id}: the area to add must be positive`);
    const plan = pickLayout({ stage, block, mode, openingGaugePa, basis, basisAreaM2, extra, targetAreaM2, drills: input.drills, limits: input.limits, minWebM: input.minWebM });
    stages.push(plan);
    valves.push(stageValve(stage, block.side, plan.chosen.effectiveAreaM2));
  }
  return { stages, valves };
}

function pickLayout(a: {
  stage: StageInput;
  block: SizedBlock;
  mode: ThrottleMode;
  openingGaugePa: number;
  basis: SizingBasis;
  basisAreaM2: number;
  extra: number;
  targetAreaM2: number;
  drills: readonly Drill[];
  limits?: RestrictionDrillLimits | undefined;
  minWebM?: number | undefined;
}): StagePlan {
  const { stage, block } = a;
  const solved = solveHoleLayout({
    targetEffectiveAreaM2: a.targetAreaM2,
    drills: a.drills,
    limits: a.limits,
    maxHoles: stage.maxHoles,
    valveWindowAreaM2: stage.valveWindowAreaM2,
    channelLengthM: block.channelLengthM,
    minWebM: block.minWebM ?? a.minWebM,
  });
  const ranked = solved.candidates;
  const best = ranked[0];
  if (!best) throw new RangeError("drills: no drill to choose from within the shop's limits");
  const wanted = stage.chosen;
  const picked = wanted ? ranked.find((c) => c.count === wanted.count && c.drill.label === wanted.drillLabel) : undefined;
  const chosen = picked ?? best;
  const about = { blockId: block.id, stageId: stage.id };
  const warnings: PlanWarning[] = [];
  if (wanted && !picked) {
    warnings.push({
      code: "layout_not_offered",
      level: "caution",
      message: `${wanted.count} x ${wanted.drillLabel} is no longer offered (drill not stocked, or outside the shop's limits): the solver's first layout is used.`,
      ...about,
    });
  }
  if (solved.unattainable && solved.message) {
    warnings.push({ code: "target_unattainable", level: "warning", message: `No layout the shop can drill reaches the area this stage needs: ${solved.message}`, ...about });
  }
  if (!chosen.fits) warnings.push({ code: "holes_do_not_fit", level: "warning", message: "The holes do not fit the channel with the least web between them.", ...about });
  if (chosen.valveLimited) {
    warnings.push({ code: "valve_limited", level: "caution", message: "The valve's own flow window limits this stage: more hole area adds little.", ...about });
  }
  if (Math.abs(chosen.errorPct) > 10 && !solved.unattainable) {
    warnings.push({
      code: "layout_misses_target",
      level: chosen.errorPct < 0 ? "warning" : "caution",
      message: `The closest layout misses the area this stage needs by ${chosen.errorPct.toFixed(1)} %.`,
      ...about,
    });
  }
  const shown = ranked.slice(0, CANDIDATES_SHOWN);
  if (!shown.includes(chosen)) shown.push(chosen);
  return {
    stageId: stage.id,
    blockId: block.id,
    side: block.side,
    mode: a.mode,
    openingGaugePa: a.openingGaugePa,
    basis: a.basis,
    basisAreaM2: a.basisAreaM2,
    extraFuelFraction: a.extra,
    targetAreaM2: a.targetAreaM2,
    candidates: shown,
    chosen,
    chosenBy: picked ? "tuner" : "solver",
    warnings,
  };
}
