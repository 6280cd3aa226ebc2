// Which holes to drill in a power-valve channel: 1 to 4 holes of one drill from the shop's set, ranked by
// how close their effective area (holes in series with the valve's flow window) comes to the target.
//
// Ranking, a total order:
//   1. layouts that fit the channel before layouts that don't;
//   2. smaller absolute area error (effective area vs target);
//   3. fewer holes;
//   4. larger drill;
//   5. drill label, then position in the drill list (only reached by duplicate drills).
//
// Fit rule (only checked when a channel length is given): the holes sit in one row along the channel with a
// web of at least minWebM of metal between neighbours:
//   count * d + (count - 1) * minWebM <= channelLengthM
// channelLengthM is the usable length, already less whatever the shop keeps clear at the ends.
//
// The search runs on every keystroke of the planner, over the whole drill series (several hundred drills x
// 4 counts): the loop writes into reused typed arrays and one radix sort orders them, with no comparator.

import { requireInteger, requireNonNegative, requirePositive } from "./checks";
import type { Drill } from "./types";

export const MAX_HOLES_PER_CHANNEL = 4;

export interface HoleLayoutInput {
  /** Effective area the channel should pass, m². */
  targetEffectiveAreaM2: number;
  /** Drills to choose from (any order). */
  drills: readonly Drill[];
  /** Largest hole count to consider, 1 to 4. */
  maxHoles: number;
  /** The power valve's own flow window, in series with the holes, m². Omit if not known. */
  valveWindowAreaM2?: number | undefined;
  /** Usable channel length for the row of holes, m. Omit to skip the fit check. */
  channelLengthM?: number | undefined;
  /** Least metal between neighbouring holes, m. Default 0 (holes may touch); set the shop's rule. */
  minWebM?: number | undefined;
  /** Return only the first N candidates of the ranking. Default: all. */
  limit?: number | undefined;
}

export interface HoleLayoutCandidate {
  count: number;
  drill: Drill;
  /** count x hole area, m². */
  holesAreaM2: number;
  /** Holes in series with the valve window (or the holes alone), m². */
  effectiveAreaM2: number;
  /** effectiveAreaM2 - target, m²: positive means more area (more fuel) than asked for. */
  errorM2: number;
  /** errorM2 as a percent of the target. */
  errorPct: number;
  /** Whether the row of holes fits the channel (true when no channel length was given). */
  fits: boolean;
  /** Whether the valve window, not the holes, sets the flow (holes' area >= window area). */
  valveLimited: boolean;
}

const QUARTER_PI = Math.PI / 4;

// Scratch buffers reused between calls (JavaScript runs one call at a time and nothing here awaits).
// Candidate k is described by drillOf[k], countOf[k], unfit[k] and its sort key absError[k] (>= 0).
let capacity = 0;
let absError = new Float64Array(0);
let errorWords = new Uint32Array(0);
let drillOf = new Int32Array(0);
let countOf = new Int32Array(0);
let unfit = new Uint8Array(0);
let rankA = new Int32Array(0);
let rankB = new Int32Array(0);
let drillRank = new Int32Array(0);
const digitCounts = new Int32Array(256);
// Which 32-bit half of a double holds its low bits in a typed-array view (platform byte order).
const LOW_WORD = new Uint8Array(Uint32Array.of(1).buffer)[0] === 1 ? 0 : 1;

function ensureCapacity(candidates: number, drillCount: number): void {
  if (drillCount > drillRank.length) drillRank = new Int32Array(Math.max(drillCount, drillRank.length * 2));
  if (candidates <= capacity) return;
  capacity = Math.max(candidates, capacity * 2);
  absError = new Float64Array(capacity);
  errorWords = new Uint32Array(absError.buffer);
  drillOf = new Int32Array(capacity);
  countOf = new Int32Array(capacity);
  unfit = new Uint8Array(capacity);
  rankA = new Int32Array(capacity);
  rankB = new Int32Array(capacity);
}

/**
 * Fills drillRank[0..n) with the drill indices in tie-break order: larger diameter first, then label, then
 * list position. A list sorted by ascending diameter without repeats (the usual drill table) is just read
 * backwards; anything else is sorted once here, outside the candidate loop.
 */
function rankDrills(drills: readonly Drill[]): void {
  const n = drills.length;
  let strictlyAscending = true;
  for (let i = 0; i < n; i++) {
    const d = (drills[i] as Drill).diameterM;
    if (!(Number.isFinite(d) && d > 0)) {
      throw new RangeError(`drills[${i}].diameterM must be a positive number, got ${d}`);
    }
    if (i > 0 && !(d > (drills[i - 1] as Drill).diameterM)) strictlyAscending = false;
  }
  if (strictlyAscending) {
    for (let i = 0; i < n; i++) drillRank[i] = n - 1 - i;
    return;
  }
  const indices = Array.from({ length: n }, (_, i) => i);
  indices.sort((a, b) => {
    const da = (drills[a] as Drill).diameterM;
    const db = (drills[b] as Drill).diameterM;
    if (da !== db) return db - da;
    const la = (drills[a] as Drill).label;
    const lb = (drills[b] as Drill).label;
    if (la !== lb) return la < lb ? -1 : 1;
    return a - b;
  });
  for (let i = 0; i < n; i++) drillRank[i] = indices[i] as number;
}

/**
 * Stable least-significant-digit radix sort of rankA[0..n) by absError, one byte per pass. A non-negative
 * double's bit pattern orders like its value, so this is exact, and stability keeps the tie-break order the
 * candidates were written in. Passes where every key has the same byte are skipped. Returns the sorted array.
 */
function sortByError(n: number): Int32Array {
  let src = rankA;
  let dst = rankB;
  const words = errorWords;
  const counts = digitCounts;
  for (let pass = 0; pass < 8; pass++) {
    const word = pass < 4 ? LOW_WORD : 1 - LOW_WORD;
    const shift = (pass & 3) << 3;
    counts.fill(0);
    for (let i = 0; i < n; i++) {
      const digit = ((words[2 * i + word] as number) >>> shift) & 255;
      counts[digit] = (counts[digit] as number) + 1;
    }
    const firstDigit = ((words[2 * (src[0] as number) + word] as number) >>> shift) & 255;
    if (counts[firstDigit] === n) continue;
    let offset = 0;
    for (let digit = 0; digit < 256; digit++) {
      const c = counts[digit] as number;
      counts[digit] = offset;
      offset += c;
    }
    for (let i = 0; i < n; i++) {
      const k = src[i] as number;
      const digit = ((words[2 * k + word] as number) >>> shift) & 255;
      const at = counts[digit] as number;
      dst[at] = k;
      counts[digit] = at + 1;
    }
    const t = src;
    src = dst;
    dst = t;
  }
  return src;
}

export function solveHoleLayout(input: HoleLayoutInput): HoleLayoutCandidate[] {
  const target = requirePositive("targetEffectiveAreaM2", input.targetEffectiveAreaM2);
  const maxHoles = requireInteger("maxHoles", input.maxHoles, 1, MAX_HOLES_PER_CHANNEL);
  const window =
    input.valveWindowAreaM2 === undefined ? 0 : requirePositive("valveWindowAreaM2", input.valveWindowAreaM2);
  const channel = input.channelLengthM === undefined ? -1 : requirePositive("channelLengthM", input.channelLengthM);
  const web = input.minWebM === undefined ? 0 : requireNonNegative("minWebM", input.minWebM);
  const drills = input.drills;
  const drillCount = drills.length;
  const total = drillCount * maxHoles;
  const limit =
    input.limit === undefined
      ? total
      : Math.min(total, requireInteger("limit", input.limit, 0, Number.MAX_SAFE_INTEGER));
  if (total === 0) return [];

  ensureCapacity(total, drillCount);
  rankDrills(drills);
  const windowSquared = window * window;

  // Candidates are written in tie-break order (fewer holes, then larger drill, then label), so the stable
  // sort by error leaves exact ties in that order.
  let k = 0;
  for (let count = 1; count <= maxHoles; count++) {
    for (let r = 0; r < drillCount; r++) {
      const i = drillRank[r] as number;
      const d = (drills[i] as Drill).diameterM;
      const holes = count * QUARTER_PI * d * d;
      const effective = window === 0 ? holes : (holes * window) / Math.sqrt(holes * holes + windowSquared);
      absError[k] = Math.abs(effective - target);
      drillOf[k] = i;
      countOf[k] = count;
      unfit[k] = channel >= 0 && count * d + (count - 1) * web > channel ? 1 : 0;
      rankA[k] = k;
      k++;
    }
  }

  const byError = sortByError(total);

  const out = new Array<HoleLayoutCandidate>(limit);
  let written = 0;
  // Fitting layouts first, then the rest, each in error order.
  for (let pass = 0; pass < 2 && written < limit; pass++) {
    for (let r = 0; r < total && written < limit; r++) {
      const c = byError[r] as number;
      if (unfit[c] !== pass) continue;
      out[written++] = candidate(drills[drillOf[c] as number] as Drill, countOf[c] as number, pass === 0);
    }
  }
  return out;

  function candidate(drill: Drill, count: number, fits: boolean): HoleLayoutCandidate {
    const holesAreaM2 = count * QUARTER_PI * drill.diameterM * drill.diameterM;
    const effectiveAreaM2 =
      window === 0 ? holesAreaM2 : (holesAreaM2 * window) / Math.sqrt(holesAreaM2 * holesAreaM2 + windowSquared);
    const errorM2 = effectiveAreaM2 - target;
    return {
      count,
      drill,
      holesAreaM2,
      effectiveAreaM2,
      errorM2,
      errorPct: (errorM2 / target) * 100,
      fits,
      valveLimited: window !== 0 && holesAreaM2 >= window,
    };
  }
}
