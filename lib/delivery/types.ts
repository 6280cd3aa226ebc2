// What the customer's conversion record shows: plain text and numbers already in the shop's units, so the
// document renders without a database and reads the same in the mail and in the office.

export interface RecordValve {
  /** "Vacuum power valve" or "Boost-referenced power valve". */
  valve: string;
  /** Where it opens: "below 6.5 inHg vacuum", "at 3.0 psi boost". */
  opens: string;
  /** What its enrichment was planned to do: "AFR 14.0 to 12.2, full throttle". */
  target: string;
  /** The opening pressure as set and measured at the bench (boost valves), or null. */
  measured: string | null;
}

export interface RecordRestriction {
  title: string;
  /** As drilled: "2 × #52 (0.0635 in)". */
  drilled: string;
  /** Each hole as measured with pin gauges (or "not recorded"). */
  holes: { label: string; value: string; withinPlan: boolean | null }[];
}

export interface RecordBlock {
  side: "primary" | "secondary";
  valves: RecordValve[];
  restrictions: RecordRestriction[];
}

export interface ConversionRecordData {
  shop: { name: string; contact: string };
  job: { number: string; customer: string; carburetor: string; fuel: string; displacement: string; peakBoost: string; revision: number };
  /** The mixture the plan holds to, in the tuner's terms. */
  mixture: { label: string; value: string }[];
  delivery: { handedTo: string; handedOverBy: string; deliveredAt: string } | null;
  blocks: RecordBlock[];
}
