// Readings grouped by manifold gauge pressure, per throttle mode, each group summed up by its median lambda and
// its spread. A bin with too few readings says so: it is a question for the next run, not an answer.
//
// * Bins are [k w, (k + 1) w) of the shop's width w, split further at any edge the caller gives (every
//   valve's opening point), so no bin holds readings from both sides of an opening. An edge starts the bin
//   above it.
// * A bin's pressure is the median of its readings' pressures: where they were read, not the bin's middle.
// * Spread is the interquartile range, quartiles by linear interpolation between order statistics (Hyndman and
//   Fan, "Sample quantiles in statistical packages", 1996, definition 7; mathjs quantileSeq computes it).

import { create, medianDependencies, quantileSeqDependencies } from "mathjs";
import { requireFinite, requireInteger, requirePositive } from "./checks";
import type { ModeReading } from "./steady-readings";
import type { ThrottleMode } from "./staging";
import { toSI } from "./units";

// mathjs types its dependency maps as possibly undefined under noUncheckedIndexedAccess; they are always there.
function dependency<T>(map: T | undefined, name: string): T {
  if (map === undefined) throw new Error(`mathjs: ${name} is missing`);
  return map;
}

const math = create({
  medianDependencies: dependency(medianDependencies, "medianDependencies"),
  quantileSeqDependencies: dependency(quantileSeqDependencies, "quantileSeqDependencies"),
});

/** Bin width: 1 psi (a shop setting; common practice, no published source). */
export const DEFAULT_BIN_WIDTH_PA = toSI("pressure", 1, "psi");
/** Fewest readings a bin needs before it counts: 5 (common practice, no published source). */
export const DEFAULT_MIN_BIN_COUNT = 5;

export interface MixtureBin {
  mode: ThrottleMode;
  /** Bin edges, gauge Pa: from (inclusive) to (exclusive). */
  fromPa: number;
  toPa: number;
  /** Median gauge pressure of the bin's readings, Pa. */
  gaugePa: number;
  count: number;
  /** Median lambda. */
  lambda: number;
  /** Interquartile range of lambda (0 for a single reading). */
  spread: number;
  /** Whether the bin holds at least the minimum count. */
  enough: boolean;
  /** Lines of the readings in the bin. */
  lines: number[];
}

export interface BinOptions {
  widthPa?: number | undefined;
  minCount?: number | undefined;
  /** Further bin edges, gauge Pa (valve opening points). */
  edgesPa?: readonly number[] | undefined;
}

/** Median of a non-empty list (the middle value, or the mean of the two middle ones). */
export function median(values: readonly number[]): number {
  if (values.length === 0) throw new RangeError("median of no values");
  return quartiles(values).median;
}

/**
 * Quartiles and median in one pass over a sorted copy (a typed-array sort: a log's bin can hold thousands of
 * readings), by mathjs's quantileSeq told the values are sorted.
 */
function quartiles(values: readonly number[]): { q1: number; median: number; q3: number } {
  const sorted = Array.from(Float64Array.from(values).sort());
  const [q1, mid, q3] = math.quantileSeq(sorted, [0.25, 0.5, 0.75], true) as number[];
  return { q1: q1 as number, median: mid as number, q3: q3 as number };
}

/** The bins of a log, part throttle first, each mode from the lowest pressure up. */
export function binReadings(readings: readonly ModeReading[], options: BinOptions = {}): MixtureBin[] {
  const width = requirePositive("widthPa", options.widthPa ?? DEFAULT_BIN_WIDTH_PA);
  const minCount = requireInteger("minCount", options.minCount ?? DEFAULT_MIN_BIN_COUNT, 1, 1_000_000);
  const edges = [...new Set((options.edgesPa ?? []).map((e, i) => requireFinite(`edgesPa[${i}]`, e)))].sort((a, b) => a - b);

  const groups = new Map<string, { mode: ThrottleMode; fromPa: number; toPa: number; readings: ModeReading[] }>();
  for (const reading of readings) {
    // Checked before any message is built: a long log has hundreds of thousands of readings.
    const p = Number.isFinite(reading.gaugePa) ? reading.gaugePa : requireFinite(`line ${reading.line} gaugePa`, reading.gaugePa);
    const cell = Math.floor(p / width);
    let fromPa = cell * width;
    let toPa = (cell + 1) * width;
    for (const e of edges) {
      if (e > fromPa && e <= p) fromPa = e;
      if (e > p && e < toPa) toPa = e;
    }
    const key = `${reading.mode} ${fromPa}`;
    const group = groups.get(key) ?? { mode: reading.mode, fromPa, toPa, readings: [] };
    group.readings.push(reading);
    groups.set(key, group);
  }

  const modeOrder = (m: ThrottleMode) => (m === "part" ? 0 : 1);
  return [...groups.values()]
    .sort((a, b) => modeOrder(a.mode) - modeOrder(b.mode) || a.fromPa - b.fromPa)
    .map((g) => {
      const lambda = quartiles(g.readings.map((r) => r.lambda));
      return {
        mode: g.mode,
        fromPa: g.fromPa,
        toPa: g.toPa,
        gaugePa: median(g.readings.map((r) => r.gaugePa)),
        count: g.readings.length,
        lambda: lambda.median,
        spread: lambda.q3 - lambda.q1,
        enough: g.readings.length >= minCount,
        lines: g.readings.map((r) => r.line),
      };
    });
}
