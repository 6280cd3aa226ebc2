import { drillDto, lengthPair, tidy, type DrillDto, type LengthPair } from "@/lib/format/quantity-pairs";
import { ALL_THREADS, clearanceDrill, tapDrill, type Thread, type ThreadSystem } from "@/lib/engineering/threads";
import { M_PER_IN } from "@/lib/engineering/unit-factors";

/** One line of the tap-drill chart: a thread, its 75 % tap drill and its clearance drills. */
export interface TapDrillRow {
  label: string;
  system: ThreadSystem;
  series: Thread["series"];
  major: LengthPair;
  pitch: LengthPair;
  /** Threads per inch (Unified threads), or null. */
  tpi: number | null;
  tapDrill: DrillDto;
  /** Engagement the tap drill really gives, percent. */
  engagementPct: number;
  closeClearance: DrillDto;
  freeClearance: DrillDto;
}

/** The chart's target engagement: 75 %, the figure handbook tap-drill tables are printed for. */
export const CHART_ENGAGEMENT_PCT = 75;

function row(thread: Thread): TapDrillRow {
  const tap = tapDrill(thread, { engagementPct: CHART_ENGAGEMENT_PCT });
  return {
    label: thread.label,
    system: thread.system,
    series: thread.series,
    major: lengthPair(thread.majorM),
    pitch: lengthPair(thread.pitchM),
    tpi: thread.system === "unified" ? Math.round(M_PER_IN / thread.pitchM) : null,
    tapDrill: drillDto(tap.drill),
    engagementPct: tidy(tap.engagementPct, 2),
    closeClearance: drillDto(clearanceDrill(thread, "close")),
    freeClearance: drillDto(clearanceDrill(thread, "free")),
  };
}

export const TAP_DRILL_ROWS: readonly TapDrillRow[] = ALL_THREADS.map(row);

function threadKey(text: string): string {
  return text.toLowerCase().replace(/[#\s"]|no\.?/g, "").replace(/[×*]/g, "x");
}

/** Rows whose thread label contains the text typed ("4-40", "#10-32", "1/4", "M3", "m8x1"). */
export function searchTapDrillRows(text: string, system: ThreadSystem | undefined): TapDrillRow[] {
  const key = threadKey(text);
  return TAP_DRILL_ROWS.filter(
    (r) => (system === undefined || r.system === system) && (key === "" || threadKey(r.label).includes(key)),
  );
}
