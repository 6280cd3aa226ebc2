import type { PlanWarning } from "@/lib/engineering/plan-warnings";
import { Tag } from "@/components/ui/sheet";

const GRADE_TONE = { danger: "fault", warning: "fault", caution: "plain", notice: "muted" } as const;

/** One warning with its grade in front. */
export function PlanWarningItem({ warning }: { warning: PlanWarning }) {
  return (
    <li className="flex items-baseline gap-2" data-level={warning.level} data-code={warning.code}>
      <Tag tone={GRADE_TONE[warning.level]}>{warning.level}</Tag>
      <span>{warning.message}</span>
    </li>
  );
}

/** Everything the plan says about itself for the whole carburetor, most serious first, near the top of the plan. */
export function PlanWarnings({ warnings }: { warnings: readonly PlanWarning[] }) {
  if (warnings.length === 0) {
    return <p className="text-sm text-graphite">No warnings: every stage has a layout that fits, and the predicted mixture holds the target across the range.</p>;
  }
  const serious = warnings.some((w) => w.level === "danger" || w.level === "warning");
  return (
    <section
      aria-label="Plan warnings"
      className={`rounded-[var(--radius-sheet)] border-2 px-4 py-3 text-sm ${serious ? "border-fault bg-fault-soft text-fault" : "border-rule-strong bg-white text-ink"}`}
    >
      <h3 className="mb-2 font-semibold">
        {warnings.length} warning{warnings.length > 1 ? "s" : ""} in this plan
        {warnings.some((w) => w.level === "danger") ? " · approving it needs an explicit acknowledgement" : ""}
      </h3>
      <ul className="flex flex-col gap-1.5">
        {warnings.map((w, i) => (
          <PlanWarningItem key={`${w.code}-${i}`} warning={w} />
        ))}
      </ul>
    </section>
  );
}
