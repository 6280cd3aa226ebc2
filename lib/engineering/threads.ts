// Screw threads: Unified inch (UNC and UNF, #0 to 1/2 in) and ISO metric (coarse and fine, M1.6 to M12);
// tap drills for a chosen thread engagement, clearance drills, and the thread that plugs a drilled passage.

import type { Drill } from "./types";
import { ALL_DRILLS, INCH_DRILLS, METRIC_DRILLS, fractionDrill, findDrill, metricDrill, nearestDrill } from "./drills";

const M_PER_IN = 0.0254;
const M_PER_MM = 0.001;

export type ThreadSystem = "unified" | "metric";
export type ThreadSeries = "UNC" | "UNF" | "coarse" | "fine";

export interface Thread {
  /** "#4-40 UNC", "1/4-20 UNC", "M3x0.5", "M8x1". */
  label: string;
  system: ThreadSystem;
  series: ThreadSeries;
  /** Basic major diameter, m. */
  majorM: number;
  /** Pitch, m (1 / threads per inch for Unified threads). */
  pitchM: number;
}

// ASME B1.1, basic major diameters: numbered sizes #n = 0.060 + 0.013 n in; fractional sizes their nominal.
// Threads per inch, coarse (UNC) and fine (UNF), per ASME B1.1 (written from memory). #0 has no UNC size.
const UNIFIED_SIZES: readonly { size: string; majorIn: number; unc: number | null; unf: number }[] = [
  { size: "#0", majorIn: 0.06, unc: null, unf: 80 },
  { size: "#1", majorIn: 0.073, unc: 64, unf: 72 },
  { size: "#2", majorIn: 0.086, unc: 56, unf: 64 },
  { size: "#3", majorIn: 0.099, unc: 48, unf: 56 },
  { size: "#4", majorIn: 0.112, unc: 40, unf: 48 },
  { size: "#5", majorIn: 0.125, unc: 40, unf: 44 },
  { size: "#6", majorIn: 0.138, unc: 32, unf: 40 },
  { size: "#8", majorIn: 0.164, unc: 32, unf: 36 },
  { size: "#10", majorIn: 0.19, unc: 24, unf: 32 },
  { size: "#12", majorIn: 0.216, unc: 24, unf: 28 },
  { size: "1/4", majorIn: 0.25, unc: 20, unf: 28 },
  { size: "5/16", majorIn: 0.3125, unc: 18, unf: 24 },
  { size: "3/8", majorIn: 0.375, unc: 16, unf: 24 },
  { size: "7/16", majorIn: 0.4375, unc: 14, unf: 20 },
  { size: "1/2", majorIn: 0.5, unc: 13, unf: 20 },
];

// ISO 261 coarse and fine pitches for the first- and second-choice sizes M1.6-M12 (written from memory);
// basic dimensions per ISO 724.
const METRIC_SIZES: readonly { nominalMm: number; coarse: number; fine: readonly number[] }[] = [
  { nominalMm: 1.6, coarse: 0.35, fine: [0.2] },
  { nominalMm: 2, coarse: 0.4, fine: [0.25] },
  { nominalMm: 2.5, coarse: 0.45, fine: [0.35] },
  { nominalMm: 3, coarse: 0.5, fine: [0.35] },
  { nominalMm: 3.5, coarse: 0.6, fine: [0.35] },
  { nominalMm: 4, coarse: 0.7, fine: [0.5] },
  { nominalMm: 5, coarse: 0.8, fine: [0.5] },
  { nominalMm: 6, coarse: 1, fine: [0.75] },
  { nominalMm: 8, coarse: 1.25, fine: [1, 0.75] },
  { nominalMm: 10, coarse: 1.5, fine: [1.25, 1, 0.75] },
  { nominalMm: 12, coarse: 1.75, fine: [1.5, 1.25, 1] },
];

function unifiedThread(size: string, majorIn: number, tpi: number, series: "UNC" | "UNF"): Thread {
  return { label: `${size}-${tpi} ${series}`, system: "unified", series, majorM: majorIn * M_PER_IN, pitchM: M_PER_IN / tpi };
}

function metricThread(nominalMm: number, pitchMm: number, series: "coarse" | "fine"): Thread {
  return { label: `M${nominalMm}x${pitchMm}`, system: "metric", series, majorM: nominalMm * M_PER_MM, pitchM: pitchMm * M_PER_MM };
}

export const UNIFIED_THREADS: readonly Thread[] = UNIFIED_SIZES.flatMap(({ size, majorIn, unc, unf }) => [
  ...(unc === null ? [] : [unifiedThread(size, majorIn, unc, "UNC")]),
  unifiedThread(size, majorIn, unf, "UNF"),
]);

export const METRIC_THREADS: readonly Thread[] = METRIC_SIZES.flatMap(({ nominalMm, coarse, fine }) => [
  metricThread(nominalMm, coarse, "coarse"),
  ...fine.map((p) => metricThread(nominalMm, p, "fine")),
]);

function isCoarse(t: Thread): boolean {
  return t.series === "UNC" || t.series === "coarse";
}

/** Smallest first; at one size coarse before fine, then the coarser pitch first. */
function bySize(a: Thread, b: Thread): number {
  return a.majorM - b.majorM || Number(isCoarse(b)) - Number(isCoarse(a)) || b.pitchM - a.pitchM;
}

/** Every thread of both systems, smallest first, coarse before fine at one size. */
export const ALL_THREADS: readonly Thread[] = [...UNIFIED_THREADS, ...METRIC_THREADS].sort(bySize);

const SAME_M = 1e-9;

const fmtIn = (m: number): string => `${(m / M_PER_IN).toFixed(4)} in`;

/**
 * Reads a thread as a shop writes it: "4-40", "#4-40", "no. 4-40", "4-40 UNC", "1/4-20", '1/4"-20 UNC-2B',
 * "M3x0.5", "m3 x 0.5", "M3×0.5", "M3" (coarse), "M8x1". Undefined for anything not in the tables, including a
 * series that contradicts the pitch ("4-40 UNF").
 */
export function parseThread(label: string): Thread | undefined {
  const s = label.trim().toLowerCase().replace(/[×*]/g, "x").replace(/\s+/g, " ");

  const metric = /^m ?(\d+(?:\.\d+)?)(?: ?x ?(\d*\.?\d+))?(?: (coarse|fine))?$/.exec(s);
  if (metric?.[1] !== undefined) {
    const majorM = Number(metric[1]) * M_PER_MM;
    const sized = METRIC_THREADS.filter((t) => Math.abs(t.majorM - majorM) < SAME_M);
    const pitch = metric[2];
    const series = metric[3];
    const found =
      pitch !== undefined
        ? sized.find((t) => Math.abs(t.pitchM - Number(pitch) * M_PER_MM) < SAME_M)
        : sized.find((t) => t.series === (series ?? "coarse"));
    if (found === undefined || (series !== undefined && found.series !== series)) return undefined;
    return found;
  }

  const unified = /^(?:#|no\.? ?)?(\d+(?:\/\d+)?)(?: ?(?:"|in))? ?- ?(\d+)(?: ?(unc|unf))?(?: ?-? ?[123][ab])?$/.exec(s);
  if (unified?.[1] !== undefined && unified[2] !== undefined) {
    const size = unified[1].includes("/") ? unified[1] : `#${Number(unified[1])}`;
    const tpi = Number(unified[2]);
    const found = UNIFIED_THREADS.find((t) => t.label === `${size}-${tpi} ${t.series}`);
    const series = unified[3]?.toUpperCase();
    if (found === undefined || (series !== undefined && found.series !== series)) return undefined;
    return found;
  }

  return undefined;
}

/** 1.299038 P is 1.5 x the fundamental triangle height (0.866025 P): the depth the engagement formula counts. */
const ENGAGEMENT_DEPTH_PER_PITCH = 1.299038;
/** Basic thread depth of the internal thread, 1.082532 P (5/8 H): D1 = D - 1.082532 P (ASME B1.1, ISO 724). */
const BASIC_DEPTH_PER_PITCH = 1.082532;

/** Percent thread engagement a drill gives: (D - d) / (1.299038 P) x 100. */
export function threadEngagementPct(majorM: number, pitchM: number, drillM: number): number {
  return ((majorM - drillM) / (ENGAGEMENT_DEPTH_PER_PITCH * pitchM)) * 100;
}

/** Basic minor diameter of the internal thread, m: D - 1.082532 P (ASME B1.1; ISO 724 writes it D1). */
export function basicMinorDiameterM(thread: Thread): number {
  return thread.majorM - BASIC_DEPTH_PER_PITCH * thread.pitchM;
}

/**
 * The most engagement a tap drill can give: a drill at the basic minor diameter, 1.082532 / 1.299038 = 83.3 %.
 * A smaller drill leaves metal the tap must tear out below the thread's root; taps break there.
 */
export const MAX_TAP_ENGAGEMENT_PCT = (BASIC_DEPTH_PER_PITCH / ENGAGEMENT_DEPTH_PER_PITCH) * 100;

/** The drill diameter that gives exactly the engagement asked for. */
export function idealTapDrillM(thread: Thread, engagementPct: number): number {
  return thread.majorM - (engagementPct / 100) * ENGAGEMENT_DEPTH_PER_PITCH * thread.pitchM;
}

export interface TapDrillOptions {
  /** Target thread engagement, percent; default 75. */
  engagementPct?: number;
  /** Choose from these drills only (the shop's stock), of any series. */
  drills?: readonly Drill[];
  /** Without a drill list: also take drills of the other system (metric for inch threads and the reverse). */
  allowOtherSystem?: boolean;
}

export interface TapDrillResult {
  /** Drill diameter for exactly the target engagement, m. */
  idealM: number;
  drill: Drill;
  /** Engagement the chosen drill really gives, percent. */
  engagementPct: number;
}

const fmtPctLimit = (pct: number): string => `${pct.toFixed(1)} %`;

function requireEngagement(pct: number): void {
  if (!Number.isFinite(pct) || pct <= 0 || pct > MAX_TAP_ENGAGEMENT_PCT + 1e-9) {
    throw new RangeError(
      `engagementPct: must be above 0 and at most ${fmtPctLimit(MAX_TAP_ENGAGEMENT_PCT)} (a drill at the thread's basic minor diameter), got ${pct}`,
    );
  }
}

function drillPool(thread: Thread, drills: readonly Drill[] | undefined, allowOtherSystem: boolean): readonly Drill[] {
  if (drills !== undefined) return drills;
  if (allowOtherSystem) return ALL_DRILLS;
  return thread.system === "unified" ? INCH_DRILLS : METRIC_DRILLS;
}

/** True when a thread can be tapped in a hole of this drill: not under the basic minor diameter, under the major. */
function formsThread(thread: Thread, drillM: number): boolean {
  return drillM >= basicMinorDiameterM(thread) - SAME_M && drillM < thread.majorM;
}

/**
 * The tap drill for a thread: the drill nearest the diameter that gives the target engagement (which is also the
 * drill whose engagement is nearest the target, engagement being linear in the drill diameter), among drills
 * from the basic minor diameter up to the major diameter. Unified threads take inch drills and metric threads
 * metric drills, unless a drill list or allowOtherSystem says otherwise.
 */
export function tapDrill(thread: Thread, options: TapDrillOptions = {}): TapDrillResult {
  const { engagementPct = 75, drills, allowOtherSystem = false } = options;
  requireEngagement(engagementPct);
  const idealM = idealTapDrillM(thread, engagementPct);
  const pool = drillPool(thread, drills, allowOtherSystem).filter((d) => formsThread(thread, d.diameterM));
  const drill = pool.length === 0 ? undefined : nearestDrill(idealM, { drills: pool });
  if (drill === undefined) {
    throw new RangeError(
      `drills: none lies between the basic minor diameter (${fmtIn(basicMinorDiameterM(thread))}) and the major diameter of ${thread.label}`,
    );
  }
  return { idealM, drill, engagementPct: threadEngagementPct(thread.majorM, thread.pitchM, drill.diameterM) };
}

export type ClearanceFit = "close" | "free";

// Unified clearance drills, close and free fit, as printed in the usual shop tap-drill charts (from memory;
// ASME B18.2.8 defines clearance-hole classes but gives diameters, not drill sizes).
const UNIFIED_CLEARANCE: Readonly<Record<string, { close: string; free: string }>> = {
  "#0": { close: "#52", free: "#50" },
  "#1": { close: "#48", free: "#46" },
  "#2": { close: "#43", free: "#41" },
  "#3": { close: "#37", free: "#35" },
  "#4": { close: "#32", free: "#30" },
  "#5": { close: "#30", free: "#29" },
  "#6": { close: "#27", free: "#25" },
  "#8": { close: "#18", free: "#16" },
  "#10": { close: "#9", free: "#7" },
  "#12": { close: "#2", free: "#1" },
  "1/4": { close: "F", free: "H" },
  "5/16": { close: "P", free: "Q" },
  "3/8": { close: "W", free: "X" },
  "7/16": { close: "29/64", free: "15/32" },
  "1/2": { close: "33/64", free: "17/32" },
};

// ISO 273 clearance holes, fine series (close) and medium series (free), mm (from memory).
const METRIC_CLEARANCE_MM: Readonly<Record<string, { close: number; free: number }>> = {
  "1.6": { close: 1.7, free: 1.8 },
  "2": { close: 2.2, free: 2.4 },
  "2.5": { close: 2.7, free: 2.9 },
  "3": { close: 3.2, free: 3.4 },
  "3.5": { close: 3.7, free: 3.9 },
  "4": { close: 4.3, free: 4.5 },
  "5": { close: 5.3, free: 5.5 },
  "6": { close: 6.4, free: 6.6 },
  "8": { close: 8.4, free: 9 },
  "10": { close: 10.5, free: 11 },
  "12": { close: 13, free: 13.5 },
};

function drillByLabel(label: string): Drill {
  const found = findDrill(label);
  if (found !== undefined) return found;
  const frac = /^(\d+)\/(\d+)$/.exec(label);
  if (frac?.[1] !== undefined && frac[2] !== undefined) return fractionDrill(Number(frac[1]), Number(frac[2]));
  throw new Error(`clearance table: unknown drill ${label}`);
}

/**
 * The clearance drill for a screw of this thread: "close" (Unified close fit, ISO 273 fine series) or "free"
 * (Unified free fit, ISO 273 medium series). Sizes above the standard drill series (17/32 in, 13.5 mm) are
 * returned as drills of their own.
 */
export function clearanceDrill(thread: Thread, fit: ClearanceFit): Drill {
  if (thread.system === "unified") {
    const size = thread.label.split("-")[0] ?? "";
    const row = UNIFIED_CLEARANCE[size];
    if (row === undefined) throw new RangeError(`thread: no clearance drill for ${thread.label}`);
    return drillByLabel(row[fit]);
  }
  const row = METRIC_CLEARANCE_MM[String(Number((thread.majorM / M_PER_MM).toFixed(3)))];
  if (row === undefined) throw new RangeError(`thread: no clearance drill for ${thread.label}`);
  const mm = row[fit];
  return findDrill(`${mm} mm`) ?? metricDrill(mm);
}

// ---------------------------------------------------------------------------------------------------------
// Plugging a passage: drill it out to a tap drill, tap it, and seal it with a set screw.

/** Engagement band for a tapped plug: 60-80 % (common practice; above about 75 % strength hardly rises and taps break). */
export const PLUG_ENGAGEMENT_BAND = { minPct: 60, maxPct: 80 } as const;
/** Full-thread depth to aim for: 1.5 x the thread diameter (common practice for aluminium and zinc castings). */
export const PLUG_TAP_DEPTH_PER_DIAMETER = 1.5;
/** A plug tap's chamfer cuts no full thread over its first 3 to 5 pitches; we drill 3 pitches past the thread (common practice). */
export const PLUG_TAP_LEAD_PITCHES = 3;
/** Metal to leave between the thread crests and the outside or a neighbouring passage: 0.030 in. Our own conservative default, no published source. */
export const DEFAULT_MIN_WALL_M = 0.03 * M_PER_IN;

// Stocked socket set-screw lengths (from memory): inch per ASME B18.3 practice, metric per ISO 4026 preferred lengths.
const SET_SCREW_LENGTHS_IN: readonly [string, number][] = [
  ["1/16", 1 / 16], ["3/32", 3 / 32], ["1/8", 1 / 8], ["5/32", 5 / 32], ["3/16", 3 / 16], ["1/4", 1 / 4],
  ["5/16", 5 / 16], ["3/8", 3 / 8], ["7/16", 7 / 16], ["1/2", 1 / 2], ["5/8", 5 / 8], ["3/4", 3 / 4],
];
const SET_SCREW_LENGTHS_MM: readonly number[] = [2, 2.5, 3, 4, 5, 6, 8, 10, 12, 16, 20];

export interface SetScrew {
  /** "#4-40 UNC x 1/8 in", "M3x0.5 x 4 mm". */
  label: string;
  lengthM: number;
}

/** The longest stocked set screw of the thread not longer than maxLengthM, or undefined when even the shortest is too long. */
export function setScrewFor(thread: Thread, maxLengthM: number): SetScrew | undefined {
  const lengths =
    thread.system === "unified"
      ? SET_SCREW_LENGTHS_IN.map(([label, inches]) => ({ label: `${label} in`, lengthM: inches * M_PER_IN }))
      : SET_SCREW_LENGTHS_MM.map((mm) => ({ label: `${mm} mm`, lengthM: mm * M_PER_MM }));
  const fitting = lengths.filter((l) => l.lengthM <= maxLengthM + SAME_M);
  const longest = fitting.at(-1);
  return longest === undefined ? undefined : { label: `${thread.label} x ${longest.label}`, lengthM: longest.lengthM };
}

export interface PassagePlugInput {
  /** Measured diameter of the passage to seal, m. */
  passageDiameterM: number;
  /** Metal between the passage bore and the nearest outside surface or neighbouring passage, m. */
  wallThicknessM: number;
  /** Depth along the passage axis that may be drilled and tapped, from the surface, m. */
  depthAvailableM: number;
  /** Target engagement, percent; default 75. */
  engagementPct?: number;
  /** Threads the shop can tap; default every thread in the tables. */
  threads?: readonly Thread[];
  /** Drills the shop has; default the standard series of each thread's system. */
  drills?: readonly Drill[];
  /** Least metal to leave outside the thread crests, m; default 0.030 in. */
  minWallM?: number;
}

export interface PassagePlug {
  thread: Thread;
  /** A drill at least the passage diameter (it removes the old passage wall) giving 60-80 % engagement. */
  drill: Drill;
  /** The tap to use: "#4-40 UNC plug tap". */
  tapLabel: string;
  /** Engagement the drill gives, percent. */
  engagementPct: number;
  /** Metal left between the thread crests and the outside or the neighbouring passage, m (negative: breaks through). */
  remainingWallM: number;
  /** Full-thread depth, m. */
  tapDepthM: number;
  /** Tap depth plus the plug tap's lead, m. */
  drillDepthM: number;
  /** Stocked set screw that fits the thread depth, less a pitch; null when none fits. */
  setScrew: SetScrew | null;
  setScrewLengthM: number | null;
  warnings: string[];
}

/** What the shop would need to plug the passage: a drill size, a thread, or both (labels as written). */
export interface MissingTooling {
  drill?: string;
  thread?: string;
}

/** A plug, or the reason there is none and what the shop lacks. */
export type PassagePlugResult =
  | { ok: true; plug: PassagePlug }
  | { ok: false; code: "no_plug"; message: string; missing: MissingTooling };

function requireLength(value: number, field: string, allowZero: boolean): void {
  if (!Number.isFinite(value) || value < 0 || (!allowZero && value === 0)) {
    throw new RangeError(`${field}: must be ${allowZero ? "zero or more" : "above zero"}, got ${value}`);
  }
}

const fmtPct = (pct: number): string => `${pct.toFixed(0)} %`;
const BAND_TEXT = `${PLUG_ENGAGEMENT_BAND.minPct}-${PLUG_ENGAGEMENT_BAND.maxPct} %`;

interface Candidate {
  thread: Thread;
  drill: Drill;
  engagementPct: number;
}

/** Drill diameters that clean the passage up and give an engagement inside the band: [low, high], m, or undefined. */
function plugDrillWindow(thread: Thread, passageM: number): { lowM: number; highM: number } | undefined {
  const lowM = Math.max(passageM, idealTapDrillM(thread, PLUG_ENGAGEMENT_BAND.maxPct));
  const highM = idealTapDrillM(thread, PLUG_ENGAGEMENT_BAND.minPct);
  return lowM <= highM + SAME_M ? { lowM, highM } : undefined;
}

/** Among the drills inside the thread's window, the one nearest the target engagement. */
function plugDrill(thread: Thread, pool: readonly Drill[], passageM: number, targetPct: number): Candidate | undefined {
  const window = plugDrillWindow(thread, passageM);
  if (window === undefined) return undefined;
  let best: Candidate | undefined;
  for (const drill of pool) {
    if (drill.diameterM < window.lowM - SAME_M || drill.diameterM > window.highM + SAME_M) continue;
    const engagementPct = threadEngagementPct(thread.majorM, thread.pitchM, drill.diameterM);
    if (best === undefined || Math.abs(engagementPct - targetPct) < Math.abs(best.engagementPct - targetPct)) {
      best = { thread, drill, engagementPct };
    }
  }
  return best;
}

/** Coarse threads first, smallest first within each series (a coarse thread holds better in cast aluminium and zinc). */
function plugOrder(threads: readonly Thread[]): Thread[] {
  const sorted = [...threads].sort(bySize);
  return [...sorted.filter(isCoarse), ...sorted.filter((t) => !isCoarse(t))];
}

function firstPlug(threads: readonly Thread[], poolFor: (t: Thread) => readonly Drill[], passageM: number, targetPct: number): Candidate | undefined {
  for (const t of plugOrder(threads)) {
    const found = plugDrill(t, poolFor(t), passageM, targetPct);
    if (found) return found;
  }
  return undefined;
}

const standardPool = (t: Thread): readonly Drill[] => drillPool(t, undefined, false);

/** Says which drill or thread the shop lacks, with a pairing from the standard tables that would plug the passage. */
function noPlug(
  passageM: number,
  threads: readonly Thread[],
  stock: readonly Drill[] | undefined,
  targetPct: number,
): Extract<PassagePlugResult, { ok: false }> {
  const passage = `a ${fmtIn(passageM)} passage`;
  const poolFor = (t: Thread) => drillPool(t, stock, false);
  const refuse = (message: string, missing: MissingTooling) => ({ ok: false as const, code: "no_plug" as const, message, missing });
  const sentence = (c: Candidate) => `${c.thread.label} with a ${c.drill.label} (${fmtIn(c.drill.diameterM)}, ${fmtPct(c.engagementPct)}) would`;

  // The offered threads could do it with a drill the shop does not have.
  const withStandardDrill = firstPlug(threads, standardPool, passageM, targetPct);
  if (withStandardDrill !== undefined) {
    const window = plugDrillWindow(withStandardDrill.thread, passageM)!;
    const stocked = [...new Set(threads.flatMap((t) => poolFor(t)))];
    const largest = stocked.reduce<Drill | undefined>((a, d) => (a === undefined || d.diameterM > a.diameterM ? d : a), undefined);
    const lead =
      largest !== undefined && largest.diameterM < passageM - SAME_M
        ? `No stocked drill cleans up ${passage} (the largest is ${largest.label}, ${fmtIn(largest.diameterM)})`
        : `No stocked drill cleans up ${passage} and leaves ${BAND_TEXT} engagement for any offered thread ` +
          `(${withStandardDrill.thread.label} needs one between ${(window.lowM / M_PER_IN).toFixed(4)} and ${fmtIn(window.highM)})`;
    return refuse(`${lead}; ${sentence(withStandardDrill)}.`, { drill: withStandardDrill.drill.label });
  }

  // No offered thread can: the window of every one is empty. Look for a thread of the same systems.
  const systems = new Set(threads.map((t) => t.system));
  const others = ALL_THREADS.filter((t) => systems.has(t.system) && !threads.includes(t));
  const largestOffered = [...threads].sort(bySize).at(-1)!;
  const lead =
    `No offered thread leaves ${BAND_TEXT} engagement with a drill that cleans up ${passage} ` +
    `(${largestOffered.label} needs a drill of ${fmtIn(idealTapDrillM(largestOffered, PLUG_ENGAGEMENT_BAND.minPct))} or less)`;
  const withStock = stock === undefined ? undefined : firstPlug(others, poolFor, passageM, targetPct);
  if (withStock !== undefined) return refuse(`${lead}; ${sentence(withStock)}.`, { thread: withStock.thread.label });
  const withBoth = firstPlug(others, standardPool, passageM, targetPct);
  if (withBoth !== undefined) {
    if (stock === undefined) return refuse(`${lead}; ${sentence(withBoth)}.`, { thread: withBoth.thread.label });
    // No stocked drill suits any other thread either: both are missing.
    return refuse(`${lead}; ${sentence(withBoth)}, and the ${withBoth.drill.label} is not stocked either.`, {
      thread: withBoth.thread.label,
      drill: withBoth.drill.label,
    });
  }
  return refuse(`${lead}, and no thread in the tables (up to 1/2 in and M12) does: the passage is too large for a set-screw plug.`, {});
}

/**
 * The thread that plugs a passage, or a refusal. The drill must clean the passage up (be at least the passage
 * diameter, so no old wall is left) and give an engagement inside the 60-80 % band, which also keeps it above
 * the thread's basic minor diameter and under its major diameter, so a full thread forms. Threads are tried
 * smallest first, coarse series before fine ones at every size (a coarse thread holds better in cast aluminium
 * and zinc: common practice), so a fine thread is chosen only when no coarse one will do; among its drills the
 * one nearest the target engagement. When no pairing of an offered thread and a stocked drill qualifies, the
 * answer names what the shop lacks and a pairing from the standard tables that would do.
 *
 * Then: tap depth = 1.5 x thread diameter (less if the depth runs out), drill depth = tap depth + 3 pitches,
 * set screw = the longest stocked length not over the tap depth less one pitch, remaining wall = wall thickness
 * less the growth of the hole's radius to the thread crests, (major - passage) / 2.
 */
export function passagePlug(input: PassagePlugInput): PassagePlugResult {
  const { passageDiameterM, wallThicknessM, depthAvailableM, engagementPct = 75, minWallM = DEFAULT_MIN_WALL_M } = input;
  requireLength(passageDiameterM, "passageDiameterM", false);
  requireLength(wallThicknessM, "wallThicknessM", true);
  requireLength(depthAvailableM, "depthAvailableM", false);
  requireLength(minWallM, "minWallM", true);
  requireEngagement(engagementPct);
  const threads = input.threads ?? ALL_THREADS;
  if (threads.length === 0) throw new RangeError("threads: the list is empty");
  if (input.drills !== undefined && input.drills.length === 0) throw new RangeError("drills: the list is empty");

  const chosen = firstPlug(threads, (t) => drillPool(t, input.drills, false), passageDiameterM, engagementPct);
  if (chosen === undefined) return noPlug(passageDiameterM, threads, input.drills, engagementPct);

  const { thread, drill } = chosen;
  const warnings: string[] = [];
  const remainingWallM = wallThicknessM - (thread.majorM - passageDiameterM) / 2;
  if (remainingWallM < minWallM) {
    warnings.push(
      `The thread leaves ${fmtIn(Math.max(remainingWallM, 0))} of wall${remainingWallM < 0 ? " (it breaks through)" : ""}; ` +
        `at least ${fmtIn(minWallM)} is wanted.`,
    );
  }

  const leadM = PLUG_TAP_LEAD_PITCHES * thread.pitchM;
  const wantedTapDepthM = PLUG_TAP_DEPTH_PER_DIAMETER * thread.majorM;
  const tapDepthM = Math.max(0, Math.min(wantedTapDepthM, depthAvailableM - leadM));
  const drillDepthM = tapDepthM + leadM;
  if (tapDepthM < wantedTapDepthM) {
    warnings.push(
      `Only ${fmtIn(tapDepthM)} of full thread fits (${fmtIn(depthAvailableM)} available, less ${PLUG_TAP_LEAD_PITCHES} pitches of tap lead); ` +
        `about ${PLUG_TAP_DEPTH_PER_DIAMETER} x diameter, ${fmtIn(wantedTapDepthM)}, is wanted.`,
    );
  }

  const setScrew = setScrewFor(thread, tapDepthM - thread.pitchM) ?? null;
  if (setScrew === null) warnings.push(`No stocked set screw of ${thread.label} is short enough for the thread depth.`);

  return {
    ok: true,
    plug: {
      thread,
      drill,
      tapLabel: `${thread.label} plug tap`,
      engagementPct: chosen.engagementPct,
      remainingWallM,
      tapDepthM,
      drillDepthM,
      setScrew,
      setScrewLengthM: setScrew?.lengthM ?? null,
      warnings,
    },
  };
}
