import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import type { JobListRow } from "@/db/jobs";
import { JOB_STATE_LABELS, type JobState } from "@/db/job-states";
import { Tag } from "@/components/ui/sheet";
import { formatDateTime } from "@/lib/format/dates";

const STATE_TONE: Record<JobState, "plain" | "accent" | "muted"> = {
  draft: "muted",
  planned: "plain",
  released: "accent",
  machining: "accent",
  held: "accent",
  verified: "plain",
  delivered: "muted",
};

const column = createColumnHelper<JobListRow>();

/** The jobs table's columns, times in the shop's zone; their ids are the sort keys GET /api/jobs takes. */
export function jobColumns(timeZone: string) {
  return [
    column.accessor("number", {
      id: "number",
      header: "Job",
      cell: (info) => (
        <Link href={`/jobs/${info.row.original.id}`} className="numeric font-semibold text-accent-strong underline-offset-2 hover:underline">
          {info.getValue()}
        </Link>
      ),
    }),
    column.accessor("state", {
      id: "state",
      header: "State",
      cell: (info) => (
        <span title={JOB_STATE_LABELS[info.getValue()].meaning}>
          <Tag tone={STATE_TONE[info.getValue()]}>{JOB_STATE_LABELS[info.getValue()].label}</Tag>
        </span>
      ),
    }),
    column.accessor((row) => row.customer.name, { id: "customer", header: "Customer" }),
    column.accessor((row) => row.tuner.name, { id: "tuner", header: "Tuner" }),
    column.accessor("updatedAt", {
      id: "updatedAt",
      header: "Updated",
      sortDescFirst: true,
      cell: (info) => <time dateTime={info.getValue()}>{formatDateTime(info.getValue(), timeZone)}</time>,
    }),
  ];
}
