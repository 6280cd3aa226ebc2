import { formatDate, formatDateTime } from "@/lib/format/dates";
import { Sheet } from "@/components/ui/sheet";
import type { AdminQueue as Queue } from "@/lib/work-queue/types";
import { QueueRow, QueueSection } from "./queue-section";

/** The shop's week: where jobs stand, what has waited longest, and who changed people or the rack. */
export function AdminQueue({ queue }: { queue: Queue }) {
  const at = (iso: string) => formatDateTime(iso, queue.timeZone);
  return (
    <>
      <Sheet title={`Jobs changed since ${formatDate(queue.since, queue.timeZone)}, by state`}>
        <dl className="grid grid-cols-3 gap-3 sm:grid-cols-6">
          {queue.byState.map((s) => (
            <div key={s.state} className="rounded-[var(--radius-sheet)] border border-rule px-3 py-2">
              <dt className="text-xs font-semibold uppercase tracking-wider text-graphite">{s.label}</dt>
              <dd className="numeric text-2xl font-bold">{s.jobs}</dd>
            </div>
          ))}
        </dl>
      </Sheet>
      <QueueSection title="Waiting longest" count={queue.longestWaiting.length} empty="No open jobs.">
        {queue.longestWaiting.map((j) => (
          <QueueRow
            key={j.id}
            href={j.href}
            title={`${j.number} for ${j.customer}`}
            detail={`${j.state}, held by ${j.tuner}`}
            aside={`since ${at(j.updatedAt)}`}
          />
        ))}
      </QueueSection>
      <QueueSection title="People and drill rack changes" count={queue.changes.length} empty="No changes to users or the drill rack yet.">
        {queue.changes.map((c) => (
          <li key={c.id} className="flex min-h-11 flex-wrap items-center justify-between gap-x-4 py-2 text-sm">
            <span>
              {c.what}
              {c.actor ? <span className="text-graphite">, by {c.actor}</span> : null}
            </span>
            <span className="text-pencil">{at(c.at)}</span>
          </li>
        ))}
      </QueueSection>
    </>
  );
}
