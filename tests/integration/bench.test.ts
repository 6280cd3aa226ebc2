import path from "node:path";
import sharp from "sharp";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import * as schema from "@/db/schema";
import { POST as signOffRoute } from "@/app/api/operations/[id]/sign-off/route";
import { POST as uploadRoute } from "@/app/api/blocks/[blockId]/photos/route";
import { GET as photoRoute } from "@/app/api/photos/[id]/route";
import { POST as stateRoute } from "@/app/api/jobs/[id]/state/route";
import { MAX_PHOTO_BYTES } from "@/lib/server/images";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { mailSettled, startMailWorker } from "./support/mail-queue";
import { startMailFake, startS3Fake, type MailFake, type S3Fake } from "./support/fakes";
import { makeJob } from "./support/jobs";

let mail: MailFake;
let s3: S3Fake;
beforeAll(async () => {
  mail = await startMailFake();
  s3 = await startS3Fake();
  // Mail goes through the queue: the worker the server would start sends it. Started after the fakes, which
  // set the configuration it reads.
  await startMailWorker();
});
afterAll(async () => {
  await mail.stop();
  await s3.stop();
});
beforeEach(async () => {
  await resetDatabase();
  // Whatever an earlier test queued is delivered before the count starts again.
  await mailSettled();
  mail.messages.length = 0;
});

async function operationsOf(jobId: string) {
  return testDb
    .select({ id: schema.operations.id, blockId: schema.operations.blockId, number: schema.operations.number, measurements: schema.operations.measurements })
    .from(schema.operations)
    .innerJoin(schema.planRevisions, eq(schema.planRevisions.id, schema.operations.revisionId))
    .where(and(eq(schema.planRevisions.jobId, jobId), eq(schema.planRevisions.status, "current")));
}

type Planned = { key: string; quantity: "length" | "pressure"; plannedSi: number; maxSi: number };

/** Readings exactly on plan, in the bench's units (inches, psi). */
function onPlan(planned: Planned[]) {
  return planned.map((m) =>
    m.quantity === "length"
      ? { key: m.key, value: m.plannedSi / 0.0254, unit: "in" } // 1 in = 0.0254 m exactly
      : { key: m.key, value: m.plannedSi / 6894.757, unit: "psi" }, // NIST SP 811: 1 psi = 6894.757 Pa
  );
}

const signOff = (operationId: string, body: unknown) =>
  signOffRoute(jsonRequest(`/api/operations/${operationId}/sign-off`, "POST", body), { params: Promise.resolve({ id: operationId }) });

async function jobState(jobId: string) {
  const [row] = await testDb.select({ state: schema.jobs.state }).from(schema.jobs).where(eq(schema.jobs.id, jobId));
  return row!.state;
}

async function waitForMail(count: number) {
  for (let i = 0; i < 50 && mail.messages.length < count; i++) await new Promise((r) => setTimeout(r, 50));
}

describe("signing operations off at the bench", () => {
  it("records the first sign-off, moves the job to machining, and records nothing for a repeat", async () => {
    const job = await makeJob("released");
    const [first] = (await operationsOf(job.id)).sort((a, b) => a.number - b.number);
    await actAs("machinist");
    const readings = onPlan(first!.measurements as Planned[]);
    const response = await signOff(first!.id, { readings, note: "clay showed 0.004 in" });
    expect(response.status).toBe(201);
    expect(await jobState(job.id)).toBe("machining");
    const again = await signOff(first!.id, { readings, note: "double tap" });
    expect(again.status).toBe(200);
    expect((await again.json()).recorded).toBe(false);
    const rows = await testDb.select().from(schema.signOffs).where(eq(schema.signOffs.operationId, first!.id));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.note).toBe("clay showed 0.004 in");
  });

  it("fifty concurrent sign-offs of one operation record exactly one", async () => {
    const job = await makeJob("released");
    const ops = await operationsOf(job.id);
    const target = ops.find((o) => (o.measurements as Planned[]).length === 0) ?? ops[0]!;
    await actAs("machinist");
    const readings = onPlan(target.measurements as Planned[]);
    const responses = await Promise.all(Array.from({ length: 50 }, () => signOff(target.id, { readings })));
    const statuses = responses.map((r) => r.status);
    expect(statuses.filter((s) => s === 201)).toHaveLength(1);
    expect(statuses.filter((s) => s === 200)).toHaveLength(49);
    expect(await testDb.select().from(schema.signOffs).where(eq(schema.signOffs.operationId, target.id))).toHaveLength(1);
  });

  it("names a missing reading and records nothing", async () => {
    const job = await makeJob("released");
    const withReading = (await operationsOf(job.id)).find((o) => (o.measurements as Planned[]).length > 0)!;
    await actAs("machinist");
    const response = await signOff(withReading.id, { readings: [] });
    expect(response.status).toBe(400);
    expect((await response.json()).error.field).toMatch(/^measurements\./);
    expect(await testDb.select().from(schema.signOffs)).toHaveLength(0);
    expect(await jobState(job.id)).toBe("released");
  });

  it("verifies the job when the last operation is signed with every reading on plan, and mails the tuner", async () => {
    const job = await makeJob("released");
    await actAs("machinist");
    for (const op of await operationsOf(job.id)) {
      expect((await signOff(op.id, { readings: onPlan(op.measurements as Planned[]) })).status).toBe(201);
    }
    expect(await jobState(job.id)).toBe("verified");
    await waitForMail(1);
    const done = mail.messages.find((m) => m.subject?.includes("is done"));
    expect(done?.to).toBeTruthy();
    expect(JSON.stringify(done?.to)).toContain("tuner@blockwright.test");
    expect(done?.text).toContain("Measured against plan");
    expect(done?.text).toContain("PRIMARY BLOCK");
    // Each sign-off with its time in the shop's zone (UTC, the default).
    expect(done?.text).toMatch(/signed by .+ at \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC/);
  });

  it("holds the job in machining when a reading is outside plan, and tells the tuner", async () => {
    const job = await makeJob("released");
    await actAs("machinist");
    const ops = await operationsOf(job.id);
    const hole = ops.find((o) => (o.measurements as Planned[]).some((m) => m.key === "hole-1"))!;
    const planned = hole.measurements as Planned[];
    const readings = onPlan(planned).map((r, i) => (i === 0 ? { ...r, value: r.value + 0.01 } : r)); // 0.01 in oversize
    expect((await signOff(hole.id, { readings })).status).toBe(201);
    for (const op of ops.filter((o) => o.id !== hole.id)) await signOff(op.id, { readings: onPlan(op.measurements as Planned[]) });
    expect(await jobState(job.id)).toBe("machining");
    await waitForMail(2);
    expect(mail.messages.some((m) => m.subject?.includes("outside plan"))).toBe(true);
    await actAs("tuner");
    const verify = await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "verified" }), { params: Promise.resolve({ id: job.id }) });
    expect(verify.status).toBe(409);
  });

  it("refuses to sign an operation of a superseded revision (409)", async () => {
    const job = await makeJob("released");
    const [old] = await operationsOf(job.id);
    await actAs("tuner");
    await testDb.update(schema.jobs).set({ state: "draft" }).where(eq(schema.jobs.id, job.id));
    await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "planned" }), { params: Promise.resolve({ id: job.id }) });
    await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "released" }), { params: Promise.resolve({ id: job.id }) });
    await actAs("machinist");
    const response = await signOff(old!.id, { readings: onPlan(old!.measurements as Planned[]) });
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toMatch(/superseded/);
  });
});

describe("releasing a job", () => {
  it("sends every active machinist the block travelers of the released revision, rendered off the request and stored in both paper sizes", async () => {
    const job = await makeJob("planned");
    await actAs("tuner");
    const response = await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "released" }), { params: Promise.resolve({ id: job.id }) });
    expect(response.status).toBe(200);
    // The request only queued the renders; the worker renders, stores and then mails.
    await mailSettled(30_000);
    await waitForMail(1);
    const notice = mail.messages.find((m) => m.subject?.includes("released"));
    expect(JSON.stringify(notice?.to)).toContain("machinist@blockwright.test");
    expect(notice?.attachments.map((a) => a.filename).sort()).toEqual([`${job.number}-primary-rev1.pdf`, `${job.number}-secondary-rev1.pdf`]);
    expect(notice?.attachments.every((a) => a.content.subarray(0, 5).toString() === "%PDF-")).toBe(true);
    expect(notice?.text).toContain(`/bench/`);
    // Two blocks, letter and A4 each: the download route finds them stored.
    expect(s3.storedObjects().filter((file) => file.includes(`${path.sep}travelers${path.sep}`))).toHaveLength(4);
  });
});

describe("photos", () => {
  const upload = (blockId: string, file: Blob, name: string) => {
    const form = new FormData();
    form.set("photo", file, name);
    return uploadRoute(new Request(`http://127.0.0.1/api/blocks/${blockId}/photos`, { method: "POST", body: form }), {
      params: Promise.resolve({ blockId }),
    });
  };

  async function blockOf(jobId: string) {
    const [block] = await testDb.select({ id: schema.meteringBlocks.id }).from(schema.meteringBlocks).where(eq(schema.meteringBlocks.jobId, jobId));
    return block!.id;
  }

  it("stores a real photo with a thumbnail and serves both", async () => {
    const blockId = await blockOf((await makeJob("released")).id);
    await actAs("machinist");
    const png = await sharp({ create: { width: 800, height: 600, channels: 3, background: "#808080" } }).png().toBuffer();
    const response = await upload(blockId, new Blob([new Uint8Array(png)], { type: "image/png" }), "bench.png");
    expect(response.status).toBe(201);
    const { photo } = await response.json();
    const full = await photoRoute(new Request(`http://127.0.0.1${photo.url}`), { params: Promise.resolve({ id: photo.id }) });
    expect(full.headers.get("content-type")).toBe("image/png");
    // Re-encoded without metadata, losslessly for PNG: the same pixels.
    const stored = Buffer.from(await full.arrayBuffer());
    expect((await sharp(stored).raw().toBuffer()).equals(await sharp(png).raw().toBuffer())).toBe(true);
    const thumb = await photoRoute(new Request(`http://127.0.0.1${photo.thumbnailUrl}`), { params: Promise.resolve({ id: photo.id }) });
    const meta = await sharp(Buffer.from(await thumb.arrayBuffer())).metadata();
    expect(meta.format).toBe("jpeg");
    expect(Math.max(meta.width!, meta.height!)).toBe(320);
  });

  it("refuses a non-image, an oversized file and a text file named .jpg, and stores nothing", async () => {
    const blockId = await blockOf((await makeJob("released")).id);
    await actAs("machinist");
    const before = s3.storedObjects().length;
    const text = new Blob(["measured 0.089 in"], { type: "text/plain" });
    const fakeJpeg = new Blob(["this is not a photo at all"], { type: "image/jpeg" });
    const jpegHeader = new Uint8Array(MAX_PHOTO_BYTES + 1);
    jpegHeader.set([0xff, 0xd8, 0xff, 0xe0]);
    const huge = new Blob([jpegHeader], { type: "image/jpeg" });
    for (const [file, name] of [
      [text, "notes.txt"],
      [fakeJpeg, "block.jpg"],
      [huge, "huge.jpg"],
    ] as const) {
      const response = await upload(blockId, file, name);
      expect([400, 413], name).toContain(response.status);
      expect((await response.json()).error.field, name).toBe("photo");
    }
    expect(await testDb.select().from(schema.attachments)).toHaveLength(0);
    expect(s3.storedObjects().length).toBe(before);
  });

  it("keeps a draft's blocks from machinists (404)", async () => {
    const blockId = await blockOf((await makeJob("draft")).id);
    await actAs("machinist");
    const png = await sharp({ create: { width: 10, height: 10, channels: 3, background: "#000" } }).png().toBuffer();
    expect((await upload(blockId, new Blob([new Uint8Array(png)], { type: "image/png" }), "x.png")).status).toBe(404);
  });
});
