import { JOB_STATES, type JobState } from "@/db/job-states";

// What the jobs table shows, kept in the page's address so a reload or a shared link opens the same view.
// The names are those of GET /api/jobs; values that aren't valid (an unknown customer, page 0) are dropped.

export const JOB_SORT_KEYS = ["number", "state", "customer", "tuner", "updatedAt"] as const;
export type JobSortKey = (typeof JOB_SORT_KEYS)[number];
export type SortDirection = "asc" | "desc";

export const JOBS_PAGE_SIZE = 20;

export interface JobListView {
  state?: JobState;
  customer?: string;
  tuner?: string;
  q: string;
  page: number;
  sort: JobSortKey;
  dir: SortDirection;
}

export const DEFAULT_VIEW: JobListView = { q: "", page: 1, sort: "updatedAt", dir: "desc" };

function oneOf<T extends string>(value: string | null, allowed: readonly T[]): T | undefined {
  return value !== null && (allowed as readonly string[]).includes(value) ? (value as T) : undefined;
}

export function readView(params: URLSearchParams, known: { customers: ReadonlySet<string>; tuners: ReadonlySet<string> }): JobListView {
  const page = Number(params.get("page"));
  const customer = params.get("customer");
  const tuner = params.get("tuner");
  return {
    state: oneOf(params.get("state"), JOB_STATES),
    customer: customer && known.customers.has(customer) ? customer : undefined,
    tuner: tuner && known.tuners.has(tuner) ? tuner : undefined,
    q: (params.get("q") ?? "").trim().slice(0, 100),
    page: Number.isInteger(page) && page >= 1 ? page : 1,
    sort: oneOf(params.get("sort"), JOB_SORT_KEYS) ?? DEFAULT_VIEW.sort,
    dir: oneOf(params.get("dir"), ["asc", "desc"] as const) ?? DEFAULT_VIEW.dir,
  };
}

/** The address form of a view: only what differs from the default, in a fixed order. */
export function viewSearch(view: JobListView): URLSearchParams {
  const params = new URLSearchParams();
  if (view.state) params.set("state", view.state);
  if (view.customer) params.set("customer", view.customer);
  if (view.tuner) params.set("tuner", view.tuner);
  if (view.q) params.set("q", view.q);
  if (view.sort !== DEFAULT_VIEW.sort || view.dir !== DEFAULT_VIEW.dir) {
    params.set("sort", view.sort);
    params.set("dir", view.dir);
  }
  if (view.page > 1) params.set("page", String(view.page));
  return params;
}

/** The query string GET /api/jobs is asked with. */
export function apiSearch(view: JobListView): string {
  const params = viewSearch(view);
  params.set("sort", view.sort);
  params.set("dir", view.dir);
  params.set("page", String(view.page));
  params.set("pageSize", String(JOBS_PAGE_SIZE));
  return params.toString();
}

export function hasFilters(view: JobListView): boolean {
  return Boolean(view.state || view.customer || view.tuner || view.q);
}
