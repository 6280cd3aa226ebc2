import "server-only";
import { createHash } from "node:crypto";
import { getObject, putObject } from "@/lib/server/storage";
import { log } from "@/lib/server/log";
import { renderTravelerPdf } from "./pdf/render-traveler";
import type { PaperSize, TravelerData } from "./types";

// A revision's traveler never changes once approved, so each one is rendered once and kept in the object store.
// The key names the block, the revision, the paper, the revision's status (a superseded one prints another
// banner) and the shop's zone, and ends in a hash of everything the document shows: a release, a renamed
// customer or a new base URL makes a new file instead of serving a stale one.

/** Raised when the document's layout changes, so files rendered by the old layout are not served again. */
const LAYOUT_VERSION = 1;

export interface TravelerOptions {
  paper: PaperSize;
  timeZone: string;
}

export interface StoredTraveler {
  key: string;
  /** A strong validator for HTTP (quoted): the same key always holds the same bytes. */
  etag: string;
}

/** Where the traveler for this data, paper and zone is (or will be) kept, and its ETag. */
export function travelerKey(data: TravelerData, options: TravelerOptions): StoredTraveler {
  const digest = createHash("sha256")
    .update(JSON.stringify({ layout: LAYOUT_VERSION, data, paper: options.paper, timeZone: options.timeZone }))
    .digest("hex")
    .slice(0, 32);
  const zone = options.timeZone.replaceAll("/", "-");
  const key = `travelers/${data.block.id}/rev${data.revision.number}/${options.paper}-${data.revision.status}-${zone}-${digest}.pdf`;
  return { key, etag: `"${digest}"` };
}

// Renders under way in this process, by key: downloads of a traveler not stored yet wait for the one render
// instead of each starting its own (a release's mail and a first download, or several phones at once).
const rendering = new Map<string, Promise<Uint8Array>>();

/**
 * The traveler's PDF: the stored file, or rendered and stored on a miss. A store that cannot be reached does
 * not stop the print: the file is rendered, served and the failure logged.
 */
export async function storedTravelerPdf(data: TravelerData, options: TravelerOptions): Promise<StoredTraveler & { pdf: Uint8Array }> {
  const stored = travelerKey(data, options);
  const under = rendering.get(stored.key);
  if (under) return { ...stored, pdf: await under };
  try {
    const found = await getObject(stored.key);
    if (found) return { ...stored, pdf: found.body };
  } catch (error) {
    log.warn({ err: error, key: stored.key }, "traveler store not read; rendering");
  }
  let render = rendering.get(stored.key);
  if (!render) {
    render = renderAndStore(stored.key, data, options).finally(() => rendering.delete(stored.key));
    rendering.set(stored.key, render);
  }
  return { ...stored, pdf: await render };
}

async function renderAndStore(key: string, data: TravelerData, options: TravelerOptions): Promise<Uint8Array> {
  const pdf = await renderTravelerPdf(data, options);
  try {
    await putObject(key, pdf, "application/pdf");
  } catch (error) {
    log.warn({ err: error, key }, "traveler rendered but not stored");
  }
  return new Uint8Array(pdf.buffer, pdf.byteOffset, pdf.byteLength);
}
