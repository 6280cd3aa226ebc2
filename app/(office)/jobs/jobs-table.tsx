"use client";

import {
  getCoreRowModel,
  useReactTable,
  type ColumnFiltersState,
  type PaginationState,
  type SortingState,
  type Updater,
} from "@tanstack/react-table";
import { useMemo } from "react";
import type { JobListRow } from "@/db/jobs";
import type { JobState } from "@/db/job-states";
import { Button } from "@/components/ui/button";
import { hasFilters, JOB_SORT_KEYS, JOBS_PAGE_SIZE, type JobSortKey } from "./list-view";
import { jobColumns } from "./_components/job-columns";
import { JobFilterBar, useSearchText, type FilterId } from "./_components/job-filter-bar";
import { JobsTableBody } from "./_components/jobs-table-body";
import { useJobList, type Choice } from "./_components/use-job-list";

// The office's list of jobs: the filters, the table and its pages, put together. The view lives in the address
// (list-view.ts); the server sorts, filters and pages.

const NO_ROWS: JobListRow[] = [];

function isSortKey(id: string): id is JobSortKey {
  return (JOB_SORT_KEYS as readonly string[]).includes(id);
}

function resolve<T>(updater: Updater<T>, current: T): T {
  return typeof updater === "function" ? (updater as (old: T) => T)(current) : updater;
}

export function JobsTable({
  customers,
  tuners,
  shopFloorOnly,
  timeZone,
}: {
  customers: Choice[];
  tuners: Choice[];
  shopFloorOnly: boolean;
  /** The shop's time zone (SHOP_TIME_ZONE, from the server page): the Updated column prints in it. */
  timeZone: string;
}) {
  const columns = useMemo(() => jobColumns(timeZone), [timeZone]);
  const { view, show, query } = useJobList(customers, tuners);
  const { text, onSearchInput, clearFilters } = useSearchText(view, show);

  const sorting: SortingState = [{ id: view.sort, desc: view.dir === "desc" }];
  const pagination: PaginationState = { pageIndex: view.page - 1, pageSize: JOBS_PAGE_SIZE };
  const columnFilters: ColumnFiltersState = [
    ...(view.state ? [{ id: "state", value: view.state }] : []),
    ...(view.customer ? [{ id: "customer", value: view.customer }] : []),
    ...(view.tuner ? [{ id: "tuner", value: view.tuner }] : []),
  ];

  // The server sorts, filters and pages; the table only keeps that state and renders the page it is given.
  // eslint-disable-next-line react-hooks/incompatible-library -- the table instance is used in this render only
  const table = useReactTable({
    data: query.data?.jobs ?? NO_ROWS,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    enableSortingRemoval: false,
    enableMultiSort: false,
    rowCount: query.data?.total ?? 0,
    state: { sorting, pagination, columnFilters },
    onSortingChange: (updater) => {
      const [first] = resolve(updater, sorting);
      if (!first || !isSortKey(first.id)) return;
      show({ sort: first.id, dir: first.desc ? "desc" : "asc", page: 1 });
    },
    onPaginationChange: (updater) => show({ page: resolve(updater, pagination).pageIndex + 1 }),
    onColumnFiltersChange: (updater) => {
      const next = resolve(updater, columnFilters);
      const value = (id: string) => next.find((f) => f.id === id)?.value as string | undefined;
      show({ state: value("state") as JobState | undefined, customer: value("customer"), tuner: value("tuner"), page: 1 });
    },
  });

  const total = query.data?.total ?? 0;
  const first = total === 0 ? 0 : (view.page - 1) * JOBS_PAGE_SIZE + 1;
  const last = Math.min(view.page * JOBS_PAGE_SIZE, total);
  const filtered = hasFilters(view);
  const updating = query.isFetching && query.isPlaceholderData;

  function setFilter(id: FilterId, value: string) {
    table.getColumn(id)?.setFilterValue(value || undefined);
  }

  let status: React.ReactNode;
  if (query.isPending) status = "Loading jobs…";
  else if (query.isError) status = null;
  else if (updating) status = "Updating…";
  else status = total === 0 ? "No jobs" : `${first}–${last} of ${total}`;

  return (
    <div className="flex flex-col gap-4">
      <JobFilterBar
        view={view}
        customers={customers}
        tuners={tuners}
        text={text}
        onSearchInput={onSearchInput}
        onFilter={setFilter}
        onClear={clearFilters}
        filtered={filtered}
      />

      <JobsTableBody
        table={table}
        query={query}
        view={view}
        total={total}
        filtered={filtered}
        updating={updating}
        customers={customers}
        tuners={tuners}
        shopFloorOnly={shopFloorOnly}
        onFirstPage={() => show({ page: 1 })}
        onClearFilters={clearFilters}
      />

      <div className="flex flex-wrap items-center justify-between gap-3">
        <p id="jobs-status" role="status" className="numeric text-sm text-graphite">
          {status}
          {query.isError && query.data ? <span className="ml-3 text-fault">Last update failed: {query.error.message}</span> : null}
        </p>
        <nav aria-label="Pages" className="flex items-center gap-2">
          <span className="numeric text-sm text-pencil">
            page {view.page} of {Math.max(1, table.getPageCount())}
          </span>
          <Button variant="secondary" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage() || query.isPending}>
            ← Previous
          </Button>
          <Button variant="secondary" onClick={() => table.nextPage()} disabled={!table.getCanNextPage() || query.isPending}>
            Next →
          </Button>
        </nav>
      </div>
    </div>
  );
}
