import { beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { GET as listRoute, POST as createRoute } from "@/app/api/jobs/route";
import { GET as readRoute, PATCH as patchRoute } from "@/app/api/jobs/[id]/route";
import { POST as stateRoute } from "@/app/api/jobs/[id]/state/route";
import * as schema from "@/db/schema";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { blocksBody, jobBody, makeJob } from "./support/jobs";

beforeEach(resetDatabase);

const params = (id: string) => ({ params: Promise.resolve({ id }) });
const get = (path: string) => new Request(`http://127.0.0.1${path}`);

describe("POST /api/jobs", () => {
  it("creates a job for a new customer, numbered BW-0001, in SI", async () => {
    await actAs("tuner");
    const response = await createRoute(jsonRequest("/api/jobs", "POST", jobBody()));
    expect(response.status).toBe(201);
    const { job } = await response.json();
    expect(job.number).toBe("BW-0001");
    const [row] = await testDb.select().from(schema.jobs).where(eq(schema.jobs.id, job.id));
    // 350 in³ x 1.6387064e-5 m³/in³ (NIST SP 811, exact) = 5.7354724e-3 m³
    expect(row!.displacementM3).toBeCloseTo(5.7354724e-3, 9);
    // 8 psi x 6894.757 Pa/psi (NIST SP 811) = 55158.06 Pa
    expect(row!.peakBoostPa).toBeCloseTo(55158.06, 1);
    // 77 °F = (77 - 32) / 1.8 + 273.15 = 298.15 K
    expect(row!.ambientTemperatureK).toBeCloseTo(298.15, 6);
    expect(row!.state).toBe("draft");
  });

  it("answers 400 naming the field, and saves nothing", async () => {
    await actAs("tuner");
    for (const [body, field] of [
      [jobBody({ carburetor: "" }), "carburetor"],
      [jobBody({ peakBoost: { value: 8, unit: "furlongs" } }), "peakBoost.unit"],
      [jobBody({ displacement: { value: -5, unit: "L" } }), "displacement.value"],
      [jobBody({ fuelKind: "blend" }), "ethanolPct"],
      [jobBody({ newCustomerName: undefined }), "customerId"],
    ] as const) {
      const response = await createRoute(jsonRequest("/api/jobs", "POST", body));
      expect(response.status, field).toBe(400);
      expect((await response.json()).error.field, field).toBe(field);
    }
    expect(await testDb.select().from(schema.jobs)).toHaveLength(0);
    expect(await testDb.select().from(schema.customers)).toHaveLength(0);
  });
});

describe("GET /api/jobs/{id} and PATCH", () => {
  it("reads the job with its blocks and stages", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const response = await readRoute(get(`/api/jobs/${job.id}`), params(job.id));
    expect(response.status).toBe(200);
    const body = (await response.json()).job;
    expect(body.blocks.map((b: { side: string }) => b.side)).toEqual(["primary", "secondary"]);
    expect(body.blocks[0].stages).toHaveLength(2);
    expect(body.blocks[0].id).toBeTruthy();
    expect(body.currentRevision).toBeNull();
  });

  it("hides a draft from a machinist (404) but shows released work", async () => {
    const draft = await makeJob("draft");
    const released = await makeJob("released");
    await actAs("machinist");
    expect((await readRoute(get(`/api/jobs/${draft.id}`), params(draft.id))).status).toBe(404);
    expect((await readRoute(get(`/api/jobs/${released.id}`), params(released.id))).status).toBe(200);
  });

  it("replaces blocks in one transaction: a bad stage in the second block saves neither", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const body = blocksBody();
    body.blocks[0]!.mainJetCount = 3;
    (body.blocks[1]!.stages[0] as Record<string, unknown>).maxHoles = 9;
    const response = await patchRoute(jsonRequest(`/api/jobs/${job.id}`, "PATCH", body), params(job.id));
    expect(response.status).toBe(400);
    expect((await response.json()).error.field).toBe("blocks.1.stages.0.maxHoles");
    const blocks = await testDb.select().from(schema.meteringBlocks).where(eq(schema.meteringBlocks.jobId, job.id));
    expect(blocks.find((b) => b.side === "primary")!.mainJetCount).toBe(2);
  });

  it("editing a released job sends it to draft; approving makes revision 2 and supersedes revision 1 unchanged", async () => {
    const job = await makeJob("released");
    const [before] = await testDb.select().from(schema.planRevisions).where(eq(schema.planRevisions.jobId, job.id));
    await actAs("tuner");
    const patched = await patchRoute(jsonRequest(`/api/jobs/${job.id}`, "PATCH", { peakBoost: { value: 10, unit: "psi" } }), params(job.id));
    expect(patched.status).toBe(200);
    expect((await patched.json()).job.state).toBe("draft");
    const approved = await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "planned" }), params(job.id));
    expect(await approved.json()).toEqual({ state: "planned", revision: 2, warnings: [] });
    const revisions = await testDb.select().from(schema.planRevisions).where(eq(schema.planRevisions.jobId, job.id));
    const first = revisions.find((r) => r.number === 1)!;
    expect(first.status).toBe("superseded");
    expect(first.snapshot).toEqual(before!.snapshot);
    expect(revisions.find((r) => r.number === 2)!.status).toBe("current");
  });
});

describe("POST /api/jobs/{id}/state", () => {
  it("refuses a move the job's state does not allow (409)", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const response = await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "released" }), params(job.id));
    expect(response.status).toBe(409);
    expect((await response.json()).error.code).toBe("conflict");
  });

  it("refuses verified while operations are unsigned (409)", async () => {
    const job = await makeJob("released");
    await actAs("tuner");
    await testDb.update(schema.jobs).set({ state: "machining" }).where(eq(schema.jobs.id, job.id));
    const response = await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "verified" }), params(job.id));
    expect(response.status).toBe(409);
  });

  it("names a bad target state and a bad id", async () => {
    await actAs("tuner");
    const job = await makeJob("draft");
    const bad = await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "shipped" }), params(job.id));
    expect((await bad.json()).error.field).toBe("to");
    const badId = await stateRoute(jsonRequest(`/api/jobs/nope/state`, "POST", { to: "planned" }), params("nope"));
    expect((await badId.json()).error.field).toBe("id");
  });

  it("answers 404 for a job that does not exist", async () => {
    await actAs("tuner");
    const id = "00000000-0000-4000-8000-000000000000";
    expect((await stateRoute(jsonRequest(`/api/jobs/${id}/state`, "POST", { to: "planned" }), params(id))).status).toBe(404);
  });
});

describe("GET /api/jobs", () => {
  it("names a bad query parameter", async () => {
    await actAs("tuner");
    const response = await listRoute(get("/api/jobs?pageSize=500"));
    expect(response.status).toBe(400);
    expect((await response.json()).error.field).toBe("pageSize");
  });
});
