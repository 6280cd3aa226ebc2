// Which holes to drill in a power-valve channel: 1 to 4 holes of one drill from the shop's set, ranked by
// how close their effective area (holes in series with the valve's flow window) comes to the target.
//
// Only drills the shop will use are candidates: of the plan's drill system and between its smallest and
// largest restriction drill (restriction-limits.ts). When the target lies outside what those drills can give,
// the result says which limit stops it, and whether it is out of reach altogether.
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
// Reach: one hole of the smallest allowed drill to maxHoles of the largest, each in series with the window
// (1/A_eq² = 1/A_holes² + 1/A_window²). Even endless holes give only the window's area, so a target at or above
// it is out of reach. A target just beyond the drills' reach is still met by the layout at the limit when
// that layout misses by no more than REACH_TOLERANCE_FRACTION; beyond that it is out of reach.
//
// The search runs on every keystroke of the planner, over up to the whole drill series (several hundred drills
// x 4 counts): one pass picks the allowed drills, the loop writes into reused typed arrays and one radix sort
// orders them, with no comparator.

import { requireInteger, requireNonNegative, requirePositive } from "./checks";
import {
  checkRestrictionDrillLimits,
  DEFAULT_MIN_WEB_M,
  DEFAULT_RESTRICTION_DRILL_LIMITS,
  isRestrictionDrill,
  type RestrictionDrillLimits,
} from "./restriction-limits";
import type { Drill } from "./types";

export const MAX_HOLES_PER_CHANNEL = 4;

/**
 * How far the layout at a limit may miss a target beyond the drills' reach and still count as meeting it:
 * 10 % of the target (common practice, no published source).
 */
export const REACH_TOLERANCE_FRACTION = 0.1;

/**
 * What keeps the target from being met within the limits:
 * - "smallest-drill": below one hole of the smallest drill the shop allows;
 * - "largest-layout": above what maxHoles of the largest drill the shop allows give;
 * - "valve-window": at or above the valve's own flow window, which no number of holes passes;
 * - "no-drill": no drill in the list is of the plan's system and within the shop's limits.
 */
export type HoleLayoutLimit = "smallest-drill" | "largest-layout" | "valve-window" | "no-drill";

export interface HoleLayoutInput {
  /** Effective area the channel should pass, m². */
  targetEffectiveAreaM2: number;
  /** Drills to choose from (any order); only those within `limits` are candidates. */
  drills: readonly Drill[];
  /** The plan's drill system and the shop's smallest and largest restriction drill. Default: inch, #70 to 1/8. */
  limits?: RestrictionDrillLimits | undefined;
  /** Largest hole count to consider, 1 to 4. */
  maxHoles: number;
  /** The power valve's own flow window, in series with the holes, m². Omit if not known. */
  valveWindowAreaM2?: number | undefined;
  /** Usable channel length for the row of holes, m. Omit to skip the fit check. */
  channelLengthM?: number | undefined;
  /** Least metal between neighbouring holes, m. Default DEFAULT_MIN_WEB_M (0.020 in); set the shop's rule. */
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

/** The ranking and what it can and cannot reach. */
export interface HoleLayoutResult {
  /** Layouts from allowed drills, best first (the first `limit` of them). */
  candidates: HoleLayoutCandidate[];
  /**
   * Effective areas the allowed drills span, m²: one hole of the smallest to maxHoles of the largest (in series
   * with the window). Null when no drill is allowed.
   */
  reach: { smallestM2: number; largestM2: number; smallestDrill: Drill; largestDrill: Drill } | null;
  /** The limit the target lies beyond, or null when it lies within reach. */
  limitedBy: HoleLayoutLimit | null;
  /**
   * True when no allowed layout can meet the target: no drill, a target at or above the valve window, or one
   * beyond the drills' reach by more than REACH_TOLERANCE_FRACTION.
   */
  unattainable: boolean;
  /** One sentence saying which limit stops the target; null when limitedBy is null. */
  message: string | null;
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
 * Fills drillRank[0..m) with the indices of the allowed drills in tie-break order: larger diameter first, then
 * label, then list position, and returns m. A list in ascending diameter (the usual drill table, where only a
 * few sizes repeat, such as letter E and 1/4 in) is read backwards, each run of one diameter put in label
 * order; anything else is sorted once here, outside the candidate loop.
 */
function rankDrills(drills: readonly Drill[], limits: RestrictionDrillLimits): number {
  const n = drills.length;
  let ascending = true;
  for (let i = 0; i < n; i++) {
    const d = (drills[i] as Drill).diameterM;
    if (!(Number.isFinite(d) && d > 0)) {
      throw new RangeError(`drills[${i}].diameterM must be a positive number, got ${d}`);
    }
    if (i > 0 && d < (drills[i - 1] as Drill).diameterM) ascending = false;
  }
  if (!ascending) {
    const indices: number[] = [];
    for (let i = 0; i < n; i++) if (isRestrictionDrill(drills[i] as Drill, limits)) indices.push(i);
    indices.sort((a, b) => (drills[b] as Drill).diameterM - (drills[a] as Drill).diameterM || byLabel(drills, a, b));
    for (let i = 0; i < indices.length; i++) drillRank[i] = indices[i] as number;
    return indices.length;
  }
  let m = 0;
  for (let last = n - 1; last >= 0; ) {
    const d = (drills[last] as Drill).diameterM;
    let first = last;
    while (first > 0 && (drills[first - 1] as Drill).diameterM === d) first--;
    const start = m;
    for (let i = first; i <= last; i++) if (isRestrictionDrill(drills[i] as Drill, limits)) drillRank[m++] = i;
    if (m - start > 1) drillRank.subarray(start, m).sort((a, b) => byLabel(drills, a, b));
    last = first - 1;
  }
  return m;
}

function byLabel(drills: readonly Drill[], a: number, b: number): number {
  const la = (drills[a] as Drill).label;
  const lb = (drills[b] as Drill).label;
  if (la !== lb) return la < lb ? -1 : 1;
  return a - b;
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

export function solveHoleLayout(input: HoleLayoutInput): HoleLayoutResult {
  const target = requirePositive("targetEffectiveAreaM2", input.targetEffectiveAreaM2);
  const maxHoles = requireInteger("maxHoles", input.maxHoles, 1, MAX_HOLES_PER_CHANNEL);
  const window =
    input.valveWindowAreaM2 === undefined ? 0 : requirePositive("valveWindowAreaM2", input.valveWindowAreaM2);
  const channel = input.channelLengthM === undefined ? -1 : requirePositive("channelLengthM", input.channelLengthM);
  const web = input.minWebM === undefined ? DEFAULT_MIN_WEB_M : requireNonNegative("minWebM", input.minWebM);
  const limits = input.limits === undefined ? DEFAULT_RESTRICTION_DRILL_LIMITS : checkRestrictionDrillLimits(input.limits);
  const drills = input.drills;
  ensureCapacity(0, drills.length);
  const drillCount = rankDrills(drills, limits);
  const total = drillCount * maxHoles;
  const limit =
    input.limit === undefined
      ? total
      : Math.min(total, requireInteger("limit", input.limit, 0, Number.MAX_SAFE_INTEGER));
  const windowSquared = window * window;
  const effectiveOf = (holes: number) =>
    window === 0 ? holes : (holes * window) / Math.sqrt(holes * holes + windowSquared);

  if (total === 0) {
    return {
      candidates: [],
      reach: null,
      limitedBy: "no-drill",
      unattainable: true,
      message: `No drill in the list is of the plan's system (${limits.system}) and within the shop's smallest and largest restriction drill.`,
    };
  }

  ensureCapacity(total, drills.length);

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

  // drillRank runs from the largest allowed drill to the smallest.
  const largestDrill = drills[drillRank[0] as number] as Drill;
  const smallestDrill = drills[drillRank[drillCount - 1] as number] as Drill;
  const smallestM2 = effectiveOf(QUARTER_PI * smallestDrill.diameterM ** 2);
  const largestM2 = effectiveOf(maxHoles * QUARTER_PI * largestDrill.diameterM ** 2);
  const reach = { smallestM2, largestM2, smallestDrill, largestDrill };
  const tolerance = REACH_TOLERANCE_FRACTION * target;
  const holesWord = maxHoles === 1 ? "one hole" : `${maxHoles} holes`;
  if (window !== 0 && target >= window) {
    return {
      candidates: out,
      reach,
      limitedBy: "valve-window",
      unattainable: true,
      message: "The target is at or above what the valve's own flow window passes: no number of holes reaches it.",
    };
  }
  if (target > largestM2) {
    return {
      candidates: out,
      reach,
      limitedBy: "largest-layout",
      unattainable: target - largestM2 > tolerance,
      message: `The target is above what ${holesWord} of ${largestDrill.label} give, the largest drill the shop allows.`,
    };
  }
  if (target < smallestM2) {
    return {
      candidates: out,
      reach,
      limitedBy: "smallest-drill",
      unattainable: smallestM2 - target > tolerance,
      message: `The target is below what one ${smallestDrill.label} hole gives, the smallest drill the shop allows.`,
    };
  }
  return { candidates: out, reach, limitedBy: null, unattainable: false, message: null };

  function candidate(drill: Drill, count: number, fits: boolean): HoleLayoutCandidate {
    const holesAreaM2 = count * QUARTER_PI * drill.diameterM * drill.diameterM;
    const effectiveAreaM2 = effectiveOf(holesAreaM2);
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
