// Delivering a job: who handed the blocks over, to whom and when, and the customer's conversion record by mail.
import { execFile } from "node:child_process";
import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { and, asc, eq } from "drizzle-orm";
import { POST as stateRoute } from "@/app/api/jobs/[id]/state/route";
import { GET as recordRoute } from "@/app/api/jobs/[id]/conversion-record/route";
import { signOffOperation } from "@/db/bench";
import { listCustomerJobs } from "@/db/deliveries";
import { updateJob } from "@/db/jobs";
import { changeJobState } from "@/db/revisions";
import { approveRevision } from "@/lib/jobs/approve";
import * as schema from "@/db/schema";
import { ALL_CAUTIONS } from "@/lib/safety/cautions";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { mailSettled, startMailWorker } from "./support/mail-queue";
import { startMailFake, type MailFake } from "./support/fakes";
import { makeJob } from "./support/jobs";

const run = promisify(execFile);
let mail: MailFake;
let dir: string;
beforeAll(async () => {
  mail = await startMailFake();
  await startMailWorker();
  dir = await mkdtemp(path.join(tmpdir(), "blockwright-record-"));
});
afterAll(async () => {
  await mail.stop();
  await rm(dir, { recursive: true, force: true });
});
beforeEach(async () => {
  await resetDatabase();
  await mailSettled();
  mail.messages.length = 0;
});

type Planned = { key: string; plannedSi: number };

/** A released demo job with every operation signed exactly on plan: the bench moves it to verified. */
async function verifiedJob(customerEmail: string | null) {
  const job = await makeJob("released");
  const [owner] = await testDb.select({ customerId: schema.jobs.customerId }).from(schema.jobs).where(eq(schema.jobs.id, job.id));
  await testDb.update(schema.customers).set({ email: customerEmail }).where(eq(schema.customers.id, owner!.customerId));
  await signEverything(job.id);
  return { ...job, customerId: owner!.customerId };
}

/** Signs every operation of the job's current revision exactly on plan; the last sign-off verifies the job. */
async function signEverything(jobId: string) {
  const ops = await testDb
    .select({ id: schema.operations.id, measurements: schema.operations.measurements })
    .from(schema.operations)
    .innerJoin(schema.planRevisions, eq(schema.planRevisions.id, schema.operations.revisionId))
    .where(and(eq(schema.planRevisions.jobId, jobId), eq(schema.planRevisions.status, "current")))
    .orderBy(asc(schema.operations.number));
  const machinistId = (await actAs("machinist"))!;
  for (const op of ops) {
    const readings = Object.fromEntries((op.measurements as Planned[]).map((m) => [m.key, m.plannedSi]));
    await signOffOperation({ id: machinistId, role: "machinist" }, { operationId: op.id, measurements: readings, note: "" });
  }
  const [row] = await testDb.select({ state: schema.jobs.state }).from(schema.jobs).where(eq(schema.jobs.id, jobId));
  expect(row!.state).toBe("verified");
}

const deliver = (jobId: string, body: unknown) => stateRoute(jsonRequest(`/api/jobs/${jobId}/state`, "POST", body), { params: Promise.resolve({ id: jobId }) });
const record = (jobId: string) => recordRoute(new Request(`http://127.0.0.1/api/jobs/${jobId}/conversion-record`), { params: Promise.resolve({ id: jobId }) });

async function pdfText(bytes: Uint8Array, name: string): Promise<string> {
  const file = path.join(dir, name);
  await writeFile(file, bytes);
  return (await run("pdftotext", ["-layout", file, "-"])).stdout;
}

async function waitForMail(count: number) {
  for (let i = 0; i < 100 && mail.messages.length < count; i++) await new Promise((r) => setTimeout(r, 50));
}

describe("delivering a verified job", () => {
  it("checks the caller before the body: 401 for nobody, 403 for the bench", async () => {
    const job = await verifiedJob("wren@example.test");
    await actAs("anonymous");
    expect((await deliver(job.id, "{not json")).status).toBe(401);
    await actAs("machinist");
    expect((await deliver(job.id, { to: "delivered", handedTo: "Wren Halloway" })).status).toBe(403);
  });

  it("refuses a delivery without the name of who took the blocks, naming the field, and saves nothing", async () => {
    const job = await verifiedJob("wren@example.test");
    await actAs("tuner");
    for (const body of [{ to: "delivered" }, { to: "delivered", handedTo: "   " }]) {
      const response = await deliver(job.id, body);
      expect(response.status).toBe(400);
      expect((await response.json()).error.field).toBe("handedTo");
    }
    const [row] = await testDb.select({ state: schema.jobs.state }).from(schema.jobs).where(eq(schema.jobs.id, job.id));
    expect(row!.state).toBe("verified");
    expect(await testDb.select().from(schema.deliveries)).toHaveLength(0);
  });

  it("records who handed the blocks over, to whom and when, and mails the customer the conversion record", async () => {
    const job = await verifiedJob("wren@example.test");
    const tunerId = await actAs("tuner");
    const before = Date.now();
    const response = await deliver(job.id, { to: "delivered", handedTo: "  Wren Halloway " });
    expect(response.status).toBe(200);
    expect(await response.json()).toMatchObject({ state: "delivered", revision: 1, recordMailedTo: "wren@example.test" });

    const [delivery] = await testDb.select().from(schema.deliveries).where(eq(schema.deliveries.jobId, job.id));
    expect(delivery).toMatchObject({ handedTo: "Wren Halloway", handedOverById: tunerId, revisionNumber: 1, recordMailedTo: "wren@example.test" });
    expect(delivery!.deliveredAt.getTime()).toBeGreaterThanOrEqual(before - 1000);

    await waitForMail(1);
    const message = mail.messages.find((m) => m.subject?.startsWith(job.number));
    expect(message).toBeDefined();
    expect(JSON.stringify(message!.to)).toContain("wren@example.test");
    const pdf = message!.attachments.find((a) => a.contentType === "application/pdf");
    expect(pdf?.filename).toBe(`${job.number}-conversion-record-rev1.pdf`);
    expect(pdf!.content.subarray(0, 5).toString()).toBe("%PDF-");

    const text = (await pdfText(pdf!.content, "mailed.pdf")).replace(/[ \t]+/g, " ");
    expect(text).toContain("Conversion record");
    expect(text).toContain("Received by Wren Halloway");
    // Opening points of the demo job's valves, as the tuner entered them (tests/support/job-fixtures.ts):
    // a 6.5 inHg vacuum valve and boost valves at 3 psi and 7 psi.
    expect(text).toContain("below 6.5 inHg vacuum");
    expect(text).toContain("at 3.0 psi boost");
    expect(text).toContain("at 7.0 psi boost");
    // Every hole measured on plan: the drill's own diameter. 1 in = 0.0254 m exactly (NIST SP 811), so the
    // record prints metres / 0.0254 in inches.
    const holes = await testDb
      .select({ parameters: schema.operations.parameters, measurements: schema.operations.measurements })
      .from(schema.operations)
      .where(eq(schema.operations.kind, "restriction"));
    expect(holes.length).toBeGreaterThan(0);
    for (const hole of holes) {
      const { count, drill } = hole.parameters as { count: number; drill: string };
      expect(text).toContain(`${count} × ${drill}`);
      const plannedM = (hole.measurements as Planned[])[0]!.plannedSi;
      expect(text).toContain(`Hole 1 by pin gauge ${(plannedM / 0.0254).toFixed(4)} in`);
    }
    expect(text).not.toContain("outside the planned band");
    for (const caution of ALL_CAUTIONS) {
      expect(text).toContain(caution.signal);
      expect(text).toContain(caution.title);
    }
    expect(text).toContain("MIXTURE PLAN"); // section titles print in capitals
    // The demo job's target lambda at peak boost is 0.86.
    expect(text).toMatch(/Target lambda at peak boost \(8\.0 psi\) 0\.86/);
    // The contact falls back to the job's tuner when the shop names none.
    expect(text).toContain("tuner@blockwright.test");

    // The office can print the same record again from the customer's page.
    const again = await record(job.id);
    expect(again.status).toBe(200);
    expect(again.headers.get("content-type")).toBe("application/pdf");
    expect(await pdfText(new Uint8Array(await again.arrayBuffer()), "again.pdf")).toContain("Wren Halloway");
  });

  it("delivers without mail when the customer has no e-mail address, and keeps the record printable", async () => {
    const job = await verifiedJob(null);
    await actAs("tuner");
    const response = await deliver(job.id, { to: "delivered", handedTo: "A courier" });
    expect(response.status).toBe(200);
    expect((await response.json()).recordMailedTo).toBeNull();
    await mailSettled();
    expect(mail.messages.filter((m) => m.subject?.startsWith(job.number))).toHaveLength(0);
    const [delivery] = await testDb.select().from(schema.deliveries).where(eq(schema.deliveries.jobId, job.id));
    expect(delivery).toMatchObject({ handedTo: "A courier", recordMailedTo: null });
    expect((await record(job.id)).status).toBe(200);
  });
});

describe("a car that comes back", () => {
  it("is delivered again on its new revision, and the customer's page keeps both records", async () => {
    const job = await verifiedJob(null);
    const tuner = { id: (await actAs("tuner"))!, role: "tuner" as const };
    expect((await deliver(job.id, { to: "delivered", handedTo: "Wren Halloway" })).status).toBe(200);
    // Back with a log: the inputs change (the job returns to draft), a revision 2 is approved, released and machined.
    await updateJob(tuner, job.id, { fields: { notes: "second visit" } });
    await approveRevision(tuner, job.id);
    await changeJobState(tuner, job.id, "released");
    await signEverything(job.id);
    await actAs("tuner");
    const again = await deliver(job.id, { to: "delivered", handedTo: "Ada Wren" });
    expect(again.status).toBe(200);
    expect((await again.json()).revision).toBe(2);

    const jobs = await listCustomerJobs(job.customerId);
    expect(jobs[0]!.deliveries.map((d) => [d.revision, d.handedTo])).toEqual([
      [2, "Ada Wren"],
      [1, "Wren Halloway"],
    ]);
    const first = await recordRoute(new Request(`http://127.0.0.1/api/jobs/${job.id}/conversion-record?revision=1`), { params: Promise.resolve({ id: job.id }) });
    expect(first.status).toBe(200);
    const text = await pdfText(new Uint8Array(await first.arrayBuffer()), "first-visit.pdf");
    expect(text).toContain("Wren Halloway");
    expect(text).not.toContain("Ada Wren");
    const missing = await recordRoute(new Request(`http://127.0.0.1/api/jobs/${job.id}/conversion-record?revision=9`), { params: Promise.resolve({ id: job.id }) });
    expect(missing.status).toBe(404);
    expect((await missing.json()).error.field).toBe("revision");
  });
});

describe("the conversion record download", () => {
  it("answers 401, 403 for the bench, 404 for a missing job and 409 before delivery", async () => {
    const job = await makeJob("released");
    await actAs("anonymous");
    expect((await record(job.id)).status).toBe(401);
    await actAs("machinist");
    expect((await record(job.id)).status).toBe(403);
    await actAs("admin");
    expect((await record("00000000-0000-4000-8000-000000000000")).status).toBe(404);
    const early = await record(job.id);
    expect(early.status).toBe(409);
    expect((await early.json()).error.field).toBe("id");
  });
});
