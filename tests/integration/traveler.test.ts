// The printed traveler: the PDF route as the bench and the office call it, read back with poppler
// (pdftotext, pdfinfo, pdftoppm) and the QR code decoded from the rendered page with jsQR.
import { execFile } from "node:child_process";
import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { asc, eq } from "drizzle-orm";
import jsQR from "jsqr";
import { PNG } from "pngjs";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { GET as travelerRoute } from "@/app/api/blocks/[blockId]/traveler/route";
import { renderTravelerPdf } from "@/lib/traveler/pdf/render-traveler";
import { approveRevision } from "@/lib/jobs/approve";
import { updateJob } from "@/db/jobs";
import * as schema from "@/db/schema";
import { benchUrl } from "@/lib/bench/url";
import type { TravelerData } from "@/lib/traveler/types";
import { actAs, resetDatabase, testDb } from "./support/database";
import { startS3Fake, type S3Fake } from "./support/fakes";
import { blockIdOf, makeJob } from "./support/jobs";

// The renderer, watched: a stored traveler must not be rendered again.
vi.mock("@/lib/traveler/pdf/render-traveler", async (importOriginal) => {
  const original = await importOriginal<typeof import("@/lib/traveler/pdf/render-traveler")>();
  return { ...original, renderTravelerPdf: vi.fn(original.renderTravelerPdf) };
});
const renders = () => vi.mocked(renderTravelerPdf).mock.calls.length;

// The base URL the QR code must carry: set here, before anything reads the configuration.
const BASE_URL = "https://bench.blockwright.test";
process.env.APP_BASE_URL = BASE_URL;

const run = promisify(execFile);
let dir: string;
let s3: S3Fake;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "blockwright-traveler-"));
  // Rendered travelers are kept in the object store.
  s3 = await startS3Fake();
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
  await s3.stop();
});
beforeEach(resetDatabase);

const params = (blockId: string) => ({ params: Promise.resolve({ blockId }) });

async function getTraveler(blockId: string, query = "", headers: HeadersInit = {}): Promise<Response> {
  return travelerRoute(new Request(`http://127.0.0.1/api/blocks/${blockId}/traveler${query}`, { headers }), params(blockId));
}

/** The traveler files in the object store for one block (the store lives as long as the file's tests). */
const storedTravelers = (blockId: string) => s3.storedObjects().filter((file) => file.includes(`${path.sep}travelers${path.sep}${blockId}${path.sep}`));

let fileCount = 0;
async function savePdf(bytes: Uint8Array): Promise<string> {
  const file = path.join(dir, `traveler-${++fileCount}.pdf`);
  await writeFile(file, bytes);
  return file;
}

/** The text of the PDF (or one page): laid out as printed, or in reading order (`raw`), where a sentence wrapped in a box reads whole. */
async function pdfText(file: string, page?: number, mode: "layout" | "raw" = "layout"): Promise<string> {
  const range = page === undefined ? [] : ["-f", String(page), "-l", String(page)];
  return (await run("pdftotext", [...(mode === "layout" ? ["-layout"] : []), ...range, file, "-"])).stdout;
}

async function pdfInfo(file: string): Promise<{ pages: number; width: number; height: number }> {
  const { stdout } = await run("pdfinfo", [file]);
  const pages = Number(/^Pages:\s+(\d+)/m.exec(stdout)?.[1]);
  const size = /^Page size:\s+([\d.]+) x ([\d.]+) pts/m.exec(stdout);
  return { pages, width: Number(size?.[1]), height: Number(size?.[2]) };
}

/** Renders page 1 at 150 dpi, as a photocopy would see it, and decodes the QR code on it. */
async function decodeQr(file: string): Promise<string | undefined> {
  const prefix = path.join(dir, `page-${++fileCount}`);
  await run("pdftoppm", ["-png", "-r", "150", "-f", "1", "-l", "1", "-singlefile", file, prefix]);
  const png = PNG.sync.read(await readFile(`${prefix}.png`));
  return jsQR(new Uint8ClampedArray(png.data.buffer, png.data.byteOffset, png.data.byteLength), png.width, png.height)?.data;
}

async function operationsOf(blockId: string) {
  return testDb
    .select({ number: schema.operations.number, title: schema.operations.title })
    .from(schema.operations)
    .where(eq(schema.operations.blockId, blockId))
    .orderBy(asc(schema.operations.number));
}

describe("GET /api/blocks/{id}/traveler", () => {
  it("prints a released job's primary block: job, revision, operations in tens, drill, cautions and the bench code", async () => {
    const job = await makeJob("released");
    const blockId = await blockIdOf(job.id, "primary");
    await actAs("machinist");

    const response = await getTraveler(blockId);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    expect(response.headers.get("content-disposition")).toBe(`attachment; filename="${job.number}-primary-rev1.pdf"`);
    const bytes = new Uint8Array(await response.arrayBuffer());
    expect(Number(response.headers.get("content-length"))).toBe(bytes.byteLength);
    expect(Number(response.headers.get("x-traveler-bytes"))).toBe(bytes.byteLength);
    expect(Buffer.from(bytes.subarray(0, 5)).toString("latin1")).toBe("%PDF-");

    const file = await savePdf(bytes);
    const text = await pdfText(file);
    expect(text).toContain(job.number);
    expect(text).toContain("Wren Halloway");
    expect(text).toContain("REVISION 1");

    // The fixture's primary block plugs its vacuum passage, drills two stages' restrictions, sets one boost
    // valve and finishes: five operations, numbered in tens, each printed as "number title" in order.
    const ops = await operationsOf(blockId);
    expect(ops.map((op) => op.number)).toEqual([10, 20, 30, 40, 50]);
    let from = 0;
    for (const op of ops) {
      const at = text.slice(from).search(new RegExp(`^\\s*${op.number}\\s+${op.title.slice(0, 20).replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}`, "m"));
      expect(at, `operation ${op.number} after the previous one`).toBeGreaterThanOrEqual(0);
      from += at + 1;
    }

    // A 0.085 in vacuum passage takes a #4-40 plug on a #43 tap drill (handbook tap-drill table; domain notes),
    // and #43 is 0.0890 in (ASME B94.11M), 0.0890 x 25.4 = 2.261 mm.
    expect(text).toContain("#43");
    expect(text).toContain("#4-40 UNC");
    expect(text).toContain("0.0890 in");
    expect(text).toContain("2.261 mm");
    // The boost valve set at 3 psi, within half a psi: 3 psi = 20.7 kPa (NIST SP 811: 6.894757 kPa/psi).
    expect(text).toMatch(/Opening pressure/);
    expect(text).toContain("3.0 psi");
    expect(text).toContain("20.7 kPa");
    expect(text).toContain("± 0.5 psi");

    for (const word of ["DANGER", "WARNING", "CAUTION", "NOTICE"]) expect(text).toContain(word);
    expect((await pdfText(file, undefined, "raw")).replace(/\s+/g, " ")).toContain("manufacturer's instructions, local codes and licensed practice");
    expect(text).toMatch(/Page 1 of \d/);
    expect(text).not.toContain("SUPERSEDED");

    const expectedUrl = `${BASE_URL}/bench/${blockId}?revision=1`;
    expect(benchUrl(blockId, 1)).toBe(expectedUrl);
    expect(await decodeQr(file)).toBe(expectedUrl);
  });

  it("marks a superseded revision on every page, and serves the current one by default", async () => {
    const job = await makeJob("released");
    const blockId = await blockIdOf(job.id, "secondary");
    const tuner = { id: (await actAs("tuner"))!, role: "tuner" as const };
    await updateJob(tuner, job.id, { fields: { notes: "Came back lean at 7 psi." } });
    await approveRevision(tuner, job.id);

    const old = await getTraveler(blockId, "?revision=1");
    expect(old.status).toBe(200);
    expect(old.headers.get("content-disposition")).toContain(`${job.number}-secondary-rev1.pdf`);
    const oldFile = await savePdf(new Uint8Array(await old.arrayBuffer()));
    const { pages } = await pdfInfo(oldFile);
    for (let page = 1; page <= pages; page++) {
      expect(await pdfText(oldFile, page), `page ${page}`).toContain("SUPERSEDED — DO NOT USE");
    }
    // The code of the old revision still names it: the bench page then says it is superseded.
    expect(await decodeQr(oldFile)).toBe(`${BASE_URL}/bench/${blockId}?revision=1`);

    const current = await getTraveler(blockId);
    expect(current.status).toBe(200);
    expect(current.headers.get("content-disposition")).toContain(`${job.number}-secondary-rev2.pdf`);
    const currentText = await pdfText(await savePdf(new Uint8Array(await current.arrayBuffer())));
    expect(currentText).toContain("REVISION 2");
    expect(currentText).not.toContain("SUPERSEDED");
  });

  it("prints on US Letter by default and on A4 when asked (ANSI: 8.5 x 11 in = 612 x 792 pt; ISO 216: 210 x 297 mm = 595.3 x 841.9 pt)", async () => {
    const blockId = await blockIdOf((await makeJob("released")).id);
    await actAs("tuner");
    const letter = await pdfInfo(await savePdf(new Uint8Array(await (await getTraveler(blockId)).arrayBuffer())));
    expect(letter.width).toBeCloseTo(612, 0);
    expect(letter.height).toBeCloseTo(792, 0);
    const a4 = await pdfInfo(await savePdf(new Uint8Array(await (await getTraveler(blockId, "?paper=a4")).arrayBuffer())));
    expect(a4.width).toBeCloseTo((210 / 25.4) * 72, 0);
    expect(a4.height).toBeCloseTo((297 / 25.4) * 72, 0);
  });

  it("refuses bad input with 400 naming the field", async () => {
    const blockId = await blockIdOf((await makeJob("released")).id);
    await actAs("tuner");
    for (const [query, field] of [
      ["?revision=abc", "revision"],
      ["?revision=0", "revision"],
      ["?revision=1.5", "revision"],
      ["?paper=legal", "paper"],
    ] as const) {
      const response = await getTraveler(blockId, query);
      expect(response.status, query).toBe(400);
      expect((await response.json()).error.field, query).toBe(field);
    }
    const badId = await travelerRoute(new Request("http://127.0.0.1/api/blocks/not-an-id/traveler"), params("not-an-id"));
    expect(badId.status).toBe(400);
    expect((await badId.json()).error.field).toBe("blockId");
  });

  it("answers 404 for an unknown block, a revision that doesn't exist, and a job not yet approved", async () => {
    const blockId = await blockIdOf((await makeJob("released")).id);
    const draftBlockId = await blockIdOf((await makeJob("draft")).id);
    await actAs("admin");
    expect((await getTraveler("00000000-0000-4000-8000-000000000000")).status).toBe(404);
    const missing = await getTraveler(blockId, "?revision=9");
    expect(missing.status).toBe(404);
    expect((await missing.json()).error.field).toBe("revision");
    expect((await getTraveler(draftBlockId)).status).toBe(404);
  });

  it("keeps a planned (unreleased) job's traveler from the bench: 404 for a machinist, as for a block that does not exist, marked not released for the office", async () => {
    const blockId = await blockIdOf((await makeJob("planned")).id);
    await actAs("machinist");
    const hidden = await getTraveler(blockId);
    expect(hidden.status).toBe(404);
    const missing = await getTraveler("00000000-0000-4000-8000-000000000000");
    expect(await hidden.json()).toEqual(await missing.json());
    await actAs("tuner");
    const response = await getTraveler(blockId);
    expect(response.status).toBe(200);
    expect(await pdfText(await savePdf(new Uint8Array(await response.arrayBuffer())))).toContain("NOT RELEASED");
  });

  it("answers 401 to an anonymous caller before looking anything up", async () => {
    await actAs("anonymous");
    expect((await getTraveler("00000000-0000-4000-8000-000000000000")).status).toBe(401);
  });
});

describe("the stored traveler", () => {
  it("renders a revision's traveler once: a second download is the same file with the same ETag", async () => {
    const blockId = await blockIdOf((await makeJob("released")).id);
    await actAs("machinist");
    const before = renders();
    const first = await getTraveler(blockId);
    expect(first.status).toBe(200);
    const etag = first.headers.get("etag");
    expect(etag).toMatch(/^"[0-9a-f]+"$/);
    const firstBytes = Buffer.from(await first.arrayBuffer());
    expect(storedTravelers(blockId)).toHaveLength(1);

    const second = await getTraveler(blockId);
    expect(second.status).toBe(200);
    expect(second.headers.get("etag")).toBe(etag);
    // The stored file itself, not a new render of the same revision.
    expect(Buffer.from(await second.arrayBuffer()).equals(firstBytes)).toBe(true);
    expect(storedTravelers(blockId)).toHaveLength(1);
    expect(renders() - before).toBe(1);
  });

  it("renders once for downloads that arrive together before the file is stored", async () => {
    const blockId = await blockIdOf((await makeJob("released")).id);
    await actAs("machinist");
    const before = renders();
    const [a, b, c] = await Promise.all([getTraveler(blockId), getTraveler(blockId), getTraveler(blockId)]);
    const bytes = await Promise.all([a!, b!, c!].map(async (r) => Buffer.from(await r.arrayBuffer())));
    expect(bytes[1]!.equals(bytes[0]!)).toBe(true);
    expect(bytes[2]!.equals(bytes[0]!)).toBe(true);
    expect(storedTravelers(blockId)).toHaveLength(1);
    expect(renders() - before).toBe(1);
  });

  it("answers 304 without a body when the caller already holds the file, and keeps one file per paper size", async () => {
    const blockId = await blockIdOf((await makeJob("released")).id);
    await actAs("tuner");
    const first = await getTraveler(blockId);
    const etag = first.headers.get("etag")!;
    await first.arrayBuffer();
    const before = renders();
    const again = await getTraveler(blockId, "", { "if-none-match": etag });
    expect(again.status).toBe(304);
    expect(renders()).toBe(before);
    expect(again.headers.get("etag")).toBe(etag);
    expect(await again.text()).toBe("");
    // RFC 9110 13.1.2: If-None-Match compares weakly.
    expect((await getTraveler(blockId, "", { "if-none-match": `"other", W/${etag}` })).status).toBe(304);
    expect((await getTraveler(blockId, "", { "if-none-match": `"other"` })).status).toBe(200);

    const a4 = await getTraveler(blockId, "?paper=a4", { "if-none-match": etag });
    expect(a4.status).toBe(200);
    expect(a4.headers.get("etag")).not.toBe(etag);
    expect(storedTravelers(blockId)).toHaveLength(2);
  });

  it("keeps another file for a revision once it is superseded: the banner changes", async () => {
    const job = await makeJob("released");
    const blockId = await blockIdOf(job.id);
    const tuner = { id: (await actAs("tuner"))!, role: "tuner" as const };
    const current = await getTraveler(blockId, "?revision=1");
    const currentEtag = current.headers.get("etag")!;
    expect(await pdfText(await savePdf(new Uint8Array(await current.arrayBuffer())))).not.toContain("SUPERSEDED");

    await updateJob(tuner, job.id, { fields: { notes: "Came back lean at 7 psi." } });
    await approveRevision(tuner, job.id);
    const superseded = await getTraveler(blockId, "?revision=1", { "if-none-match": currentEtag });
    expect(superseded.status).toBe(200);
    expect(superseded.headers.get("etag")).not.toBe(currentEtag);
    expect(await pdfText(await savePdf(new Uint8Array(await superseded.arrayBuffer())))).toContain("SUPERSEDED — DO NOT USE");
    expect(storedTravelers(blockId)).toHaveLength(2);
  });

  it("still answers 404 to a machinist for a block not yet released, even with a stored file and its ETag", async () => {
    const blockId = await blockIdOf((await makeJob("planned")).id);
    await actAs("tuner");
    const office = await getTraveler(blockId);
    expect(office.status).toBe(200);
    const etag = office.headers.get("etag")!;
    await actAs("machinist");
    const hidden = await getTraveler(blockId, "", { "if-none-match": etag });
    expect(hidden.status).toBe(404);
    expect((await hidden.json()).error.code).toBe("not_found");
  });
});

describe("a long traveler", () => {
  it("breaks across pages with the header and page numbers on each, and keeps every operation in order", async () => {
    // Sixteen restriction steps of four holes each: far more than one page holds.
    const operations = Array.from({ length: 16 }, (_, i) => ({
      number: (i + 1) * 10,
      kind: "restriction",
      title: `Channel restriction, stage ${i + 1}`,
      instructions: "Drill 4 holes with #52 through the power-valve channel. Check every hole with pin gauges and record the size.",
      callouts: [{ label: "Holes", value: "4 x #52" }],
      grindPasses: [],
      measurements: Array.from({ length: 4 }, (_, h) => ({
        key: `hole-${h + 1}`,
        label: `Hole ${h + 1} by pin gauge`,
        quantity: "length" as const,
        plannedSi: 0.0635 * 0.0254,
        minSi: 0.0625 * 0.0254,
        maxSi: 0.0645 * 0.0254,
      })),
      caution: "drilling" as const,
    }));
    const data: TravelerData = {
      job: { number: "BW-0917", customer: "Odile Marchetti", carburetor: "Four-barrel", displacementM3: 0.0057, fuel: "Methanol", peakBoostPa: 82737 },
      block: { id: "7d0c8a52-93d1-4f4e-8f7a-3c2b1a0e9d11", side: "primary", mainJetDiameterM: 0.002, mainJetCount: 2 },
      revision: {
        number: 3,
        status: "current",
        approvedAt: "2025-03-02T09:00:00.000Z",
        approvedBy: "Mara Quillon",
        releasedAt: "2025-03-03T09:00:00.000Z",
        releasedBy: "Avery Lindqvist",
        tuner: "Mara Quillon",
      },
      operations,
      planNotes: [],
      acknowledgedDangers: 0,
      changes: null,
      benchUrl: "https://bench.blockwright.test/bench/7d0c8a52-93d1-4f4e-8f7a-3c2b1a0e9d11?revision=3",
    };
    const file = await savePdf(await renderTravelerPdf(data, { paper: "a4", timeZone: "UTC" }));
    const { pages } = await pdfInfo(file);
    expect(pages).toBeGreaterThan(2);
    let next = 0;
    for (let page = 1; page <= pages; page++) {
      const text = await pdfText(file, page);
      expect(text, `page ${page}`).toContain("BW-0917");
      expect(text, `page ${page}`).toContain("REVISION 3");
      expect(text, `page ${page}`).toContain("Odile Marchetti");
      expect(text, `page ${page}`).toContain(`Page ${page} of ${pages}`);
      // Operations continue in order from page to page, none lost or repeated.
      for (const match of text.matchAll(/^\s*(\d{2,3})\s+Channel restriction, stage (\d+)/gm)) {
        expect(Number(match[1])).toBe((next + 1) * 10);
        expect(Number(match[2])).toBe(next + 1);
        next++;
      }
    }
    expect(next).toBe(16);
  });
});

describe("dates on the traveler", () => {
  it("prints the shop's calendar days, not UTC's", async () => {
    const data: TravelerData = {
      job: { number: "BW-0918", customer: "Odile Marchetti", carburetor: "Four-barrel", displacementM3: 0.0057, fuel: "Gasoline", peakBoostPa: 55158 },
      block: { id: "7d0c8a52-93d1-4f4e-8f7a-3c2b1a0e9d12", side: "secondary", mainJetDiameterM: 0.002, mainJetCount: 2 },
      revision: {
        number: 1,
        status: "current",
        approvedAt: "2025-03-02T04:00:00.000Z",
        approvedBy: "Mara Quillon",
        releasedAt: "2025-03-03T03:00:00.000Z",
        releasedBy: "Avery Lindqvist",
        tuner: "Mara Quillon",
      },
      operations: [],
      planNotes: [],
      acknowledgedDangers: 0,
      changes: null,
      benchUrl: "https://bench.blockwright.test/bench/7d0c8a52-93d1-4f4e-8f7a-3c2b1a0e9d12?revision=1",
    };
    // America/Chicago keeps standard time, UTC-6, until the second Sunday of March (9 March in 2025; Energy
    // Policy Act of 2005, 15 U.S.C. 260a): 04:00 UTC on 2 March is 22:00 on 1 March, 03:00 UTC on 3 March is
    // 21:00 on 2 March, 05:30 UTC on 5 March is 23:30 on 4 March.
    const printedAt = new Date("2025-03-05T05:30:00Z");
    const chicago = await pdfText(await savePdf(await renderTravelerPdf(data, { timeZone: "America/Chicago", printedAt })), 1, "raw");
    expect(chicago).toContain("Released 2025-03-02 by Avery Lindqvist");
    expect(chicago).toContain("Approved 2025-03-01 by Mara Quillon");
    expect(chicago).toContain("printed 2025-03-04");
    // The same instants in UTC fall on the days their ISO strings name.
    const utc = await pdfText(await savePdf(await renderTravelerPdf(data, { timeZone: "UTC", printedAt })), 1, "raw");
    expect(utc).toContain("Released 2025-03-03 by Avery Lindqvist");
    expect(utc).toContain("Approved 2025-03-02 by Mara Quillon");
    expect(utc).toContain("printed 2025-03-05");
  });
});
