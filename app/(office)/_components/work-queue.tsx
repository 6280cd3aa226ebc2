"use client";

import { Button } from "@/components/ui/button";
import { AdminQueue } from "./admin-queue";
import { MachinistQueue } from "./machinist-queue";
import { TunerQueue } from "./tuner-queue";
import { useWorkQueue } from "./use-work-queue";

/** The home page's work: the signed-in person's queue, read from the API and kept fresh while the page is open. */
export function WorkQueue() {
  const query = useWorkQueue();
  const queue = query.data;
  if (!queue) {
    return query.isError ? (
      <div role="alert" className="flex flex-wrap items-center gap-3 text-fault">
        Your work could not be read: {query.error.message}
        <Button variant="secondary" onClick={() => void query.refetch()} disabled={query.isFetching}>
          {query.isFetching ? "Retrying…" : "Retry"}
        </Button>
      </div>
    ) : (
      <p role="status" className="text-graphite">
        Reading your work…
      </p>
    );
  }
  return (
    <div className="flex flex-col gap-6" aria-busy={query.isFetching}>
      {queue.role === "tuner" ? <TunerQueue queue={queue} /> : queue.role === "machinist" ? <MachinistQueue queue={queue} /> : <AdminQueue queue={queue} />}
    </div>
  );
}
