import { formatDateTime } from "@/lib/format/dates";
import { Tag } from "@/components/ui/sheet";
import type { TunerQueue as Queue } from "@/lib/work-queue/types";
import { QueueRow, QueueSection } from "./queue-section";

/** The tuner's day: what is held, what can go back to the customer, then the planning still to do. */
export function TunerQueue({ queue }: { queue: Queue }) {
  const at = (iso: string) => formatDateTime(iso, queue.timeZone);
  return (
    <>
      <QueueSection title="Held by a reading out of plan" count={queue.held.length} empty="No job in machining has a reading out of plan.">
        {queue.held.map((h) => (
          <QueueRow
            key={`${h.benchHref}-${h.operation}-${h.reading}`}
            href={h.benchHref}
            title={`${h.job.number} ${h.side} block, revision ${h.revision}: ${h.operation}`}
            detail={
              <>
                <span className="numeric">{h.reading}</span>; plan <span className="numeric">{h.planned}</span>
              </>
            }
            aside={at(h.recordedAt)}
          />
        ))}
      </QueueSection>
      <QueueSection title="Verified, to deliver" count={queue.toDeliver.length} empty="No verified job waits to go back to its customer.">
        {queue.toDeliver.map((j) => (
          <QueueRow key={j.id} href={j.href} title={`${j.number} for ${j.customer}`} detail={j.carburetor} aside={`verified ${at(j.updatedAt)}`} />
        ))}
      </QueueSection>
      <QueueSection title="Logs to analyse" count={queue.logs.length} empty="No log on a current revision waits for its corrections.">
        {queue.logs.map((l) => (
          <QueueRow key={l.id} href={l.href} title={`${l.jobNumber}: ${l.fileName}`} detail={`read against revision ${l.revision}`} aside={at(l.uploadedAt)} />
        ))}
      </QueueSection>
      <QueueSection
        title="Plans with warnings"
        count={queue.planWarnings.length}
        empty={`None of the ${queue.draftsChecked} newest drafts has a danger or warning in its plan.`}
      >
        {queue.planWarnings.map((p) => (
          <QueueRow
            key={p.job.id}
            href={p.job.href}
            title={`${p.job.number} for ${p.job.customer}`}
            detail={
              <span className="flex flex-col gap-1">
                {p.warnings.map((w, i) => (
                  <span key={i} className="flex items-start gap-2">
                    <Tag tone={w.level === "danger" ? "fault" : "plain"}>{w.level}</Tag>
                    {w.message}
                  </span>
                ))}
              </span>
            }
          />
        ))}
      </QueueSection>
      <QueueSection title="Drafts to finish" count={queue.drafts.length} empty="No drafts: start a new job from Jobs.">
        {queue.drafts.map((d) => (
          <QueueRow
            key={d.id}
            href={d.href}
            title={`${d.number} for ${d.customer}`}
            detail={d.problem ?? d.carburetor}
            aside={`changed ${at(d.updatedAt)}`}
          />
        ))}
      </QueueSection>
    </>
  );
}
