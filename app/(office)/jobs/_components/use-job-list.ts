"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { usePathname, useSearchParams } from "next/navigation";
import { useMemo } from "react";
import type { JobListRow } from "@/db/jobs";
import { apiSearch, readView, viewSearch, type JobListView } from "../list-view";

export interface Choice {
  id: string;
  name: string;
}

export interface JobList {
  jobs: JobListRow[];
  total: number;
}

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

export type ShowView = (change: Partial<JobListView>, mode?: "push" | "replace") => void;

/**
 * The view the address asks for, a way to change it, and the page of jobs GET /api/jobs answers for it.
 * Choices the page does not know (a deleted customer) are dropped from the view.
 */
export function useJobList(customers: Choice[], tuners: Choice[]) {
  const searchParams = useSearchParams();
  const pathname = usePathname();
  const known = useMemo(
    () => ({ customers: new Set(customers.map((c) => c.id)), tuners: new Set(tuners.map((t) => t.id)) }),
    [customers, tuners],
  );
  const view = useMemo(() => readView(new URLSearchParams(searchParams.toString()), known), [searchParams, known]);

  /** Writes the view into the address bar; Next's router picks it up through useSearchParams. */
  const show: ShowView = (change, mode = "push") => {
    // Read the address afresh: a debounced search may land after other changes were made.
    const current = readView(new URLSearchParams(window.location.search), known);
    const search = viewSearch({ ...current, ...change }).toString();
    const url = search ? `${pathname}?${search}` : pathname;
    if (mode === "push") window.history.pushState(null, "", url);
    else window.history.replaceState(null, "", url);
  };

  const search = apiSearch(view);
  const query = useQuery({
    queryKey: ["jobs", search],
    queryFn: () => fetchJobs(search),
    placeholderData: keepPreviousData,
  });

  return { view, show, query };
}

export type JobListQuery = ReturnType<typeof useJobList>["query"];
