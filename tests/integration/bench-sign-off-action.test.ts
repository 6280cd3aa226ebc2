// The bench page's Done button: the sign-off server action, called with the FormData its form posts.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { and, asc, eq } from "drizzle-orm";
import * as schema from "@/db/schema";
import { signOffAction } from "@/app/bench/[blockId]/actions";
import { PATCH as patchJobRoute } from "@/app/api/jobs/[id]/route";
import { POST as jobStateRoute } from "@/app/api/jobs/[id]/state/route";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { mailSettled, startMailWorker } from "./support/mail-queue";
import { startMailFake, type MailFake } from "./support/fakes";
import { makeJob } from "./support/jobs";

let mail: MailFake;
beforeAll(async () => {
  mail = await startMailFake();
  // Mail goes through the queue: the worker the server would start sends it.
  await startMailWorker();
});
afterAll(async () => {
  await mail.stop();
});
beforeEach(async () => {
  await resetDatabase();
  // Whatever an earlier test queued is delivered before the count starts again.
  await mailSettled();
  mail.messages.length = 0;
});

type Planned = { key: string; label: string; quantity: "length" | "pressure"; plannedSi: number; minSi: number; maxSi: number };

/** Operations of one revision of the job, in order, with what they ask to be measured. */
async function operationsOf(jobId: string, revision = 1) {
  const rows = await testDb
    .select({ id: schema.operations.id, kind: schema.operations.kind, number: schema.operations.number, measurements: schema.operations.measurements })
    .from(schema.operations)
    .innerJoin(schema.planRevisions, eq(schema.planRevisions.id, schema.operations.revisionId))
    .where(and(eq(schema.planRevisions.jobId, jobId), eq(schema.planRevisions.number, revision)))
    .orderBy(asc(schema.operations.number));
  return rows.map((row) => ({ ...row, planned: row.measurements as Planned[] }));
}

/** The form as the bench page posts it: hidden operationId and keys, typed values and chosen units. */
function signOffForm(operationId: string, readings: { key: string; value: string; unit: string }[], note = ""): FormData {
  const data = new FormData();
  data.set("operationId", operationId);
  data.set("note", note);
  readings.forEach((r, i) => {
    data.set(`readings[${i}].key`, r.key);
    data.set(`readings[${i}].value`, r.value);
    data.set(`readings[${i}].unit`, r.unit);
  });
  return data;
}

const params = (id: string) => ({ params: Promise.resolve({ id }) });

describe("signOffAction (the bench page's Done button)", () => {
  it("records a sign-off with readings typed in inches, stored in metres, and moves the job to machining", async () => {
    const job = await makeJob("released");
    const hole = (await operationsOf(job.id)).find((op) => op.kind === "restriction")!;
    await actAs("machinist");
    // Typed at the bench as the pin gauge reads; 1 in = 0.0254 m exactly (NIST SP 811, B.8).
    const typed = hole.planned.map((m) => ({ key: m.key, value: (m.plannedSi / 0.0254).toFixed(4), unit: "in" }));
    const result = await signOffAction(undefined, signOffForm(hole.id, typed, "gauged with the 0.0890 pin"));
    expect(result.httpStatus).toBe(200);
    expect(result.data).toMatchObject({ recorded: true, jobState: "machining", failed: [] });
    const stored = await testDb.select().from(schema.measurements).where(eq(schema.measurements.operationId, hole.id));
    expect(stored).toHaveLength(hole.planned.length);
    for (const row of stored) {
      const typedValue = Number(typed.find((t) => t.key === row.key)!.value);
      expect(row.valueSi).toBeCloseTo(typedValue * 0.0254, 12);
      expect(row.passed).toBe(true);
    }
    const [signOff] = await testDb.select().from(schema.signOffs).where(eq(schema.signOffs.operationId, hole.id));
    expect(signOff!.note).toBe("gauged with the 0.0890 pin");
  });

  it("accepts a decimal comma and a millimetre reading", async () => {
    const job = await makeJob("released");
    const hole = (await operationsOf(job.id)).find((op) => op.kind === "restriction")!;
    await actAs("machinist");
    const typed = hole.planned.map((m) => ({ key: m.key, value: (m.plannedSi * 1000).toFixed(3).replace(".", ","), unit: "mm" }));
    const result = await signOffAction(undefined, signOffForm(hole.id, typed));
    expect(result.httpStatus).toBe(200);
    const [row] = await testDb.select().from(schema.measurements).where(eq(schema.measurements.operationId, hole.id));
    expect(row!.valueSi).toBeCloseTo(Number(typed[0]!.value.replace(",", ".")) / 1000, 12);
  });

  it("says 'already signed' for a second sign-off of the same operation and records nothing again", async () => {
    const job = await makeJob("released");
    const finish = (await operationsOf(job.id)).find((op) => op.kind === "finish")!;
    await actAs("machinist");
    expect((await signOffAction(undefined, signOffForm(finish.id, [], "first phone"))).data?.recorded).toBe(true);
    const again = await signOffAction(undefined, signOffForm(finish.id, [], "second phone"));
    expect(again.httpStatus).toBe(200);
    expect(again.data?.recorded).toBe(false);
    expect(again.message).toMatch(/already signed/i);
    const rows = await testDb.select().from(schema.signOffs).where(eq(schema.signOffs.operationId, finish.id));
    expect(rows.map((r) => r.note)).toEqual(["first phone"]);
  });

  it("answers 400 beside the empty box, and records nothing", async () => {
    const job = await makeJob("released");
    const hole = (await operationsOf(job.id)).find((op) => op.kind === "restriction")!;
    await actAs("machinist");
    const result = await signOffAction(undefined, signOffForm(hole.id, [{ key: hole.planned[0]!.key, value: "", unit: "in" }]));
    expect(result.httpStatus).toBe(400);
    expect(result.error?.["readings[0].value"]).toEqual(["Enter the measured value."]);
    expect(await testDb.select().from(schema.signOffs)).toHaveLength(0);
  });

  it("answers 400 naming a reading that was left out altogether", async () => {
    const job = await makeJob("released");
    const valve = (await operationsOf(job.id)).find((op) => op.kind === "valveSetting")!;
    await actAs("machinist");
    const result = await signOffAction(undefined, signOffForm(valve.id, []));
    expect(result.httpStatus).toBe(400);
    // The planner names this reading "Opening pressure" (lib/engineering/conversion-plan.ts).
    expect(result.error?.["measurements.opening-pressure"]?.[0]).toMatch(/opening pressure/i);
    expect(await testDb.select().from(schema.signOffs)).toHaveLength(0);
  });

  it("refuses a length typed in a pressure unit, beside that box", async () => {
    const job = await makeJob("released");
    const hole = (await operationsOf(job.id)).find((op) => op.kind === "restriction")!;
    await actAs("machinist");
    const typed = hole.planned.map((m, i) => ({ key: m.key, value: "0.089", unit: i === 0 ? "psi" : "in" }));
    const result = await signOffAction(undefined, signOffForm(hole.id, typed));
    expect(result.httpStatus).toBe(400);
    expect(result.error?.["readings[0].value"]?.[0]).toMatch(/length/);
    expect(await testDb.select().from(schema.measurements)).toHaveLength(0);
  });

  it("answers 401 to an anonymous caller and records nothing", async () => {
    const job = await makeJob("released");
    const finish = (await operationsOf(job.id)).find((op) => op.kind === "finish")!;
    await actAs("anonymous");
    expect((await signOffAction(undefined, signOffForm(finish.id, []))).httpStatus).toBe(401);
    expect(await testDb.select().from(schema.signOffs)).toHaveLength(0);
  });

  it("refuses a machinist an operation of a draft job (404, as if it did not exist)", async () => {
    const job = await makeJob("draft");
    // A draft job has no approved revision yet; approve one, then send the job back to draft.
    await actAs("tuner");
    await jobStateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "planned" }), params(job.id));
    await jobStateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "draft" }), params(job.id));
    const [finish] = (await operationsOf(job.id)).filter((op) => op.kind === "finish");
    expect(finish).toBeDefined();
    await actAs("machinist");
    const result = await signOffAction(undefined, signOffForm(finish!.id, []));
    expect(result.httpStatus).toBe(404);
    expect(await testDb.select().from(schema.signOffs)).toHaveLength(0);
  });

  it("refuses an operation of a superseded revision (409) once revision 2 is released", async () => {
    const job = await makeJob("released");
    const oldFinish = (await operationsOf(job.id, 1)).find((op) => op.kind === "finish")!;
    await actAs("tuner");
    expect((await patchJobRoute(jsonRequest(`/api/jobs/${job.id}`, "PATCH", { peakBoost: { value: 10, unit: "psi" } }), params(job.id))).status).toBe(200);
    expect((await jobStateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "planned" }), params(job.id))).status).toBe(200);
    expect((await jobStateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "released" }), params(job.id))).status).toBe(200);
    await actAs("machinist");
    const result = await signOffAction(undefined, signOffForm(oldFinish.id, []));
    expect(result.httpStatus).toBe(409);
    expect(result.error?.operationId?.[0]).toMatch(/Revision 1 is superseded/);
    expect(await testDb.select().from(schema.signOffs)).toHaveLength(0);
    // Revision 2's operation of the same kind is signable.
    const newFinish = (await operationsOf(job.id, 2)).find((op) => op.kind === "finish")!;
    expect((await signOffAction(undefined, signOffForm(newFinish.id, []))).httpStatus).toBe(200);
  });
});
