import { formatDateTime } from "@/lib/format/dates";
import type { BenchItem, MachinistQueue as Queue } from "@/lib/work-queue/types";
import { QueueRow, QueueSection } from "./queue-section";

function blockTitle(b: BenchItem): string {
  return `${b.jobNumber} ${b.side} block, revision ${b.revision}`;
}

/** The bench's day: blocks under way first, then released blocks not started, then what was signed lately. */
export function MachinistQueue({ queue }: { queue: Queue }) {
  return (
    <>
      <QueueSection title="In progress" count={queue.inProgress.length} empty="No block is part-way through.">
        {queue.inProgress.map((b) => (
          <QueueRow
            key={b.href}
            href={b.href}
            title={blockTitle(b)}
            detail={`${b.customer}, ${b.carburetor}`}
            aside={<span className="numeric">{`${b.operationsLeft} of ${b.operations} operations left`}</span>}
          />
        ))}
      </QueueSection>
      <QueueSection title="Released, not started" count={queue.notStarted.length} empty="No released block waits for the bench.">
        {queue.notStarted.map((b) => (
          <QueueRow
            key={b.href}
            href={b.href}
            title={blockTitle(b)}
            detail={`${b.customer}, ${b.carburetor}`}
            aside={<span className="numeric">{`${b.operations} operations`}</span>}
          />
        ))}
      </QueueSection>
      <QueueSection title="Signed lately" count={queue.recent.length} empty="You have not signed any work yet.">
        {queue.recent.map((s) => (
          <QueueRow
            key={s.operationId}
            href={s.href}
            title={`${s.jobNumber} ${s.side} block: ${s.operation}`}
            detail={`revision ${s.revision}`}
            aside={formatDateTime(s.signedAt, queue.timeZone)}
          />
        ))}
      </QueueSection>
    </>
  );
}
