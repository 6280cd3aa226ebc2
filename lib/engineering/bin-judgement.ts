// What each bin of a log says about the carburetor: its target, how far it misses, the area change it asks of
// the whole engine, and which part of the metering answers for it.
//
// * Target: the plan's target curve at the bin's pressure (targetAfrAt), so a bin under vacuum below the
//   vacuum valve's opening is judged against the cruise lambda, not the power target.
// * Area change: at the same air, fuel wanted / fuel delivered = lambda_measured / lambda_target, and fuel is
//   proportional to metering area (equal Cd and one signal, see stage-sizing.ts), so the area open in the
//   bin's mode must change by  dA = (lambda_measured / lambda_target - 1) x A_open(p),  A_open being every
//   main jet of the sides that meter in that mode plus every open restriction (suppliedAreaAt).
// * Who answers: the stage(s) that opened last among the valves open at the bin's pressure in its mode, when
//   read in that mode; under vacuum at part throttle with no valve open, the primary main jets (cruise);
//   otherwise nothing (a full-throttle bin whose last open stage is read at part throttle, mains alone at or
//   above zero gauge).

import type { MixtureBin } from "./log-bins";
import {
  sideCounts,
  suppliedAreaAt,
  targetAfrAt,
  valveIsOpen,
  valveOpeningGaugePa,
  type PowerValve,
  type StagingModel,
  type ThrottleMode,
} from "./staging";

export type BinUse = { kind: "stage"; valveIds: string[] } | { kind: "cruise" } | { kind: "none" };

export interface JudgedBin extends MixtureBin {
  targetLambda: number;
  /** lambda / target - 1: above zero lean, below rich. */
  error: number;
  /** Metering area open in the bin's mode at its pressure, m². */
  openAreaM2: number;
  /** Area change of the whole engine (in the bin's mode) the bin asks for, m². */
  wantedChangeM2: number;
  use: BinUse;
}

/**
 * Judges every bin against the model. `stageModes` names the throttle mode each corrected stage is read in
 * (by valve id); a valve not named answers for no bin.
 */
export function judgeBins(
  model: Pick<StagingModel, "mainJets" | "valves" | "target">,
  bins: readonly MixtureBin[],
  stageModes: ReadonlyMap<string, ThrottleMode>,
): JudgedBin[] {
  return bins.map((bin) => {
    const p = bin.gaugePa;
    const targetLambda = targetAfrAt(model.target, p);
    const error = bin.lambda / targetLambda - 1;
    const openAreaM2 = suppliedAreaAt(model, p, bin.mode);
    return { ...bin, targetLambda, error, openAreaM2, wantedChangeM2: error * openAreaM2, use: useOf(model.valves, p, bin.mode, stageModes) };
  });
}

function useOf(valves: readonly PowerValve[], p: number, mode: ThrottleMode, stageModes: ReadonlyMap<string, ThrottleMode>): BinUse {
  const open = valves.filter((v) => sideCounts(mode, v.side) && valveIsOpen(v, p));
  if (open.length === 0) return mode === "part" && p < 0 ? { kind: "cruise" } : { kind: "none" };
  const last = Math.max(...open.map(valveOpeningGaugePa));
  const valveIds = open.filter((v) => valveOpeningGaugePa(v) === last && stageModes.get(v.id) === mode).map((v) => v.id);
  return valveIds.length > 0 ? { kind: "stage", valveIds } : { kind: "none" };
}
