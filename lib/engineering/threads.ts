// Screw threads: Unified inch (UNC and UNF, #0 to 1/2 in) and ISO metric (coarse and fine, M1.6 to M12);
// tap drills for a chosen thread engagement and clearance drills. The thread that plugs a drilled passage is
// chosen in passage-plug.ts.

import type { Drill } from "./types";
import { ALL_DRILLS, INCH_DRILLS, METRIC_DRILLS, fractionDrill, findDrill, metricDrill, nearestDrill } from "./drills";

import { M_PER_IN, M_PER_MM } from "./unit-factors";

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

export function isCoarse(t: Thread): boolean {
  return t.series === "UNC" || t.series === "coarse";
}

/** Smallest first; at one size coarse before fine, then the coarser pitch first. */
export function bySize(a: Thread, b: Thread): number {
  return a.majorM - b.majorM || Number(isCoarse(b)) - Number(isCoarse(a)) || b.pitchM - a.pitchM;
}

/** Every thread of both systems, smallest first, coarse before fine at one size. */
export const ALL_THREADS: readonly Thread[] = [...UNIFIED_THREADS, ...METRIC_THREADS].sort(bySize);

/** Two lengths closer than this (m) are the same size. */
export const SAME_M = 1e-9;

export const fmtIn = (m: number): string => `${(m / M_PER_IN).toFixed(4)} in`;

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

export function requireEngagement(pct: number): void {
  if (!Number.isFinite(pct) || pct <= 0 || pct > MAX_TAP_ENGAGEMENT_PCT + 1e-9) {
    throw new RangeError(
      `engagementPct: must be above 0 and at most ${fmtPctLimit(MAX_TAP_ENGAGEMENT_PCT)} (a drill at the thread's basic minor diameter), got ${pct}`,
    );
  }
}

/** The drills to choose from: the shop's when given, else the standard series of the thread's system (or both). */
export function drillPool(thread: Thread, drills: readonly Drill[] | undefined, allowOtherSystem: boolean): readonly Drill[] {
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
