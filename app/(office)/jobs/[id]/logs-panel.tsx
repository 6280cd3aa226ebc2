import "server-only";
import Link from "next/link";
import type { TuningLogSummary } from "@/db/tuning-logs";
import { ButtonLink } from "@/components/ui/button";
import { Sheet, Tag } from "@/components/ui/sheet";
import { formatDateTime } from "@/lib/format/dates";

/**
 * The job's history from the dyno: per revision the engine ran on, the logs read and what each carried into
 * the next revision, oldest revision first.
 */
export function LogsPanel({ jobId, logs, canRead, timeZone }: { jobId: string; logs: TuningLogSummary[]; canRead: boolean; timeZone: string }) {
  const revisions = [...new Set(logs.map((l) => l.revisionNumber))].sort((a, b) => a - b);
  return (
    <Sheet
      title="Air-fuel logs"
      className="self-start"
      actions={
        canRead ? (
          <ButtonLink href={`/jobs/${jobId}/logs/new`} variant="secondary">
            Read an air-fuel log
          </ButtonLink>
        ) : undefined
      }
    >
      {logs.length === 0 ? (
        <p className="text-sm text-pencil">
          No logs yet. Once the blocks are on the engine, read the wideband log here: the stages are corrected from it into the next revision.
        </p>
      ) : (
        <ol className="flex flex-col gap-3 text-sm" aria-label="Logs by revision">
          {revisions.map((revision) => (
            <li key={revision}>
              <p className="font-semibold">Revision {revision} on the engine</p>
              <ul className="mt-1 flex flex-col gap-2 border-l-2 border-rule pl-3">
                {logs
                  .filter((l) => l.revisionNumber === revision)
                  .reverse()
                  .map((l) => (
                    <li key={l.id} data-testid="log-entry">
                      <Link href={`/jobs/${jobId}/logs/${l.id}`} className="font-semibold text-accent underline">
                        {l.fileName}
                      </Link>{" "}
                      <span className="numeric text-xs text-graphite">
                        {formatDateTime(l.uploadedAt, timeZone)} · {l.uploadedBy} · {l.usedRows} of {l.totalRows} rows used
                      </span>
                      {l.acceptedAt && l.nextRevisionNumber ? (
                        <div className="mt-1">
                          <Tag tone="accent">into revision {l.nextRevisionNumber}</Tag>
                          <ul className="mt-1 list-disc pl-5">
                            {(l.acceptedChanges ?? []).map((c) => (
                              <li key={c.stageId} className="numeric">
                                {c.change}
                              </li>
                            ))}
                          </ul>
                        </div>
                      ) : (
                        <div className="mt-1">
                          <Tag tone="muted">not accepted</Tag>
                        </div>
                      )}
                    </li>
                  ))}
              </ul>
            </li>
          ))}
        </ol>
      )}
    </Sheet>
  );
}
