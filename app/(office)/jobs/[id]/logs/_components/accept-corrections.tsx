"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { failureOf } from "./api-failure";
import { FormMessage } from "@/components/ui/field";

export interface AcceptableCorrection {
  stageId: string;
  change: string;
  note: string;
}

/** The tuner picks the corrections to carry into the next revision; the job returns to draft for approval. */
export function AcceptCorrections({ jobId, logId, corrections, nextRevision }: { jobId: string; logId: string; corrections: AcceptableCorrection[]; nextRevision: number }) {
  const router = useRouter();
  const [chosen, setChosen] = useState<Set<string>>(() => new Set(corrections.map((c) => c.stageId)));
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function accept(event: FormEvent) {
    event.preventDefault();
    setBusy(true);
    setError(null);
    const response = await fetch(`/api/jobs/${jobId}/logs/${logId}/accept`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ stageIds: [...chosen] }),
    });
    if (response.ok) {
      router.push(`/jobs/${jobId}`);
      router.refresh();
      return;
    }
    setBusy(false);
    setError((await failureOf(response)).message);
  }

  return (
    <form onSubmit={accept} className="flex flex-col gap-3">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-bold">Corrections to carry into revision {nextRevision}</legend>
        {corrections.map((c) => (
          <label key={c.stageId} className="flex min-h-11 items-start gap-3 rounded-[var(--radius-sheet)] border border-rule px-3 py-2">
            <input
              type="checkbox"
              className="mt-1 size-5"
              checked={chosen.has(c.stageId)}
              onChange={(e) => {
                const next = new Set(chosen);
                if (e.target.checked) next.add(c.stageId);
                else next.delete(c.stageId);
                setChosen(next);
              }}
            />
            <span>
              <span className="numeric font-semibold">{c.change}</span>
              <br />
              <span className="text-xs text-graphite">{c.note}</span>
            </span>
          </label>
        ))}
      </fieldset>
      {error ? <FormMessage errors={[error]} /> : null}
      <div>
        <Button type="submit" disabled={busy || chosen.size === 0}>
          {busy ? "Accepting…" : `Accept ${chosen.size} correction${chosen.size === 1 ? "" : "s"} into revision ${nextRevision}`}
        </Button>
      </div>
      <p className="text-xs text-graphite">The job goes back to draft: review the plan, approve it and release the new travelers as usual.</p>
    </form>
  );
}
