import "server-only";
import sharp, { type Metadata } from "sharp";
import { RequestRefusal } from "@/db/refusal";
// Phones hand a browser JPEG (an iPhone converts its HEIC on the way); each format is stored and served as itself.
import { PHOTO_FORMATS, type PhotoFormat } from "@/lib/bench/photo-formats";

/** The largest photo the bench accepts. A phone photo is typically 2-6 MB. */
export const MAX_PHOTO_BYTES = 12 * 1024 * 1024;
const THUMBNAIL_PX = 320;
const NOT_A_PHOTO = "The file is not a photo (JPEG, PNG or WebP).";

export interface CheckedPhoto {
  /** The photo as stored: turned upright and re-encoded without its metadata (EXIF, GPS, XMP, comments). */
  bytes: Buffer;
  contentType: string;
  extension: string;
  width: number;
  height: number;
  thumbnail: Buffer;
}

function isPhotoFormat(format: string | undefined): format is PhotoFormat {
  return format !== undefined && Object.hasOwn(PHOTO_FORMATS, format);
}

/**
 * Accepts a photo only when its bytes decode as JPEG, PNG or WebP, whatever its name or declared type says.
 * The stored copy is re-encoded with the camera's orientation applied and every metadata block dropped, so a
 * phone's GPS position never reaches storage. Refusals name the `photo` field.
 */
export async function checkPhoto(input: Buffer): Promise<CheckedPhoto> {
  if (input.length === 0) throw new RequestRefusal(400, "The file is empty.", "photo");
  if (input.length > MAX_PHOTO_BYTES) {
    throw new RequestRefusal(400, `Photos may be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`, "photo");
  }
  let metadata: Metadata;
  try {
    metadata = await sharp(input).metadata();
  } catch {
    throw new RequestRefusal(400, NOT_A_PHOTO, "photo");
  }
  const format = metadata.format;
  if (!isPhotoFormat(format) || !metadata.width || !metadata.height) throw new RequestRefusal(400, NOT_A_PHOTO, "photo");
  try {
    // rotate() with no angle applies the EXIF orientation; sharp writes no metadata unless asked to.
    const upright = sharp(input, { limitInputPixels: 100_000_000 }).rotate();
    const encoded =
      format === "jpeg" ? upright.jpeg({ quality: 90 }) : format === "png" ? upright.png() : upright.webp({ quality: 90 });
    const { data, info } = await encoded.toBuffer({ resolveWithObject: true });
    const thumbnail = await sharp(data).resize(THUMBNAIL_PX, THUMBNAIL_PX, { fit: "inside" }).jpeg({ quality: 78 }).toBuffer();
    return {
      bytes: data,
      contentType: PHOTO_FORMATS[format],
      extension: format === "jpeg" ? "jpg" : format,
      width: info.width,
      height: info.height,
      thumbnail,
    };
  } catch {
    throw new RequestRefusal(400, "The photo could not be read: it may be damaged.", "photo");
  }
}
