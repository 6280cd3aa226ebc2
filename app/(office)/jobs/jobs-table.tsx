"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnFiltersState,
  type PaginationState,
  type SortingState,
  type Updater,
} from "@tanstack/react-table";
import Link from "next/link";
import { usePathname, useSearchParams } from "next/navigation";
import { useEffect, useMemo, useRef, useState } from "react";
import type { JobListRow } from "@/db/jobs";
import { Button } from "@/components/ui/button";
import { Input, Select } from "@/components/ui/field";
import { Tag } from "@/components/ui/sheet";
import { JOB_STATE_LABELS, JOB_STATES, type JobState } from "@/db/job-states";
import {
  apiSearch,
  hasFilters,
  JOB_SORT_KEYS,
  JOBS_PAGE_SIZE,
  readView,
  viewSearch,
  type JobListView,
  type JobSortKey,
} from "./list-view";

interface Choice {
  id: string;
  name: string;
}

interface JobList {
  jobs: JobListRow[];
  total: number;
}

const SEARCH_DELAY_MS = 300;
const NO_ROWS: JobListRow[] = [];

const STATE_TONE: Record<JobState, "plain" | "accent" | "muted"> = {
  draft: "muted",
  planned: "plain",
  released: "accent",
  machining: "accent",
  verified: "plain",
  delivered: "muted",
};

async function fetchJobs(search: string): Promise<JobList> {
  const response = await fetch(`/api/jobs?${search}`, { headers: { accept: "application/json" } });
  if (!response.ok) {
    let message = `the server answered ${response.status}`;
    try {
      const body = (await response.json()) as { error?: { message?: string } };
      if (body.error?.message) message = body.error.message;
    } catch {
      // not JSON: keep the status
    }
    throw new Error(message);
  }
  return (await response.json()) as JobList;
}

/** Local time as a shop writes it in a log: 2026-03-14 09:05. */
function stamp(iso: string): string {
  const d = new Date(iso);
  const two = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${two(d.getMonth() + 1)}-${two(d.getDate())} ${two(d.getHours())}:${two(d.getMinutes())}`;
}

const column = createColumnHelper<JobListRow>();

const COLUMNS = [
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

function isSortKey(id: string): id is JobSortKey {
  return (JOB_SORT_KEYS as readonly string[]).includes(id);
}

function resolve<T>(updater: Updater<T>, current: T): T {
  return typeof updater === "function" ? (updater as (old: T) => T)(current) : updater;
}

/** Words for what the filters ask, for the empty state: `state planned, customer Ada Brook, "vent"`. */
function describeFilters(view: JobListView, customers: Choice[], tuners: Choice[]): string {
  const parts: string[] = [];
  if (view.state) parts.push(`state ${JOB_STATE_LABELS[view.state].label}`);
  if (view.customer) parts.push(`customer ${customers.find((c) => c.id === view.customer)?.name ?? "?"}`);
  if (view.tuner) parts.push(`tuner ${tuners.find((t) => t.id === view.tuner)?.name ?? "?"}`);
  if (view.q) parts.push(`“${view.q}”`);
  return parts.join(", ");
}

export function JobsTable({ customers, tuners, shopFloorOnly }: { customers: Choice[]; tuners: Choice[]; shopFloorOnly: boolean }) {
  const searchParams = useSearchParams();
  const pathname = usePathname();
  const known = useMemo(
    () => ({ customers: new Set(customers.map((c) => c.id)), tuners: new Set(tuners.map((t) => t.id)) }),
    [customers, tuners],
  );
  const view = useMemo(() => readView(new URLSearchParams(searchParams.toString()), known), [searchParams, known]);

  /** Writes the view into the address bar; Next's router picks it up through useSearchParams. */
  function show(change: Partial<JobListView>, mode: "push" | "replace" = "push") {
    // Read the address afresh: a debounced search may land after other changes were made.
    const current = readView(new URLSearchParams(window.location.search), known);
    const search = viewSearch({ ...current, ...change }).toString();
    const url = search ? `${pathname}?${search}` : pathname;
    if (mode === "push") window.history.pushState(null, "", url);
    else window.history.replaceState(null, "", url);
  }

  // The search box: typed text shows at once, the list follows once typing pauses.
  const [text, setText] = useState(view.q);
  const [shownQ, setShownQ] = useState(view.q);
  if (shownQ !== view.q) {
    // The address changed from elsewhere (back button, "clear filters"): the box follows it.
    setShownQ(view.q);
    setText(view.q);
  }
  const searchTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  useEffect(() => () => clearTimeout(searchTimer.current), []);
  function onSearchInput(value: string) {
    setText(value);
    clearTimeout(searchTimer.current);
    searchTimer.current = setTimeout(() => show({ q: value.trim().slice(0, 100), page: 1 }, "replace"), SEARCH_DELAY_MS);
  }

  const search = apiSearch(view);
  const query = useQuery({
    queryKey: ["jobs", search],
    queryFn: () => fetchJobs(search),
    placeholderData: keepPreviousData,
  });

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
    columns: COLUMNS,
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
  const rows = table.getRowModel().rows;
  const first = total === 0 ? 0 : (view.page - 1) * JOBS_PAGE_SIZE + 1;
  const last = Math.min(view.page * JOBS_PAGE_SIZE, total);
  const filtered = hasFilters(view);
  const updating = query.isFetching && query.isPlaceholderData;

  function setFilter(id: "state" | "customer" | "tuner", value: string) {
    table.getColumn(id)?.setFilterValue(value || undefined);
  }

  function clearFilters() {
    clearTimeout(searchTimer.current);
    setText("");
    show({ state: undefined, customer: undefined, tuner: undefined, q: "", page: 1 });
  }

  let status: React.ReactNode;
  if (query.isPending) status = "Loading jobs…";
  else if (query.isError) status = null;
  else if (updating) status = "Updating…";
  else status = total === 0 ? "No jobs" : `${first}–${last} of ${total}`;

  return (
    <div className="flex flex-col gap-4">
      <div role="search" aria-label="Filter jobs" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-[10rem_minmax(0,1fr)_minmax(0,1fr)_minmax(0,1.4fr)_auto] lg:items-end">
        <label className="flex flex-col gap-1 text-sm font-semibold">
          State
          <Select value={view.state ?? ""} onChange={(e) => setFilter("state", e.target.value)} className="font-normal">
            <option value="">any state</option>
            {JOB_STATES.map((state) => (
              <option key={state} value={state}>
                {JOB_STATE_LABELS[state].label}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold">
          Customer
          <Select value={view.customer ?? ""} onChange={(e) => setFilter("customer", e.target.value)} className="font-normal">
            <option value="">any customer</option>
            {customers.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold">
          Tuner
          <Select value={view.tuner ?? ""} onChange={(e) => setFilter("tuner", e.target.value)} className="font-normal">
            <option value="">any tuner</option>
            {tuners.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </Select>
        </label>
        <label className="flex flex-col gap-1 text-sm font-semibold">
          Search
          <Input
            type="search"
            value={text}
            onChange={(e) => onSearchInput(e.target.value)}
            placeholder="job number, customer, carburetor, notes"
            maxLength={100}
            className="font-normal"
          />
        </label>
        <Button variant="quiet" onClick={clearFilters} disabled={!filtered && text === ""}>
          Clear filters
        </Button>
      </div>

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
                <td colSpan={COLUMNS.length} className="border-b border-rule px-3 py-8 text-center text-pencil">
                  Loading jobs…
                </td>
              </tr>
            ) : query.isError && !query.data ? (
              <tr>
                <td colSpan={COLUMNS.length} className="border-b border-rule px-3 py-6">
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
                <td colSpan={COLUMNS.length} className="border-b border-rule px-3 py-8 text-center text-graphite">
                  {view.page > 1 && total > 0 ? (
                    <span className="inline-flex flex-wrap items-center justify-center gap-3">
                      <span>
                        Page {view.page} is past the last job ({total} in all).
                      </span>
                      <Button variant="secondary" onClick={() => show({ page: 1 })}>
                        First page
                      </Button>
                    </span>
                  ) : filtered ? (
                    <span className="inline-flex flex-wrap items-center justify-center gap-3">
                      <span>No jobs match {describeFilters(view, customers, tuners)}.</span>
                      <Button variant="secondary" onClick={clearFilters}>
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
