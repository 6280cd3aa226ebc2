// A phone photo carries where it was taken. The stored copy must not; it must stand the right way up, and it is
// served as the type it is, never as something a browser would run.
import sharp from "sharp";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { POST as uploadRoute } from "@/app/api/blocks/[blockId]/photos/route";
import { GET as photoRoute } from "@/app/api/photos/[id]/route";
import { actAs, resetDatabase } from "./support/database";
import { startS3Fake, type S3Fake } from "./support/fakes";
import { blockIdOf, makeJob } from "./support/jobs";

let s3: S3Fake;
beforeAll(async () => {
  s3 = await startS3Fake();
});
afterAll(async () => s3.stop());
beforeEach(resetDatabase);

async function upload(bytes: Buffer, name: string, type: string) {
  const blockId = await blockIdOf((await makeJob("released")).id);
  await actAs("machinist");
  const form = new FormData();
  form.set("photo", new Blob([new Uint8Array(bytes)], { type }), name);
  return uploadRoute(new Request(`http://127.0.0.1/api/blocks/${blockId}/photos`, { method: "POST", body: form }), {
    params: Promise.resolve({ blockId }),
  });
}

async function fetchStored(response: Response) {
  const { photo } = (await response.json()) as { photo: { id: string; url: string } };
  const full = await photoRoute(new Request(`http://127.0.0.1${photo.url}`), { params: Promise.resolve({ id: photo.id }) });
  return { full, bytes: Buffer.from(await full.arrayBuffer()) };
}

// A 60 x 30 landscape frame, tagged as taken with the phone turned (EXIF orientation 6: rotate 90° clockwise to
// view) and with a GPS position, the way a phone camera writes it (EXIF 2.32, GPS IFD).
async function phoneJpeg(): Promise<Buffer> {
  return sharp({ create: { width: 60, height: 30, channels: 3, background: "#a0a0a0" } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExif({ IFD0: { Make: "Bench phone", Software: "camera 1.0" }, IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1", GPSLongitudeRef: "W", GPSLongitude: "0/1 7/1 0/1" } })
    .toBuffer();
}

describe("a photo from a phone", () => {
  it("the upload fixture really carries GPS and an orientation (so the next test can fail)", async () => {
    const meta = await sharp(await phoneJpeg()).metadata();
    expect(meta.exif?.toString("latin1")).toContain("Bench phone");
    expect(meta.orientation).toBe(6);
  });

  it("is stored without EXIF, GPS or XMP, turned upright", async () => {
    const response = await upload(await phoneJpeg(), "bench.jpg", "image/jpeg");
    expect(response.status).toBe(201);
    const { full, bytes } = await fetchStored(response);
    const meta = await sharp(bytes).metadata();
    expect(meta.format).toBe("jpeg");
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(meta.iptc).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
    expect(bytes.includes(Buffer.from("Bench phone"))).toBe(false);
    // Orientation 6 applied: the 60 x 30 frame is stored 30 wide and 60 high.
    expect([meta.width, meta.height]).toEqual([30, 60]);
    expect(full.headers.get("content-type")).toBe("image/jpeg");
    expect(full.headers.get("x-content-type-options")).toBe("nosniff");
    expect(full.headers.get("content-disposition")).toMatch(/^inline; filename="photo-[0-9a-f-]+\.jpg"$/);
  });

  it.each([
    ["png", "image/png"],
    ["webp", "image/webp"],
  ] as const)("a %s is served as %s", async (format, type) => {
    const bytes = await sharp({ create: { width: 20, height: 10, channels: 3, background: "#404040" } }).toFormat(format).toBuffer();
    const response = await upload(bytes, `shot.${format}`, type);
    expect(response.status).toBe(201);
    const { full } = await fetchStored(response);
    expect(full.headers.get("content-type")).toBe(type);
  });

  it("AVIF, which the bench does not offer, is refused naming the photo field", async () => {
    const avif = await sharp({ create: { width: 20, height: 10, channels: 3, background: "#404040" } }).avif().toBuffer();
    const before = s3.storedObjects().length;
    const response = await upload(avif, "shot.heic", "image/heic");
    expect(response.status).toBe(400);
    expect((await response.json()).error.field).toBe("photo");
    expect(s3.storedObjects()).toHaveLength(before);
  });

  it("an SVG (a script a browser would run) is refused", async () => {
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script></svg>');
    const response = await upload(svg, "shot.png", "image/png");
    expect(response.status).toBe(400);
  });
});
