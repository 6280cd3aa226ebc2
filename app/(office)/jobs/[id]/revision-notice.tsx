import type { JobRecord } from "@/db/jobs";

/** What saving does to the approved plan, said before the tuner saves. */
export function RevisionNotice({ record, formId }: { record: JobRecord; formId: string }) {
  const current = record.revisions.find((r) => r.status === "current");
  if (!current) {
    return <p className="text-sm text-graphite">Nothing is approved yet: saving changes the working plan only.</p>;
  }
  return (
    <p role="note" className="rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-4 py-3 text-sm">
      <strong>Saving makes a new revision when approved; revision {current.number} stays as it is.</strong> The job goes back to draft
      {record.job.state === "draft" ? "" : ` (it is ${record.job.state} now)`} until the plan is approved again.
      {record.job.state === "machining" ? (
        // Outside the form on the page, inside it by its form attribute: sent with the form's fields.
        <label className="mt-2 flex min-h-11 items-start gap-2 font-semibold text-fault">
          <input type="checkbox" name="confirmHold" form={formId} className="mt-0.5 size-5" />
          <span>The bench is machining revision {current.number}: put the job on hold while I revise it. The bench stops signing and shows the revision on hold until the next revision is approved.</span>
        </label>
      ) : null}
      {record.job.state === "held" ? <span className="mt-2 block font-semibold">The job is on hold at the bench until the revised plan is approved.</span> : null}
    </p>
  );
}
