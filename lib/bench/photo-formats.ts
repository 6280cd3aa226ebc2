// The photo types the bench offers and the server keeps (JPEG from phones, PNG and WebP from screenshots);
// shared by the file input and the upload check.
export const PHOTO_FORMATS = { jpeg: "image/jpeg", png: "image/png", webp: "image/webp" } as const;
export type PhotoFormat = keyof typeof PHOTO_FORMATS;
export const PHOTO_ACCEPT = Object.values(PHOTO_FORMATS).join(",");
