/** Within or outside the plan, announced as the machinist types. */
export function Verdict({ passed, testId, children }: { passed: boolean; testId?: string; children?: React.ReactNode }) {
  return (
    <p
      data-testid={testId}
      aria-live="polite"
      className={`flex items-center gap-2 rounded-[var(--radius-sheet)] border-2 px-3 py-1.5 text-base font-bold ${
        passed ? "border-accent bg-accent-soft text-accent-strong" : "border-fault bg-fault-soft text-fault"
      }`}
    >
      <span aria-hidden>{passed ? "✓" : "✗"}</span>
      <span>
        {passed ? "Within plan" : "Outside plan"}
        {children}
      </span>
    </p>
  );
}

/** An error under its box; `about` names the reading, so the message reads on its own ("Hole 2 by pin gauge: …"). */
export function FieldError({ id, errors, about }: { id?: string; errors?: string[]; about?: string }) {
  if (!errors?.length) return null;
  const text = errors.join(" ");
  return (
    <p id={id} role="alert" className="text-base font-semibold text-fault">
      {about && !text.toLowerCase().includes(about.toLowerCase()) ? `${about}: ${text.charAt(0).toLowerCase()}${text.slice(1)}` : text}
    </p>
  );
}
