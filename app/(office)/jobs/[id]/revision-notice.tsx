import type { JobRecord } from "@/db/jobs";

/** What saving does to the approved plan, said before the tuner saves. */
export function RevisionNotice({ record }: { record: JobRecord }) {
  const current = record.revisions.find((r) => r.status === "current");
  if (!current) {
    return <p className="text-sm text-graphite">Nothing is approved yet: saving changes the working plan only.</p>;
  }
  return (
    <p role="note" className="rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-4 py-3 text-sm">
      <strong>Saving makes a new revision when approved; revision {current.number} stays as it is.</strong> The job goes back to draft
      {record.job.state === "draft" ? "" : ` (it is ${record.job.state} now)`} until the plan is approved again.
    </p>
  );
}
