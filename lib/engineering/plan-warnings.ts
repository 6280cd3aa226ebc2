// What a plan says about itself, typed and graded so that screens, the API, the traveler and the approval
// step treat it the same way. The grades borrow the ANSI Z535 signal words' order of seriousness:
//   danger   the engine may be damaged if the plan is built as printed (lean beyond 10 % under boost);
//   warning  the plan cannot be built as printed, or a part of it will not work (no plug, holes that do not fit);
//   caution  a figure is outside the accepted band and the tuner should look (a stage misses its target);
//   notice   worth knowing, nothing to fix (rich zones, primary and secondary out of the usual order).
// The 10 % lean limit is a shop rule of thumb for boosted gasoline engines (common practice, no published source).

export type PlanWarningLevel = "notice" | "caution" | "warning" | "danger";

export type PlanWarningCode =
  | "lean_under_boost"
  | "lean_under_vacuum"
  | "rich_zone"
  | "stage_off_target"
  | "stage_before_differs"
  | "layout_misses_target"
  | "layout_not_offered"
  | "target_unattainable"
  | "holes_do_not_fit"
  | "valve_limited"
  | "no_plug"
  | "plug_note"
  | "grind_refused"
  | "tube_does_not_fit"
  | "secondary_first"
  /** A warning kept as a plain sentence by a revision approved before warnings were graded. */
  | "plan_note";

export interface PlanWarning {
  code: PlanWarningCode;
  level: PlanWarningLevel;
  message: string;
  /** The block or stage the warning is about, when it is about one. */
  blockId?: string | undefined;
  stageId?: string | undefined;
}

/** Leaner than the target by more than this fraction (lambda / target - 1) under boost is a danger. */
export const DANGEROUS_LEAN_FRACTION = 0.1;

const ORDER: Readonly<Record<PlanWarningLevel, number>> = { danger: 0, warning: 1, caution: 2, notice: 3 };

/** Most serious first; the order within a grade is kept. */
export function byGravity(warnings: readonly PlanWarning[]): PlanWarning[] {
  return warnings
    .map((w, i) => ({ w, i }))
    .sort((a, b) => ORDER[a.w.level] - ORDER[b.w.level] || a.i - b.i)
    .map(({ w }) => w);
}

/** The warnings an approver must acknowledge explicitly. */
export function dangerWarnings(warnings: readonly PlanWarning[]): PlanWarning[] {
  return warnings.filter((w) => w.level === "danger");
}
