"use client";

import { useRouter } from "next/navigation";
import { useId, useState, type ChangeEvent } from "react";
import { PHOTO_ACCEPT } from "@/lib/bench/photo-formats";

type Upload = { state: "idle" } | { state: "sending"; percent: number } | { state: "failed"; message: string };

/** The API's refusal in plain words: "photo: photos may be at most 12 MB" reads as the part after the field. */
function refusalMessage(responseText: string, status: number): string {
  try {
    const body = JSON.parse(responseText) as { error?: { message?: string } };
    const message = body.error?.message;
    if (message) return message.replace(/^[a-zA-Z]+: /, "").replace(/^./, (c) => c.toUpperCase());
  } catch {
    // Not JSON: a proxy's page, a dropped connection.
  }
  return status === 401 ? "Your session ended: sign in again, then retry." : `The upload was refused (${status}).`;
}

/**
 * Takes or picks a photo for one operation and uploads it with visible progress, then shows its thumbnail.
 * XMLHttpRequest rather than fetch: only it reports upload progress, which matters on shop Wi-Fi.
 */
export function PhotoControl({
  blockId,
  operationId,
  initialPhotoIds,
  maxBytes,
}: {
  blockId: string;
  operationId: string;
  initialPhotoIds: string[];
  maxBytes: number;
}) {
  const router = useRouter();
  const inputId = useId();
  const [upload, setUpload] = useState<Upload>({ state: "idle" });
  const [added, setAdded] = useState<string[]>([]);
  const photoIds = [...initialPhotoIds, ...added.filter((id) => !initialPhotoIds.includes(id))];

  function send(event: ChangeEvent<HTMLInputElement>) {
    const file = event.currentTarget.files?.[0];
    event.currentTarget.value = "";
    if (!file) return;
    if (file.size > maxBytes) {
      setUpload({ state: "failed", message: `That photo is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is ${maxBytes / 1024 / 1024} MB.` });
      return;
    }
    const body = new FormData();
    body.set("photo", file);
    body.set("operationId", operationId);
    const request = new XMLHttpRequest();
    request.open("POST", `/api/blocks/${encodeURIComponent(blockId)}/photos`);
    request.upload.onprogress = (progress) => {
      if (progress.lengthComputable) setUpload({ state: "sending", percent: Math.round((progress.loaded / progress.total) * 100) });
    };
    request.onload = () => {
      if (request.status === 201) {
        const { photo } = JSON.parse(request.responseText) as { photo: { id: string } };
        setAdded((ids) => [...ids, photo.id]);
        setUpload({ state: "idle" });
        router.refresh();
      } else {
        setUpload({ state: "failed", message: refusalMessage(request.responseText, request.status) });
      }
    };
    request.onerror = () => setUpload({ state: "failed", message: "The upload did not get through: check the connection and try again." });
    setUpload({ state: "sending", percent: 0 });
    request.send(body);
  }

  const sending = upload.state === "sending";
  return (
    <div className="flex flex-col gap-2">
      <label
        htmlFor={inputId}
        className={`flex min-h-12 cursor-pointer items-center justify-center gap-2 rounded-[var(--radius-sheet)] border-2 border-ink bg-white px-4 text-lg font-semibold active:bg-accent-soft ${
          sending ? "pointer-events-none opacity-60" : ""
        }`}
      >
        <CameraIcon /> {photoIds.length ? "Add another photo" : "Add a photo"}
      </label>
      <input
        id={inputId}
        type="file"
        accept={PHOTO_ACCEPT}
        capture="environment"
        disabled={sending}
        onChange={send}
        className="sr-only"
      />
      {upload.state === "sending" ? (
        <div className="flex items-center gap-3" role="status">
          <progress value={upload.percent} max={100} className="h-3 flex-1" aria-label="Upload progress" />
          <span className="numeric w-14 text-right font-semibold">{upload.percent} %</span>
        </div>
      ) : null}
      {upload.state === "failed" ? (
        <p role="alert" className="text-base font-semibold text-fault">
          {upload.message}
        </p>
      ) : null}
      {photoIds.length ? (
        <ul className="grid grid-cols-4 gap-2" aria-label="Photos of this operation">
          {photoIds.map((id) => (
            <li key={id}>
              {/* eslint-disable-next-line @next/next/no-img-element -- our own thumbnail route */}
              <img src={`/api/photos/${id}?size=thumb`} alt="Uploaded photo" className="aspect-square w-full rounded-[var(--radius-sheet)] border-2 border-ink object-cover" />
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

/** Drawn, not an emoji: not every phone or shop tablet has an emoji font. */
function CameraIcon() {
  return (
    <svg aria-hidden viewBox="0 0 24 24" className="h-6 w-6" fill="none" stroke="currentColor" strokeWidth={2} strokeLinejoin="round">
      <path d="M3 8h4l2-3h6l2 3h4v11H3z" />
      <circle cx="12" cy="13" r="3.5" />
    </svg>
  );
}
