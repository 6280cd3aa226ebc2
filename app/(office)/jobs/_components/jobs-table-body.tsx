"use client";

import { flexRender, type Table } from "@tanstack/react-table";
import type { JobListRow } from "@/db/jobs";
import { JOB_STATE_LABELS } from "@/db/job-states";
import { Button } from "@/components/ui/button";
import type { JobListView } from "../list-view";
import type { Choice, JobListQuery } from "./use-job-list";

/** Words for what the filters ask, for the empty state: `state planned, customer Ada Brook, "vent"`. */
function describeFilters(view: JobListView, customers: Choice[], tuners: Choice[]): string {
  const parts: string[] = [];
  if (view.state) parts.push(`state ${JOB_STATE_LABELS[view.state].label}`);
  if (view.customer) parts.push(`customer ${customers.find((c) => c.id === view.customer)?.name ?? "?"}`);
  if (view.tuner) parts.push(`tuner ${tuners.find((t) => t.id === view.tuner)?.name ?? "?"}`);
  if (view.q) parts.push(`“${view.q}”`);
  return parts.join(", ");
}

/** The table itself: sortable headers, then the page of rows, or why there are none (loading, failed, empty). */
export function JobsTableBody({
  table,
  query,
  view,
  total,
  filtered,
  updating,
  customers,
  tuners,
  shopFloorOnly,
  onFirstPage,
  onClearFilters,
}: {
  table: Table<JobListRow>;
  query: JobListQuery;
  view: JobListView;
  total: number;
  filtered: boolean;
  updating: boolean;
  customers: Choice[];
  tuners: Choice[];
  shopFloorOnly: boolean;
  onFirstPage: () => void;
  onClearFilters: () => void;
}) {
  const rows = table.getRowModel().rows;
  const columnCount = table.getAllLeafColumns().length;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm" aria-busy={query.isFetching} aria-describedby="jobs-status">
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
                    className="border-b-2 border-ink px-3 py-0 text-left text-xs font-semibold uppercase tracking-wider text-graphite"
                  >
                    <button
                      type="button"
                      onClick={header.column.getToggleSortingHandler()}
                      className="-mx-1 inline-flex min-h-9 items-center gap-1.5 rounded-[var(--radius-sheet)] px-1 uppercase tracking-wider hover:text-accent-strong"
                      title={`Sort by ${String(header.column.columnDef.header).toLowerCase()}`}
                    >
                      {flexRender(header.column.columnDef.header, header.getContext())}
                      <span aria-hidden className={`numeric w-3 text-center ${sorted ? "text-ink" : "text-rule-strong"}`}>
                        {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}
                      </span>
                    </button>
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className={updating ? "opacity-60" : undefined}>
          {query.isPending ? (
            <tr>
              <td colSpan={columnCount} className="border-b border-rule px-3 py-8 text-center text-pencil">
                Loading jobs…
              </td>
            </tr>
          ) : query.isError && !query.data ? (
            <tr>
              <td colSpan={columnCount} className="border-b border-rule px-3 py-6">
                <div role="alert" className="flex flex-wrap items-center justify-center gap-3 text-fault">
                  <span>The jobs could not be loaded: {query.error.message}</span>
                  <Button variant="secondary" onClick={() => void query.refetch()} disabled={query.isFetching}>
                    {query.isFetching ? "Retrying…" : "Retry"}
                  </Button>
                </div>
              </td>
            </tr>
          ) : rows.length === 0 ? (
            <tr>
              <td colSpan={columnCount} className="border-b border-rule px-3 py-8 text-center text-graphite">
                {view.page > 1 && total > 0 ? (
                  <span className="inline-flex flex-wrap items-center justify-center gap-3">
                    <span>
                      Page {view.page} is past the last job ({total} in all).
                    </span>
                    <Button variant="secondary" onClick={onFirstPage}>
                      First page
                    </Button>
                  </span>
                ) : filtered ? (
                  <span className="inline-flex flex-wrap items-center justify-center gap-3">
                    <span>No jobs match {describeFilters(view, customers, tuners)}.</span>
                    <Button variant="secondary" onClick={onClearFilters}>
                      Clear filters
                    </Button>
                  </span>
                ) : shopFloorOnly ? (
                  "No released work yet: jobs appear here once a tuner releases their travelers."
                ) : (
                  "No jobs yet."
                )}
              </td>
            </tr>
          ) : (
            rows.map((row) => (
              <tr key={row.id} data-testid={`job-row-${row.original.number}`} className="hover:bg-accent-soft/40">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={`border-b border-rule px-3 py-2 align-middle ${cell.column.id === "updatedAt" ? "numeric text-graphite" : ""}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))
          )}
        </tbody>
      </table>
    </div>
  );
}
