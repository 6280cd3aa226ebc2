// What a printed traveler shows: one metering block in one approved revision. Plain data (SI numbers, ISO
// dates, text), so that the document can be rendered from the database or from a plan built in memory.

import type { CautionTopic, PlannedMeasurement } from "@/lib/engineering/conversion-plan";

export const PAPER_SIZES = ["letter", "a4"] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];

/** One figure the bench works to: "Drill" "#43" "0.0890 in · 2.261 mm". */
export interface TravelerCallout {
  label: string;
  value: string;
  detail?: string | undefined;
}

/** One pass of a clearance grind, with its clay check. */
export interface TravelerGrindPass {
  pass: number;
  cumulativeDepthM: number;
  clayCheck: boolean;
}

export interface TravelerOperation {
  number: number;
  kind: string;
  title: string;
  instructions: string;
  callouts: TravelerCallout[];
  /** Passes of a clearance grind (empty for other operations). */
  grindPasses: TravelerGrindPass[];
  measurements: PlannedMeasurement[];
  caution: CautionTopic | null;
}

export interface TravelerData {
  job: {
    number: string;
    customer: string;
    carburetor: string;
    displacementM3: number;
    /** Fuel as the shop names it: "Gasoline", "E85", "Methanol". */
    fuel: string;
    /** Gauge pressure, Pa. */
    peakBoostPa: number;
  };
  block: {
    id: string;
    side: "primary" | "secondary";
    mainJetDiameterM: number;
    mainJetCount: number;
  };
  revision: {
    number: number;
    status: "current" | "superseded";
    approvedAt: string;
    approvedBy: string;
    releasedAt: string | null;
    releasedBy: string | null;
    tuner: string;
  };
  operations: TravelerOperation[];
  /**
   * What the plan says about itself that the bench should know: this block's warnings and the whole plan's
   * serious ones, most serious first; and whether the approver acknowledged danger warnings.
   */
  planNotes: { level: "notice" | "caution" | "warning" | "danger"; message: string }[];
  acknowledgedDangers: number;
  /** Changes accepted from air-fuel logs into this revision, as the machinist reads them (this block's first). */
  changes: { fromRevision: number; lines: string[] } | null;
  /** Absolute URL the QR code opens: the bench page of this block in this revision. */
  benchUrl: string;
}
