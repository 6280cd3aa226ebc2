// A reading mistyped at the bench is corrected, with its reason, and the record keeps what was typed first.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import * as schema from "@/db/schema";
import { PATCH as amendRoute, POST as signOffRoute } from "@/app/api/operations/[id]/sign-off/route";
import { POST as stateRoute } from "@/app/api/jobs/[id]/state/route";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { startMailFake, type MailFake } from "./support/fakes";
import { makeJob } from "./support/jobs";

let mail: MailFake;
beforeAll(async () => {
  mail = await startMailFake();
});
afterAll(async () => mail.stop());
beforeEach(resetDatabase);

type Planned = { key: string; quantity: "length" | "pressure"; plannedSi: number; minSi: number; maxSi: number };

async function operationsOf(jobId: string) {
  return testDb
    .select({ id: schema.operations.id, measurements: schema.operations.measurements })
    .from(schema.operations)
    .innerJoin(schema.planRevisions, eq(schema.planRevisions.id, schema.operations.revisionId))
    .where(and(eq(schema.planRevisions.jobId, jobId), eq(schema.planRevisions.status, "current")));
}

// Readings on plan in the bench's units: 1 in = 0.0254 m exactly; 1 psi = 6894.757 Pa (NIST SP 811).
const onPlan = (planned: Planned[]) =>
  planned.map((m) => (m.quantity === "length" ? { key: m.key, value: m.plannedSi / 0.0254, unit: "in" } : { key: m.key, value: m.plannedSi / 6894.757, unit: "psi" }));

const params = (id: string) => ({ params: Promise.resolve({ id }) });
const signOff = (id: string, body: unknown) => signOffRoute(jsonRequest(`/api/operations/${id}/sign-off`, "POST", body), params(id));
const amend = (id: string, body: unknown) => amendRoute(jsonRequest(`/api/operations/${id}/sign-off`, "PATCH", body), params(id));

async function jobState(jobId: string) {
  const [row] = await testDb.select({ state: schema.jobs.state }).from(schema.jobs).where(eq(schema.jobs.id, jobId));
  return row!.state;
}

/** A released job whose hole-1 diameter was read in inches but signed with the mm unit left on, the rest on plan. */
async function jobWithTypo() {
  const job = await makeJob("released");
  await actAs("machinist");
  const ops = await operationsOf(job.id);
  const hole = ops.find((o) => (o.measurements as Planned[]).some((m) => m.key === "hole-1"))!;
  const planned = hole.measurements as Planned[];
  // e.g. 0.0625 in recorded as 0.0625 mm: 25.4 times too small, far outside plan.
  const typed = onPlan(planned).map((r) => (r.key === "hole-1" ? { ...r, unit: "mm" } : r));
  expect((await signOff(hole.id, { readings: typed })).status).toBe(201);
  for (const op of ops.filter((o) => o.id !== hole.id)) expect((await signOff(op.id, { readings: onPlan(op.measurements as Planned[]) })).status).toBe(201);
  return { job, hole, planned };
}

describe("PATCH /api/operations/{id}/sign-off", () => {
  it("a corrected failure completes the job; the first reading stays in the record", async () => {
    const { job, hole, planned } = await jobWithTypo();
    expect(await jobState(job.id)).toBe("machining");
    const [before] = await testDb.select().from(schema.measurements).where(and(eq(schema.measurements.operationId, hole.id), eq(schema.measurements.key, "hole-1")));
    expect(before!.passed).toBe(false);

    await actAs("machinist");
    const response = await amend(hole.id, { readings: onPlan(planned).filter((r) => r.key === "hole-1"), reason: "Read in inches, signed with mm selected" });
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.jobState).toBe("verified");
    expect(body.amended).toHaveLength(1);
    expect(body.amended[0].passed).toBe(true);
    expect(await jobState(job.id)).toBe("verified");

    const history = await testDb.select().from(schema.measurementAmendments).where(eq(schema.measurementAmendments.operationId, hole.id));
    expect(history).toHaveLength(1);
    expect(history[0]).toMatchObject({ key: "hole-1", previousValueSi: before!.valueSi, previousPassed: false, passed: true, reason: "Read in inches, signed with mm selected" });
    const audit = await testDb.select().from(schema.auditEvents).where(eq(schema.auditEvents.action, "operation.amend"));
    expect(audit).toHaveLength(1);
  });

  it("refuses once the job is verified, until an admin reopens it", async () => {
    const { job, hole, planned } = await jobWithTypo();
    await actAs("machinist");
    const fixed = onPlan(planned).filter((r) => r.key === "hole-1");
    expect((await amend(hole.id, { readings: fixed, reason: "Read in inches, signed with mm selected" })).status).toBe(200);
    const again = await amend(hole.id, { readings: [{ ...fixed[0]!, value: fixed[0]!.value * 1.001 }], reason: "One more time" });
    expect(again.status).toBe(409);
    expect((await again.json()).error.message).toMatch(/verified/);
    await actAs("admin");
    const reopen = await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "machining" }), params(job.id));
    expect(reopen.status).toBe(200);
    const afterReopen = await amend(hole.id, { readings: [{ ...fixed[0]!, value: fixed[0]!.value * 1.001 }], reason: "Measured again after reopening" });
    expect(afterReopen.status).toBe(200);
  });

  it("lets only the signer or an admin correct, names the field, and needs a reason", async () => {
    const { hole, planned } = await jobWithTypo();
    const fixed = onPlan(planned).filter((r) => r.key === "hole-1");
    await actAs("tuner");
    expect((await amend(hole.id, { readings: fixed, reason: "Not mine to correct" })).status).toBe(403);
    await actAs("machinist");
    const noReason = await amend(hole.id, { readings: fixed, reason: "" });
    expect(noReason.status).toBe(400);
    expect((await noReason.json()).error.field).toBe("reason");
    const unknownKey = await amend(hole.id, { readings: [{ key: "nope", value: 1, unit: "in" }], reason: "A key that is not there" });
    expect(unknownKey.status).toBe(400);
    expect((await unknownKey.json()).error.field).toBe("readings.nope");
    await actAs("anonymous");
    expect((await amend(hole.id, { readings: fixed, reason: "Anonymous" })).status).toBe(401);
    expect(await testDb.select().from(schema.measurementAmendments)).toEqual([]);
  });
});
