import "server-only";
import { getEnv } from "@/lib/server/env";

/** Path of the bench page for one block in one revision: what a traveler's QR code opens. */
export function benchPath(blockId: string, revision: number): string {
  return `/bench/${encodeURIComponent(blockId)}?revision=${revision}`;
}

/**
 * Absolute URL of the bench page, from the configured base URL (never from the request: behind a proxy or
 * `next start -H` the request's host is not what a phone on the shop floor can reach).
 */
export function benchUrl(blockId: string, revision: number): string {
  // Joined as text so that a base with a path ("https://shop.example/blockwright") keeps it.
  return `${getEnv().APP_BASE_URL.replace(/\/+$/, "")}${benchPath(blockId, revision)}`;
}
