import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import type { JobListRow } from "@/db/jobs";
import { JOB_STATE_LABELS, type JobState } from "@/db/job-states";
import { Tag } from "@/components/ui/sheet";

const STATE_TONE: Record<JobState, "plain" | "accent" | "muted"> = {
  draft: "muted",
  planned: "plain",
  released: "accent",
  machining: "accent",
  verified: "plain",
  delivered: "muted",
};

/** Local time as a shop writes it in a log: 2026-03-14 09:05. */
function stamp(iso: string): string {
  const d = new Date(iso);
  const two = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${two(d.getMonth() + 1)}-${two(d.getDate())} ${two(d.getHours())}:${two(d.getMinutes())}`;
}

const column = createColumnHelper<JobListRow>();

/** The jobs table's columns; their ids are the sort keys GET /api/jobs takes. */
export const JOB_COLUMNS = [
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
    cell: (info) => <time dateTime={info.getValue()}>{stamp(info.getValue())}</time>,
  }),
];
