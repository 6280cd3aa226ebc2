"use client";

import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";

type Paper = "letter" | "a4";

type Progress =
  | { step: "idle" }
  | { step: "preparing" }
  | { step: "receiving"; received: number; total: number | null }
  | { step: "error"; message: string };

const KIB = 1024;

function size(bytes: number): string {
  return bytes < KIB * KIB ? `${Math.max(1, Math.round(bytes / KIB))} KB` : `${(bytes / KIB / KIB).toFixed(1)} MB`;
}

function filenameOf(disposition: string | null, fallback: string): string {
  const match = disposition ? /filename="([^"]+)"/.exec(disposition) : null;
  return match?.[1] ?? fallback;
}

async function refusalMessage(response: Response): Promise<string> {
  try {
    const body = (await response.json()) as { error?: { message?: string } };
    if (body.error?.message) return body.error.message;
  } catch {
    // Not JSON: fall through to the status.
  }
  return `The traveler could not be made (HTTP ${response.status}).`;
}

/**
 * Downloads the printed traveler (PDF) of one metering block. Shows "preparing" while the server renders it,
 * then the bytes received against Content-Length, then saves it under the server's file name. Errors (a
 * revision the bench may not have yet, a lost connection) are shown beside the button.
 */
export function TravelerDownloadButton({
  blockId,
  revision,
  label = "Download traveler",
  paper,
}: {
  blockId: string;
  /** The revision to print; the job's current one when omitted. */
  revision?: number | undefined;
  label?: string | undefined;
  /** Paper size; the server's default (Letter) when omitted. */
  paper?: Paper | undefined;
}) {
  const [progress, setProgress] = useState<Progress>({ step: "idle" });
  const running = useRef<AbortController | null>(null);

  useEffect(() => () => running.current?.abort(), []);

  async function download() {
    running.current?.abort();
    const controller = new AbortController();
    running.current = controller;
    setProgress({ step: "preparing" });
    const query = new URLSearchParams();
    if (revision !== undefined) query.set("revision", String(revision));
    if (paper) query.set("paper", paper);
    const search = query.toString() ? `?${query.toString()}` : "";
    try {
      const response = await fetch(`/api/blocks/${encodeURIComponent(blockId)}/traveler${search}`, {
        signal: controller.signal,
        credentials: "same-origin",
      });
      if (!response.ok) {
        setProgress({ step: "error", message: await refusalMessage(response) });
        return;
      }
      // The server repeats the size in its own header: Next sends route handler responses without Content-Length.
      const total = Number(response.headers.get("content-length")) || Number(response.headers.get("x-traveler-bytes")) || null;
      const chunks: Uint8Array<ArrayBuffer>[] = [];
      let received = 0;
      const reader = response.body?.getReader();
      if (reader) {
        setProgress({ step: "receiving", received, total });
        for (;;) {
          const { done, value } = await reader.read();
          if (done) break;
          chunks.push(value);
          received += value.byteLength;
          setProgress({ step: "receiving", received, total });
        }
      } else {
        chunks.push(new Uint8Array(await response.arrayBuffer()));
      }
      const blob = new Blob(chunks, { type: "application/pdf" });
      const url = URL.createObjectURL(blob);
      const link = document.createElement("a");
      link.href = url;
      link.download = filenameOf(response.headers.get("content-disposition"), `traveler-${blockId}.pdf`);
      document.body.append(link);
      link.click();
      link.remove();
      // Give the browser time to start saving before the bytes are released.
      window.setTimeout(() => URL.revokeObjectURL(url), 60_000);
      setProgress({ step: "idle" });
    } catch (error) {
      if (controller.signal.aborted) return;
      setProgress({ step: "error", message: error instanceof Error && error.message ? `Download failed: ${error.message}` : "Download failed." });
    } finally {
      if (running.current === controller) running.current = null;
    }
  }

  const busy = progress.step === "preparing" || progress.step === "receiving";
  return (
    <div className="flex flex-col items-start gap-1.5" data-testid="traveler-download">
      <Button variant="secondary" onClick={download} disabled={busy} aria-busy={busy}>
        {busy ? "Preparing traveler…" : label}
      </Button>
      <div aria-live="polite" className="min-h-5 text-xs text-graphite">
        {progress.step === "preparing" ? (
          <span className="flex items-center gap-2">
            <progress className="h-1.5 w-32" aria-label="Preparing the traveler" />
            preparing…
          </span>
        ) : progress.step === "receiving" ? (
          <span className="numeric flex items-center gap-2">
            {progress.total ? (
              <progress className="h-1.5 w-32" max={progress.total} value={progress.received} aria-label="Downloading the traveler" />
            ) : (
              <progress className="h-1.5 w-32" aria-label="Downloading the traveler" />
            )}
            {progress.total ? `${size(progress.received)} of ${size(progress.total)}` : size(progress.received)}
          </span>
        ) : null}
      </div>
      {progress.step === "error" ? (
        <p role="alert" className="text-sm font-medium text-fault">
          {progress.message}
        </p>
      ) : null}
    </div>
  );
}
