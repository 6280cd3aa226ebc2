// Correcting the stages from air-fuel readings taken on the car.
//
// A reading at gauge pressure p says the mixture there is AFR_measured where AFR_target(p) was wanted. At
// the same air flow, fuel needed / fuel delivered = AFR_measured / AFR_target, and fuel is proportional to
// the metering area (equal signal and Cd, see staging.ts), so the total area at p must change by
//   dA(p) = A_total(p) * (AFR_measured / AFR_target(p) - 1)
// (lambda readings against a lambda target work the same: only the ratio enters).
//
// A stage is the pressure range in which one valve is the last to have opened: from its opening pressure
// to the next valve's. Below the first valve the mains alone meter. A stage's correction goes to its own
// restriction; since earlier stages stay open above, their corrections already move this stage's total,
// so each stage takes the mean dA of its readings less every correction made below it (stages are settled
// from the lowest up; a mains correction counts as made). Valves that open at the same pressure share
// their stage's correction in proportion to their present areas (equally if all are zero).

import { requireFinite, requireNonNegative, requirePositive } from "./checks";
import { solveHoleLayout, type HoleLayoutCandidate } from "./hole-layout";
import {
  jetBankArea,
  targetAfrAt,
  valveIsOpen,
  valveOpeningGaugePa,
  type PowerValve,
  type StagingModel,
  type ThrottleMode,
} from "./staging";
import type { Drill } from "./types";

export interface AfrReading {
  gaugePa: number;
  /** Measured AFR (or lambda, if the target is lambda). */
  afr: number;
}

export interface TuningCorrectionInput {
  model: Pick<StagingModel, "mainJets" | "valves" | "target">;
  readings: readonly AfrReading[];
  /** Throttle the readings were taken at. Default full: both sides meter. */
  mode?: ThrottleMode | undefined;
  /** When given, the new area of each corrected restriction is turned into holes from these drills. */
  layout?:
    | {
        drills: readonly Drill[];
        maxHoles: number;
        channelLengthM?: number | undefined;
        minWebM?: number | undefined;
        /** Flow window of the valves, m²: one figure for all, or by valve id. */
        valveWindowAreaM2?: number | Readonly<Record<string, number>> | undefined;
      }
    | undefined;
}

export interface ValveCorrection {
  valveId: string;
  currentAreaM2: number;
  /** Restriction area after the correction, m² (never below zero). */
  newAreaM2: number;
  /** The correction asked for less than zero area: the channel should be closed and the stage is still rich. */
  clampedToZero: boolean;
  /** Best hole layout for newAreaM2 (absent with no drills given or a zero area). */
  holes?: HoleLayoutCandidate | undefined;
}

export interface StageCorrection {
  /** Valve ids of the stage, or "mains" below the first valve. */
  stage: string;
  fromGaugePa: number;
  /** Where the next stage begins (Infinity for the last). */
  toGaugePa: number;
  readingCount: number;
  /** Mean total-area change the stage's readings ask for, m² (0 without readings). */
  meanTotalChangeM2: number;
  /** The change this stage's own restriction (or the mains) must make, m². */
  changeM2: number;
  /** Per valve of the stage; empty for the mains stage. */
  valves: ValveCorrection[];
}

export interface TuningCorrection {
  mode: ThrottleMode;
  stages: StageCorrection[];
}

function counts(mode: ThrottleMode, valve: PowerValve): boolean {
  return mode === "full" || valve.side === "primary";
}

export function correctStages(input: TuningCorrectionInput): TuningCorrection {
  const mode = input.mode ?? "full";
  const model = input.model;
  const mains = jetBankArea(model.mainJets.primary) + (mode === "full" ? jetBankArea(model.mainJets.secondary) : 0);
  for (const v of model.valves) requireNonNegative(`valve ${v.id} restrictionAreaM2`, v.restrictionAreaM2);
  const valves = model.valves.filter((v) => counts(mode, v));
  const openings = [...new Set(valves.map(valveOpeningGaugePa))].sort((a, b) => a - b);

  const stageOf = (gaugePa: number): number => {
    // Index into openings of the last opening at or below the reading (-1: mains only).
    let stage = -1;
    for (let i = 0; i < openings.length; i++) {
      const group = valves.filter((v) => valveOpeningGaugePa(v) === openings[i]);
      if (group.some((v) => valveIsOpen(v, gaugePa))) stage = i;
    }
    return stage;
  };

  const totalChange: number[][] = Array.from({ length: openings.length + 1 }, () => []);
  input.readings.forEach((reading, i) => {
    const p = requireFinite(`readings[${i}].gaugePa`, reading.gaugePa);
    const measured = requirePositive(`readings[${i}].afr`, reading.afr);
    let total = mains;
    for (const v of valves) if (valveIsOpen(v, p)) total += v.restrictionAreaM2;
    const change = total * (measured / targetAfrAt(model.target, p) - 1);
    (totalChange[stageOf(p) + 1] as number[]).push(change);
  });

  const stages: StageCorrection[] = [];
  let madeBelow = 0;
  for (let s = -1; s < openings.length; s++) {
    const changes = totalChange[s + 1] as number[];
    const meanTotalChangeM2 = changes.length === 0 ? 0 : changes.reduce((a, b) => a + b, 0) / changes.length;
    const changeM2 = changes.length === 0 ? 0 : meanTotalChangeM2 - madeBelow;
    madeBelow += changeM2;
    const fromGaugePa = s === -1 ? -Infinity : (openings[s] as number);
    const toGaugePa = s + 1 < openings.length ? (openings[s + 1] as number) : Infinity;
    if (s === -1) {
      stages.push({ stage: "mains", fromGaugePa, toGaugePa, readingCount: changes.length, meanTotalChangeM2, changeM2, valves: [] });
      continue;
    }
    const group = valves.filter((v) => valveOpeningGaugePa(v) === openings[s]);
    const groupArea = group.reduce((a, v) => a + v.restrictionAreaM2, 0);
    stages.push({
      stage: group.map((v) => v.id).join("+"),
      fromGaugePa,
      toGaugePa,
      readingCount: changes.length,
      meanTotalChangeM2,
      changeM2,
      valves: group.map((v) => {
        const share = groupArea > 0 ? v.restrictionAreaM2 / groupArea : 1 / group.length;
        const wanted = v.restrictionAreaM2 + changeM2 * share;
        const newAreaM2 = Math.max(wanted, 0);
        return { valveId: v.id, currentAreaM2: v.restrictionAreaM2, newAreaM2, clampedToZero: wanted < 0, holes: holesFor(input, v.id, newAreaM2) };
      }),
    });
  }
  return { mode, stages };
}

function holesFor(input: TuningCorrectionInput, valveId: string, areaM2: number): HoleLayoutCandidate | undefined {
  const layout = input.layout;
  if (layout === undefined || !(areaM2 > 0)) return undefined;
  const window = layout.valveWindowAreaM2;
  const [best] = solveHoleLayout({
    targetEffectiveAreaM2: areaM2,
    drills: layout.drills,
    maxHoles: layout.maxHoles,
    channelLengthM: layout.channelLengthM,
    minWebM: layout.minWebM,
    valveWindowAreaM2: typeof window === "number" || window === undefined ? window : window[valveId],
    limit: 1,
  }).candidates;
  return best;
}
