import type { ReactNode } from "react";

/** A calculator's answer as label / value lines, values right-aligned in the monospace face. */
export function Readings({ children, label }: { children: ReactNode; label: string }) {
  return (
    <dl aria-label={label} className="grid grid-cols-[minmax(10rem,auto)_1fr] text-sm">
      {children}
    </dl>
  );
}

export function Reading({ label, children, strong = false, testId }: { label: ReactNode; children: ReactNode; strong?: boolean; testId?: string }) {
  return (
    <>
      <dt className="border-b border-rule py-1.5 pr-4 text-graphite">{label}</dt>
      <dd data-testid={testId} className={`numeric border-b border-rule py-1.5 text-right ${strong ? "text-base font-bold text-ink" : ""}`}>
        {children}
      </dd>
    </>
  );
}

/** Plain-language warnings that came with a result. */
export function ResultWarnings({ warnings }: { warnings: string[] }) {
  if (warnings.length === 0) return null;
  return (
    <ul role="alert" className="flex flex-col gap-1 rounded-[var(--radius-sheet)] border border-fault bg-fault-soft px-3 py-2 text-sm text-fault">
      {warnings.map((warning) => (
        <li key={warning}>{warning}</li>
      ))}
    </ul>
  );
}

/** The box a result sits in, titled with what it answers. */
export function ResultPanel({ title, children, testId }: { title: ReactNode; children: ReactNode; testId?: string }) {
  return (
    <section
      data-testid={testId}
      aria-live="polite"
      className="flex flex-col gap-3 rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-4 py-3"
    >
      <h3 className="text-sm font-semibold uppercase tracking-wider text-graphite">{title}</h3>
      {children}
    </section>
  );
}

/** What the result panel says before the first computation. */
export function ResultPending({ children }: { children: ReactNode }) {
  return <p className="rounded-[var(--radius-sheet)] border border-dashed border-rule-strong px-4 py-6 text-center text-sm text-pencil">{children}</p>;
}
