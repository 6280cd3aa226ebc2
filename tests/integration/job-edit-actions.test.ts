// The edit forms' server actions: engine and fuel (updateJobAction), blocks and stages (saveBlocksAction).
import { beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { updateJobAction } from "@/app/(office)/jobs/[id]/edit/actions";
import { saveBlocksAction } from "@/app/(office)/jobs/[id]/blocks/actions";
import { getRevisionSnapshot } from "@/db/revisions";
import * as schema from "@/db/schema";
import { actAs, resetDatabase, testDb } from "./support/database";
import { nestedFormData } from "./support/form-fields";
import { blocksBody, makeJob } from "./support/jobs";
import { settle } from "./support/redirect";

beforeEach(resetDatabase);

async function jobRow(id: string) {
  const [row] = await testDb.select().from(schema.jobs).where(eq(schema.jobs.id, id));
  return row!;
}

async function blockRows(jobId: string) {
  return testDb.select().from(schema.meteringBlocks).where(eq(schema.meteringBlocks.jobId, jobId)).orderBy(schema.meteringBlocks.side);
}

async function stageCount(jobId: string): Promise<number> {
  const rows = await testDb
    .select({ id: schema.enrichmentStages.id })
    .from(schema.enrichmentStages)
    .innerJoin(schema.meteringBlocks, eq(schema.meteringBlocks.id, schema.enrichmentStages.blockId))
    .where(eq(schema.meteringBlocks.jobId, jobId));
  return rows.length;
}

/** Engine and fuel as the form posts them. */
function engineFields(overrides: Record<string, unknown> = {}) {
  return nestedFormData({
    carburetor: "Four-barrel, mechanical secondaries, boost-referenced",
    displacement: { value: 400, unit: "in³" },
    fuelKind: "blend",
    ethanolPct: 85,
    peakBoost: { value: 10, unit: "psi" },
    targetLambdaAtmosphere: 0.86,
    targetLambdaPeak: 0.76,
    intercooled: true,
    ambientTemperature: { value: 25, unit: "°C" },
    compressorEfficiencyPct: 72,
    intercoolerEffectivenessPct: 65,
    useAllDrills: true,
    notes: "Second visit: richer on top.",
    ...overrides,
  } as Parameters<typeof nestedFormData>[0]);
}

describe("updateJobAction", () => {
  it("saves the engine and fuel in SI and goes back to the job's page", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const outcome = await settle(updateJobAction(job.id, undefined, engineFields()));
    expect(outcome.redirectTo).toBe(`/jobs/${job.id}`);
    const row = await jobRow(job.id);
    // 400 in³ x 1.6387064e-5 m³/in³ (NIST SP 811, exact) = 6.5548256e-3 m³
    expect(row.displacementM3).toBeCloseTo(6.5548256e-3, 9);
    // 10 psi x 6894.757 Pa/psi (NIST SP 811) = 68947.57 Pa
    expect(row.peakBoostPa).toBeCloseTo(68947.57, 1);
    // 25 °C + 273.15 = 298.15 K
    expect(row.ambientTemperatureK).toBeCloseTo(298.15, 6);
    expect(row.fuelKind).toBe("blend");
    expect(row.fuelEthanolPct).toBe(85);
    expect(row.compressorEfficiency).toBeCloseTo(0.72, 9);
    expect(row.notes).toBe("Second visit: richer on top.");
  });

  it("clears an optional figure the tuner emptied", async () => {
    const job = await makeJob("draft", { targetPower: { value: 600, unit: "hp" }, chargeTemperature: { value: 120, unit: "°F" } });
    expect((await jobRow(job.id)).targetPowerW).not.toBeNull();
    await actAs("tuner");
    await settle(updateJobAction(job.id, undefined, engineFields({ targetPower: { value: "", unit: "hp" } })));
    const row = await jobRow(job.id);
    expect(row.targetPowerW).toBeNull();
    expect(row.chargeTemperatureK).toBeNull();
  });

  it("sends a released job back to draft and leaves its revision as approved", async () => {
    const job = await makeJob("released");
    const before = await getRevisionSnapshot(job.id, 1);
    await actAs("tuner");
    const outcome = await settle(updateJobAction(job.id, undefined, engineFields()));
    expect(outcome.redirectTo).toBe(`/jobs/${job.id}`);
    const row = await jobRow(job.id);
    expect(row.state).toBe("draft");
    expect(row.currentRevision).toBe(1);
    const after = await getRevisionSnapshot(job.id, 1);
    expect(after!.status).toBe("current");
    expect(after!.snapshot).toEqual(before!.snapshot);
  });

  it("answers 400 naming the field, keeps what was typed, and saves nothing", async () => {
    const job = await makeJob("draft");
    const before = await jobRow(job.id);
    await actAs("tuner");
    for (const [overrides, field] of [
      [{ peakBoost: { value: -3, unit: "psi" } }, "peakBoost.value"],
      [{ peakBoost: { value: 10, unit: "furlongs" } }, "peakBoost.unit"],
      [{ ethanolPct: undefined }, "ethanolPct"],
      [{ targetLambdaPeak: 3 }, "targetLambdaPeak"],
      [{ carburetor: "" }, "carburetor"],
    ] as const) {
      const outcome = await settle(updateJobAction(job.id, undefined, engineFields(overrides)));
      expect(outcome.result?.httpStatus, field).toBe(400);
      expect(outcome.result?.error?.[field], field).toBeTruthy();
      expect(outcome.result?.initialValue?.notes, field).toBe("Second visit: richer on top.");
    }
    const after = await jobRow(job.id);
    expect(after.carburetor).toBe(before.carburetor);
    expect(after.peakBoostPa).toBe(before.peakBoostPa);
    expect(after.updatedAt).toEqual(before.updatedAt);
  });

  it("answers 401 to nobody and 403 to a machinist, and saves nothing", async () => {
    const job = await makeJob("released");
    const before = await jobRow(job.id);
    await actAs("anonymous");
    expect((await settle(updateJobAction(job.id, undefined, engineFields()))).result?.httpStatus).toBe(401);
    await actAs("machinist");
    expect((await settle(updateJobAction(job.id, undefined, engineFields()))).result?.httpStatus).toBe(403);
    const after = await jobRow(job.id);
    expect(after.peakBoostPa).toBe(before.peakBoostPa);
    expect(after.state).toBe("released");
  });
});

describe("saveBlocksAction", () => {
  it("saves a primary and a secondary block with their stages and goes back to the job's page", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const body = blocksBody();
    body.blocks[1]!.stages.push({ valveKind: "boost", setpoint: { value: 10, unit: "psi" }, targetKind: "percentMainJet", targetTo: 12, maxHoles: 2 } as never);
    const outcome = await settle(saveBlocksAction(job.id, undefined, nestedFormData(body)));
    expect(outcome.redirectTo).toBe(`/jobs/${job.id}`);
    const blocks = await blockRows(job.id);
    expect(blocks.map((b) => b.side)).toEqual(["primary", "secondary"]);
    // 0.076 in x 0.0254 m/in (exact) = 1.9304e-3 m
    expect(blocks[0]!.mainJetDiameterM).toBeCloseTo(1.9304e-3, 9);
    expect(await stageCount(job.id)).toBe(4);
  });

  it("saves neither block when the second block has a bad stage: 400 naming the field, values kept", async () => {
    const job = await makeJob("draft");
    const before = await blockRows(job.id);
    const stagesBefore = await stageCount(job.id);
    await actAs("tuner");
    const body = blocksBody();
    body.blocks[0]!.mainJetCount = 3;
    // lambda 0.78 -> 0.85 makes the mixture leaner: not an enrichment.
    Object.assign(body.blocks[1]!.stages[0]!, { targetFrom: 0.78, targetTo: 0.85 });
    const outcome = await settle(saveBlocksAction(job.id, undefined, nestedFormData(body)));
    expect(outcome.result?.httpStatus).toBe(400);
    expect(outcome.result?.error?.["blocks[1].stages[0].targetTo"]).toBeTruthy();
    expect(JSON.stringify(outcome.result?.initialValue)).toContain("0.85");
    const after = await blockRows(job.id);
    expect(after.map((b) => b.mainJetCount)).toEqual(before.map((b) => b.mainJetCount));
    expect(await stageCount(job.id)).toBe(stagesBefore);
  });

  it("saves nothing on a job without blocks when one stage is bad", async () => {
    const job = await makeJob("draft");
    await testDb.delete(schema.meteringBlocks).where(eq(schema.meteringBlocks.jobId, job.id));
    await actAs("tuner");
    const body = blocksBody();
    (body.blocks[1]!.stages[0] as Record<string, unknown>).maxHoles = 9;
    const outcome = await settle(saveBlocksAction(job.id, undefined, nestedFormData(body)));
    expect(outcome.result?.httpStatus).toBe(400);
    expect(outcome.result?.error?.["blocks[1].stages[0].maxHoles"]).toBeTruthy();
    expect(await blockRows(job.id)).toHaveLength(0);
  });

  it("sends a released job back to draft", async () => {
    const job = await makeJob("released");
    await actAs("admin");
    const outcome = await settle(saveBlocksAction(job.id, undefined, nestedFormData(blocksBody())));
    expect(outcome.redirectTo).toBe(`/jobs/${job.id}`);
    expect((await jobRow(job.id)).state).toBe("draft");
  });

  it("answers an add-stage intent with the longer list and stores nothing", async () => {
    const job = await makeJob("draft");
    const stagesBefore = await stageCount(job.id);
    await actAs("tuner");
    const data = nestedFormData(blocksBody());
    data.set("__intent__", JSON.stringify({ type: "insert", payload: { name: "blocks[1].stages" } }));
    const outcome = await settle(saveBlocksAction(job.id, undefined, data));
    expect(outcome.result?.httpStatus).toBe(200);
    const value = outcome.result?.initialValue as { blocks: { stages: unknown[] }[] } | undefined;
    // blocksBody gives the secondary one stage; the intent adds a second.
    expect(value?.blocks[1]?.stages).toHaveLength(2);
    expect(await stageCount(job.id)).toBe(stagesBefore);
  });

  it("answers 401 to nobody and 403 to a machinist, and saves nothing", async () => {
    const job = await makeJob("released");
    const body = blocksBody();
    body.blocks[0]!.mainJetCount = 4;
    await actAs("anonymous");
    expect((await settle(saveBlocksAction(job.id, undefined, nestedFormData(body)))).result?.httpStatus).toBe(401);
    await actAs("machinist");
    expect((await settle(saveBlocksAction(job.id, undefined, nestedFormData(body)))).result?.httpStatus).toBe(403);
    expect((await blockRows(job.id)).map((b) => b.mainJetCount)).toEqual([2, 2]);
    expect((await jobRow(job.id)).state).toBe("released");
  });
});
