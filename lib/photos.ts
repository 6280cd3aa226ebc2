import "server-only";
import sharp, { type Metadata } from "sharp";
import { RequestRefusal } from "./errors";

/** The largest photo the bench accepts. A phone photo is typically 2-6 MB. */
export const MAX_PHOTO_BYTES = 12 * 1024 * 1024;
export const PHOTO_FORMATS = { jpeg: "image/jpeg", png: "image/png", webp: "image/webp", heif: "image/heic" } as const;
const THUMBNAIL_PX = 320;

export interface CheckedPhoto {
  contentType: string;
  extension: string;
  width: number;
  height: number;
  thumbnail: Buffer;
}

/**
 * Accepts a photo only when its bytes decode as JPEG, PNG, WebP or HEIC, whatever its name or declared type
 * says, and makes its thumbnail. Refusals name the `photo` field.
 */
export async function checkPhoto(bytes: Buffer): Promise<CheckedPhoto> {
  if (bytes.length === 0) throw new RequestRefusal(400, "The file is empty.", "photo");
  if (bytes.length > MAX_PHOTO_BYTES) {
    throw new RequestRefusal(400, `Photos may be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`, "photo");
  }
  let metadata: Metadata;
  try {
    metadata = await sharp(bytes).metadata();
  } catch {
    throw new RequestRefusal(400, "The file is not a photo (JPEG, PNG, WebP or HEIC).", "photo");
  }
  const format = metadata.format as keyof typeof PHOTO_FORMATS | undefined;
  if (!format || !(format in PHOTO_FORMATS) || !metadata.width || !metadata.height) {
    throw new RequestRefusal(400, "The file is not a photo (JPEG, PNG, WebP or HEIC).", "photo");
  }
  let thumbnail: Buffer;
  try {
    thumbnail = await sharp(bytes).rotate().resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: "inside" }).jpeg({ quality: 78 }).toBuffer();
  } catch {
    throw new RequestRefusal(400, "The photo could not be read: it may be damaged.", "photo");
  }
  return { contentType: PHOTO_FORMATS[format], extension: format === "jpeg" ? "jpg" : format, width: metadata.width, height: metadata.height, thumbnail };
}
