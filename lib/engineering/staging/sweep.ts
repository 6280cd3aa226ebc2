// The pressure sweep: supplied against needed area at every point from vacuum to peak boost, in both
// throttle modes, and the runs of points whose mixture leaves the band.

import { requireFinite, requireInRange, requireInteger } from "../checks";
import {
  calibrationOf,
  suppliedAreaAt,
  targetAfrAt,
  validateModel,
  valveIsOpen,
  valveOpeningGaugePa,
  venturiAirAt,
  type StagingModel,
  type ThrottleMode,
} from "./model";

export interface StagingSweepOptions {
  /** First gauge pressure, Pa (a vacuum is negative). */
  fromGaugePa: number;
  /** Last gauge pressure, Pa. */
  toGaugePa: number;
  /** Evenly spaced points, at least 2. Every valve's opening pressure inside the range is added. */
  points: number;
  /** Half-width of the acceptable mixture band as a fraction: 0.05 accepts ratios 0.95 to 1.05. */
  band: number;
  /**
   * Lowest gauge pressure at which the engine can be at full throttle (default: the whole range). Deeper
   * vacuum only happens at part throttle, so full-throttle zones are not reported below it.
   */
  fullThrottleFromGaugePa?: number | undefined;
}

export interface MixtureCurve {
  suppliedM2: number[];
  neededM2: number[];
  /** supplied / needed: above 1 rich, below 1 lean. */
  ratio: number[];
  /** AFR (or lambda, if the target was given as lambda) the mixture actually has. */
  afr: number[];
}

export interface MixtureZone {
  mode: ThrottleMode;
  kind: "lean" | "rich";
  fromGaugePa: number;
  toGaugePa: number;
  /** The ratio furthest outside the band in the zone. */
  worstRatio: number;
}

export interface StagingSweep {
  gaugePa: number[];
  venturiTemperatureK: number[];
  venturiDensityKgM3: number[];
  targetAfr: number[];
  /** Ids of the valves open at each point. */
  openValveIds: string[][];
  part: MixtureCurve;
  full: MixtureCurve;
  /** Runs of consecutive points outside the band, per mode. */
  zones: MixtureZone[];
  baseAreaM2: { partThrottle: number; fullThrottle: number };
}

function sweepGrid(model: StagingModel, options: StagingSweepOptions): number[] {
  const from = requireFinite("fromGaugePa", options.fromGaugePa);
  const to = requireFinite("toGaugePa", options.toGaugePa);
  if (!(to > from)) throw new RangeError("toGaugePa must be above fromGaugePa");
  const n = requireInteger("points", options.points, 2, 100_000);
  const grid: number[] = [];
  for (let i = 0; i < n; i++) grid.push(i === n - 1 ? to : from + ((to - from) * i) / (n - 1));
  for (const v of model.valves) {
    const p = valveOpeningGaugePa(v);
    if (p > from && p < to) grid.push(p);
  }
  grid.sort((a, b) => a - b);
  return grid.filter((p, i) => i === 0 || p !== grid[i - 1]);
}

export function sweepStaging(model: StagingModel, options: StagingSweepOptions): StagingSweep {
  validateModel(model);
  const band = requireInRange("band", options.band, 0, 1);
  const cal = calibrationOf(model);
  const gaugePa = sweepGrid(model, options);
  const result: StagingSweep = {
    gaugePa,
    venturiTemperatureK: [],
    venturiDensityKgM3: [],
    targetAfr: [],
    openValveIds: [],
    part: { suppliedM2: [], neededM2: [], ratio: [], afr: [] },
    full: { suppliedM2: [], neededM2: [], ratio: [], afr: [] },
    zones: [],
    baseAreaM2: { partThrottle: cal.basePart, fullThrottle: cal.baseFull },
  };
  for (const p of gaugePa) {
    const air = venturiAirAt(model, p);
    const afrTarget = targetAfrAt(model.target, p);
    const factor = Math.sqrt(air.densityKgM3 / cal.referenceDensity) * (cal.referenceAfr / afrTarget);
    result.venturiTemperatureK.push(air.temperatureK);
    result.venturiDensityKgM3.push(air.densityKgM3);
    result.targetAfr.push(afrTarget);
    result.openValveIds.push(model.valves.filter((v) => valveIsOpen(v, p)).map((v) => v.id));
    for (const mode of ["part", "full"] as const) {
      const curve = result[mode];
      const supplied = suppliedAreaAt(model, p, mode);
      const needed = (mode === "part" ? cal.basePart : cal.baseFull) * factor;
      const ratio = supplied / needed;
      curve.suppliedM2.push(supplied);
      curve.neededM2.push(needed);
      curve.ratio.push(ratio);
      curve.afr.push(afrTarget / ratio);
    }
  }
  const fullFrom = options.fullThrottleFromGaugePa ?? -Infinity;
  result.zones.push(...zonesOf("part", gaugePa, result.part.ratio, band));
  const fullStart = gaugePa.findIndex((p) => p >= fullFrom);
  if (fullStart !== -1) result.zones.push(...zonesOf("full", gaugePa.slice(fullStart), result.full.ratio.slice(fullStart), band));
  return result;
}

function zonesOf(mode: ThrottleMode, gaugePa: readonly number[], ratio: readonly number[], band: number): MixtureZone[] {
  const zones: MixtureZone[] = [];
  let open: MixtureZone | undefined;
  for (let i = 0; i < ratio.length; i++) {
    const r = ratio[i] as number;
    const p = gaugePa[i] as number;
    const kind = r < 1 - band ? "lean" : r > 1 + band ? "rich" : undefined;
    if (open !== undefined && open.kind === kind) {
      open.toGaugePa = p;
      if (kind === "lean" ? r < open.worstRatio : r > open.worstRatio) open.worstRatio = r;
      continue;
    }
    if (open !== undefined) zones.push(open);
    open = kind === undefined ? undefined : { mode, kind, fromGaugePa: p, toGaugePa: p, worstRatio: r };
  }
  if (open !== undefined) zones.push(open);
  return zones;
}

