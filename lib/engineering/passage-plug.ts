// Plugging a passage: drill it out to a tap drill, tap it, and seal it with a set screw.

import type { Drill } from "./types";
import {
  ALL_THREADS,
  bySize,
  drillPool,
  fmtIn,
  idealTapDrillM,
  isCoarse,
  requireEngagement,
  SAME_M,
  threadEngagementPct,
  type Thread,
} from "./threads";
import { M_PER_IN, M_PER_MM } from "./unit-factors";

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
