// Editing a job the bench is machining: confirmed, it goes on hold; the bench sees "on hold", never a 404.
import { beforeEach, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import * as schema from "@/db/schema";
import { POST as signOffRoute } from "@/app/api/operations/[id]/sign-off/route";
import { GET as readRoute, PATCH as patchRoute } from "@/app/api/jobs/[id]/route";
import { POST as stateRoute } from "@/app/api/jobs/[id]/state/route";
import { getBenchView } from "@/db/bench";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { blockIdOf, blocksBody, makeJob } from "./support/jobs";

beforeEach(resetDatabase);

type Planned = { key: string; quantity: "length" | "pressure"; plannedSi: number };
// 1 in = 0.0254 m exactly; 1 psi = 6894.757 Pa (NIST SP 811).
const onPlan = (planned: Planned[]) =>
  planned.map((m) => (m.quantity === "length" ? { key: m.key, value: m.plannedSi / 0.0254, unit: "in" } : { key: m.key, value: m.plannedSi / 6894.757, unit: "psi" }));
const params = (id: string) => ({ params: Promise.resolve({ id }) });

async function machiningJob() {
  const job = await makeJob("released");
  const ops = await testDb
    .select({ id: schema.operations.id, measurements: schema.operations.measurements })
    .from(schema.operations)
    .innerJoin(schema.planRevisions, eq(schema.planRevisions.id, schema.operations.revisionId))
    .where(eq(schema.planRevisions.jobId, job.id));
  await actAs("machinist");
  const [first, second] = ops;
  const signed = await signOffRoute(jsonRequest(`/x`, "POST", { readings: onPlan(first!.measurements as Planned[]) }), params(first!.id));
  expect(signed.status).toBe(201);
  return { job, first: first!, second: second! };
}

async function stateOf(jobId: string) {
  const [row] = await testDb.select({ state: schema.jobs.state }).from(schema.jobs).where(eq(schema.jobs.id, jobId));
  return row!.state;
}

const editedBlocks = () => {
  const body = blocksBody();
  body.blocks[0]!.mainJetDiameter = { value: 0.078, unit: "in" };
  return body;
};

describe("editing a job in machining", () => {
  it("asks for confirmation first and changes nothing without it", async () => {
    const { job } = await machiningJob();
    await actAs("tuner");
    const refused = await patchRoute(jsonRequest(`/api/jobs/${job.id}`, "PATCH", editedBlocks()), params(job.id));
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.field).toBe("confirmHold");
    expect(await stateOf(job.id)).toBe("machining");
    const [primary] = await testDb.select().from(schema.meteringBlocks).where(and(eq(schema.meteringBlocks.jobId, job.id), eq(schema.meteringBlocks.side, "primary")));
    expect(primary!.mainJetDiameterM).toBeCloseTo(0.076 * 0.0254, 10);
  });

  it("puts the job on hold: the bench still opens it, says so, and signs nothing more; approval supersedes", async () => {
    const { job, first, second } = await machiningJob();
    await actAs("tuner");
    const held = await patchRoute(jsonRequest(`/api/jobs/${job.id}`, "PATCH", { ...editedBlocks(), confirmHold: true }), params(job.id));
    expect(held.status).toBe(200);
    expect(await stateOf(job.id)).toBe("held");

    const machinistId = (await actAs("machinist"))!;
    expect((await readRoute(new Request(`http://127.0.0.1/api/jobs/${job.id}`), params(job.id))).status).toBe(200);
    const view = await getBenchView({ id: machinistId, role: "machinist" }, await blockIdOf(job.id));
    expect(view?.job.state).toBe("held");
    expect(view?.job.tuner).toBeTruthy();
    const refused = await signOffRoute(jsonRequest(`/x`, "POST", { readings: onPlan(second.measurements as Planned[]) }), params(second.id));
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.message).toMatch(new RegExp(`on hold: ${view!.job.tuner}`));
    // Work already signed stays attached to its revision.
    expect(await testDb.select().from(schema.signOffs).where(eq(schema.signOffs.operationId, first.id))).toHaveLength(1);

    await actAs("tuner");
    const approved = await stateRoute(jsonRequest(`/x`, "POST", { to: "planned", acknowledgeWarnings: true }), params(job.id));
    expect(approved.status).toBe(200);
    const revisions = await testDb.select({ number: schema.planRevisions.number, status: schema.planRevisions.status }).from(schema.planRevisions).where(eq(schema.planRevisions.jobId, job.id));
    expect(revisions.sort((a, b) => a.number - b.number)).toEqual([
      { number: 1, status: "superseded" },
      { number: 2, status: "current" },
    ]);
  });

  it("only an admin reopens a verified job", async () => {
    const job = await makeJob("released");
    await testDb.update(schema.jobs).set({ state: "verified" }).where(eq(schema.jobs.id, job.id));
    await actAs("tuner");
    expect((await stateRoute(jsonRequest(`/x`, "POST", { to: "machining" }), params(job.id))).status).toBe(403);
    await actAs("admin");
    expect((await stateRoute(jsonRequest(`/x`, "POST", { to: "machining" }), params(job.id))).status).toBe(200);
  });
});
