"use client";

import { useQuery } from "@tanstack/react-query";
import type { WorkQueue } from "@/lib/work-queue/types";

/** How often an open home page reads its queue again: the bench signs work off while the office watches. */
const REFRESH_MS = 60_000;

async function fetchWorkQueue(): Promise<WorkQueue> {
  const response = await fetch("/api/work-queue", { headers: { accept: "application/json" } });
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
  return (await response.json()) as WorkQueue;
}

/** The signed-in person's work queue from GET /api/work-queue, read again every minute and on focus. */
export function useWorkQueue() {
  return useQuery({ queryKey: ["work-queue"], queryFn: fetchWorkQueue, refetchInterval: REFRESH_MS, refetchOnWindowFocus: true });
}
