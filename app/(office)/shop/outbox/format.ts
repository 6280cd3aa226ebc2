/** A byte count as people read it: 812 B, 14.2 kB, 1.3 MB (decimal units). */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${bytes} B`;
  if (bytes < 1_000_000) return `${(bytes / 1000).toFixed(1)} kB`;
  return `${(bytes / 1_000_000).toFixed(1)} MB`;
}

/** The message's date in the server's zone, to the minute: the outbox is a local, developer's view. */
export function formatSent(iso: string | null): string {
  if (!iso) return "—";
  return new Date(iso).toISOString().slice(0, 16).replace("T", " ") + " UTC";
}

export function outboxHref(name: string): string {
  return `/shop/outbox/${encodeURIComponent(name)}`;
}

export function attachmentHref(name: string, index: number): string {
  return `/api/outbox/${encodeURIComponent(name)}/attachments/${index}`;
}
