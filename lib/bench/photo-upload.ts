import "server-only";
import { randomUUID } from "node:crypto";
import { insertAttachment } from "@/db/attachments";
import type { Viewer } from "@/db/visibility";
import { checkPhoto } from "@/lib/server/images";
import { deleteObject, putObject } from "@/lib/server/storage";

/**
 * Stores a checked photo (upright, without metadata) and its thumbnail, then records them. If recording fails the stored objects are
 * removed again, so a refused or failed upload leaves nothing behind.
 */
export async function storeBlockPhoto(viewer: Viewer, input: { blockId: string; operationId?: string; bytes: Buffer }) {
  const photo = await checkPhoto(input.bytes);
  const base = `blocks/${input.blockId}/${randomUUID()}`;
  const storageKey = `${base}.${photo.extension}`;
  const thumbnailKey = `${base}-thumb.jpg`;
  await putObject(storageKey, photo.bytes, photo.contentType);
  try {
    await putObject(thumbnailKey, photo.thumbnail, "image/jpeg");
    return await insertAttachment(viewer, {
      blockId: input.blockId,
      operationId: input.operationId,
      storageKey,
      contentType: photo.contentType,
      byteSize: photo.bytes.length,
    });
  } catch (error) {
    await Promise.allSettled([deleteObject(storageKey), deleteObject(thumbnailKey)]);
    throw error;
  }
}

export function thumbnailKeyOf(storageKey: string): string {
  return storageKey.replace(/\.[a-z]+$/, "-thumb.jpg");
}

const EXTENSIONS: Record<string, string> = { "image/jpeg": "jpg", "image/png": "png", "image/webp": "webp" };

/** Shown in the browser, never run: a fixed name from the photo's id and its real type. */
export function photoDisposition(photoId: string, contentType: string, thumbnail: boolean): string {
  const extension = EXTENSIONS[contentType] ?? "bin";
  return `inline; filename="photo-${photoId}${thumbnail ? "-thumb" : ""}.${extension}"`;
}
