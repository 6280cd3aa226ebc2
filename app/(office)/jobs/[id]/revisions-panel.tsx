import "server-only";
import Link from "next/link";
import type { JobRecord } from "@/db/jobs";
import { Sheet, Tag } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { formatDateTime } from "@/lib/format/dates";

/** Every approved revision, newest first; each opens its frozen snapshot. */
export function RevisionsPanel({ jobId, revisions, timeZone }: { jobId: string; revisions: JobRecord["revisions"]; timeZone: string }) {
  return (
    <Sheet title="Revisions" className="self-start">
      {revisions.length === 0 ? (
        <p className="text-sm text-pencil">Nothing approved yet. Approving the plan keeps it as revision 1.</p>
      ) : (
        <Table aria-label="Revisions">
          <thead>
            <tr>
              <Th>Rev.</Th>
              <Th>Status</Th>
              <Th>Approved</Th>
              <Th>Released</Th>
            </tr>
          </thead>
          <tbody>
            {revisions.map((r) => (
              <tr key={r.id} data-testid={`revision-${r.number}`} className={r.status === "superseded" ? "text-pencil" : ""}>
                <Td className="numeric">
                  <Link href={`/jobs/${jobId}/revisions/${r.number}`} className="font-semibold text-accent underline">
                    Rev. {r.number}
                  </Link>
                </Td>
                <Td>{r.status === "current" ? <Tag tone="accent">current</Tag> : <Tag tone="fault">superseded</Tag>}</Td>
                <Td>
                  {r.approvedBy}
                  <br />
                  <span className="numeric text-xs text-graphite">{formatDateTime(r.approvedAt, timeZone)}</span>
                </Td>
                <Td className="numeric text-xs whitespace-normal">{r.releasedAt ? formatDateTime(r.releasedAt, timeZone) : "—"}</Td>
              </tr>
            ))}
          </tbody>
        </Table>
      )}
    </Sheet>
  );
}
