import { formatDateTime } from "@/lib/format/dates";

/** A byte count as people read it: 812 B, 14.2 kB, 1.3 MB (decimal units). */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} B`;
  if (bytes < 1_000_000) return `${(bytes / 1000).toFixed(1)} kB`;
  return `${(bytes / 1_000_000).toFixed(1)} MB`;
}

/** The message's date in the shop's zone, to the minute; a message without one shows a dash. */
export function formatSent(iso: string | null, timeZone: string): string {
  return iso ? formatDateTime(iso, timeZone) : "—";
}

export function outboxHref(name: string): string {
  return `/shop/outbox/${encodeURIComponent(name)}`;
}

export function attachmentHref(name: string, index: number): string {
  return `/api/outbox/${encodeURIComponent(name)}/attachments/${index}`;
}
