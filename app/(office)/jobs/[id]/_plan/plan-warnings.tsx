/** Everything the solver flagged for the whole carburetor, in one list near the top of the plan. */
export function PlanWarnings({ warnings }: { warnings: string[] }) {
  if (warnings.length === 0) {
    return <p className="text-sm text-graphite">No warnings: every stage has a layout that fits, and the mixture holds across the boost range.</p>;
  }
  return (
    <section aria-label="Plan warnings" className="rounded-[var(--radius-sheet)] border-2 border-fault bg-fault-soft px-4 py-3 text-sm text-fault">
      <h3 className="mb-1 font-semibold">
        {warnings.length} warning{warnings.length > 1 ? "s" : ""} in this plan
      </h3>
      <ul className="list-disc pl-5">
        {warnings.map((w) => (
          <li key={w}>{w}</li>
        ))}
      </ul>
    </section>
  );
}
