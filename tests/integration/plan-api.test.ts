import { beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { POST as createRoute } from "@/app/api/jobs/route";
import { GET as readRoute, PATCH as patchRoute } from "@/app/api/jobs/[id]/route";
import { GET as planRoute } from "@/app/api/jobs/[id]/plan/route";
import { POST as stateRoute } from "@/app/api/jobs/[id]/state/route";
import { DEMO_JOBS, seedDemoShop } from "@/lib/demo/shop";
import { solveJob } from "@/lib/jobs/approve";
import * as schema from "@/db/schema";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { blocksBody, jobBody, makeJob } from "./support/jobs";

beforeEach(resetDatabase);

const params = (id: string) => ({ params: Promise.resolve({ id }) });
const get = (path: string) => new Request(`http://127.0.0.1${path}`);

/** A job whose only boost stage leaves the mixture far lean at peak: a plan that must not pass unnoticed. */
async function leanJob(): Promise<string> {
  const job = await makeJob("draft");
  await actAs("tuner");
  const primary = blocksBody().blocks[0]!;
  const body = { blocks: [{ ...primary, stages: [primary.stages[0]!] }], peakBoost: { value: 15, unit: "psi" } };
  const response = await patchRoute(jsonRequest(`/api/jobs/${job.id}`, "PATCH", body), params(job.id));
  expect(response.status).toBe(200);
  return job.id;
}

describe("GET /api/jobs/{id}/plan", () => {
  it("solves a draft live: stages with opening, mode, area and mixture, both sweeps, typed warnings", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const response = await planRoute(get(`/api/jobs/${job.id}/plan`), params(job.id));
    expect(response.status).toBe(200);
    const { plan } = await response.json();
    expect(plan.revision).toBeNull();
    expect(plan.stages.map((s: { side: string; valveKind: string; mode: string }) => [s.side, s.valveKind, s.mode])).toEqual([
      ["primary", "vacuum", "part"],
      ["primary", "boost", "full"],
      ["secondary", "boost", "full"],
    ]);
    // The fixture's 3 psi valve and 6.5 inHg vacuum valve, as given.
    expect(plan.stages[0].opensAt).toEqual({ value: 6.5, unit: "inHg" });
    expect(plan.stages[1].opensAt).toEqual({ value: 3, unit: "psi" });
    for (const stage of plan.stages) {
      expect(stage.neededAreaIn2).toBeGreaterThan(0);
      expect(stage.chosen.drill.label).toMatch(/^(#\d+|[A-Z]|\d+\/\d+)$/); // an inch drill: the plan's system
      expect(stage.achievedLambda).toBeGreaterThan(0.5);
    }
    // Full throttle starts just above the vacuum valve's opening; part throttle charts from 20 inHg.
    expect(plan.sweep.part[0].gaugePsi).toBeLessThan(plan.sweep.full[0].gaugePsi);
    expect(plan.sweep.full.at(-1).gaugePsi).toBeCloseTo(8, 6);
    // Cruise under vacuum is judged on the cruise lambda (1.0, the column default).
    expect(plan.sweep.part[0].targetLambda).toBe(1);
    expect(plan.warnings.every((w: { level: string }) => ["notice", "caution", "warning", "danger"].includes(w.level))).toBe(true);
    expect(plan.warnings.some((w: { level: string }) => w.level === "danger")).toBe(false);
  });

  it("reads an approved job from its snapshot, and hides a draft from a machinist (404)", async () => {
    const released = await makeJob("released");
    const draft = await makeJob("draft");
    await actAs("machinist");
    const response = await planRoute(get(`/api/jobs/${released.id}/plan`), params(released.id));
    expect(response.status).toBe(200);
    expect((await response.json()).plan.revision).toBe(1);
    expect((await planRoute(get(`/api/jobs/${draft.id}/plan`), params(draft.id))).status).toBe(404);
  });

  it("asks for a session first (401), and names a bad id (400)", async () => {
    const job = await makeJob("draft");
    await actAs("anonymous");
    expect((await planRoute(get(`/api/jobs/${job.id}/plan`), params(job.id))).status).toBe(401);
    await actAs("tuner");
    const bad = await planRoute(get(`/api/jobs/nope/plan`), params("nope"));
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.field).toBe("id");
  });
});

describe("approving a plan with danger warnings", () => {
  it("answers 409 naming the warnings, and approves with an acknowledgement that is recorded", async () => {
    const id = await leanJob();
    const plan = (await (await planRoute(get(`/api/jobs/${id}/plan`), params(id))).json()).plan;
    const dangers = plan.warnings.filter((w: { level: string }) => w.level === "danger");
    expect(dangers.length).toBeGreaterThan(0);

    const refused = await stateRoute(jsonRequest(`/api/jobs/${id}/state`, "POST", { to: "planned" }), params(id));
    expect(refused.status).toBe(409);
    const error = (await refused.json()).error;
    expect(error.field).toBe("acknowledgeWarnings");
    expect(error.warnings.map((w: { code: string }) => w.code)).toEqual(dangers.map((w: { code: string }) => w.code));
    expect(await testDb.select().from(schema.planRevisions).where(eq(schema.planRevisions.jobId, id))).toHaveLength(0);

    const approved = await stateRoute(jsonRequest(`/api/jobs/${id}/state`, "POST", { to: "planned", acknowledgeWarnings: true }), params(id));
    expect(approved.status).toBe(200);
    const [revision] = await testDb.select().from(schema.planRevisions).where(eq(schema.planRevisions.jobId, id));
    expect((revision!.acknowledgedWarnings as { code: string }[]).length).toBe(dangers.length);
  });

  it("approves a clean plan without any acknowledgement", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    expect((await stateRoute(jsonRequest(`/api/jobs/${job.id}/state`, "POST", { to: "planned" }), params(job.id))).status).toBe(200);
  });
});

describe("the job's conditions", () => {
  it("takes a site elevation and keeps the standard atmosphere's pressure there", async () => {
    await actAs("tuner");
    // 5 000 ft = 1 524 m (NIST SP 811: 1 ft = 0.3048 m); ISO 2533 at 1 524 m: 84 307 Pa (P0 (1 - 0.0065 h / 288.15)^5.25588).
    const response = await createRoute(jsonRequest("/api/jobs", "POST", jobBody({ siteElevation: { value: 5000, unit: "ft" }, cruiseLambda: 0.98 })));
    expect(response.status).toBe(201);
    const created = (await response.json()).job;
    const { job } = await (await readRoute(get(`/api/jobs/${created.id}`), params(created.id))).json();
    expect(job.engine.siteElevationM).toBeCloseTo(1524, 6);
    expect(job.engine.ambientPressurePa).toBeCloseTo(84_307, -1);
    expect(job.engine.cruiseLambda).toBe(0.98);
  });

  it("takes a barometer reading, and refuses both at once or an absurd one, naming the field", async () => {
    await actAs("tuner");
    const ok = await createRoute(jsonRequest("/api/jobs", "POST", jobBody({ ambientPressure: { value: 24.6, unit: "inHg" } })));
    // 24.6 inHg x 3386.389 Pa/inHg (NIST SP 811) = 83 305 Pa
    const created = (await ok.json()).job;
    const { job } = await (await readRoute(get(`/api/jobs/${created.id}`), params(created.id))).json();
    expect(job.engine.ambientPressurePa).toBeCloseTo(83_305.2, 0);
    for (const [body, field] of [
      [jobBody({ ambientPressure: { value: 84, unit: "kPa" }, siteElevation: { value: 1500, unit: "m" } }), "siteElevation"],
      [jobBody({ ambientPressure: { value: 14.7, unit: "kPa" } }), "ambientPressure.value"],
      [jobBody({ siteElevation: { value: 30000, unit: "ft" } }), "siteElevation.value"],
      [jobBody({ cruiseLambda: 3 }), "cruiseLambda"],
    ] as const) {
      const response = await createRoute(jsonRequest("/api/jobs", "POST", body));
      expect(response.status, field).toBe(400);
      expect((await response.json()).error.field, field).toBe(field);
    }
  });

  it("refuses a part-throttle stage on the secondary block, naming it", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const body = blocksBody();
    (body.blocks[1]!.stages[0] as Record<string, unknown>).mode = "part";
    const response = await patchRoute(jsonRequest(`/api/jobs/${job.id}`, "PATCH", body), params(job.id));
    expect(response.status).toBe(400);
    expect((await response.json()).error.field).toBe("blocks.1.stages.0.mode");
  });
});

describe("the demo shop", () => {
  it("plans every demo job with no danger and no warning that stops the bench", async () => {
    await seedDemoShop();
    const jobs = await testDb.select({ id: schema.jobs.id }).from(schema.jobs);
    expect(jobs).toHaveLength(DEMO_JOBS.length);
    for (const { id } of jobs) {
      const plan = await solveJob(id);
      const serious = plan.warnings.filter((w) => w.level === "danger" || w.level === "warning");
      expect(serious, id).toEqual([]);
      // Every lean stretch under boost the chart shades is named by a warning.
      const lean = plan.staging.sweep.zones.filter((z) => z.kind === "lean" && z.toGaugePa > 0);
      expect(plan.warnings.filter((w) => w.code === "lean_under_boost")).toHaveLength(lean.length);
    }
  });
});
