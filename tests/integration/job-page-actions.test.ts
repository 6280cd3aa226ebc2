// The job page's server actions: the tuner's pick among hole layouts, and moves between states.
import { beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { changeStateAction, chooseLayoutAction } from "@/app/(office)/jobs/[id]/actions";
import { getJob } from "@/db/jobs";
import { solveJob } from "@/lib/jobs/approve";
import * as schema from "@/db/schema";
import { actAs, formData, resetDatabase, testDb } from "./support/database";
import { makeJob } from "./support/jobs";

beforeEach(resetDatabase);

async function jobRow(id: string) {
  const [row] = await testDb.select().from(schema.jobs).where(eq(schema.jobs.id, id));
  return row!;
}

async function stageRows(jobId: string) {
  return testDb
    .select({ id: schema.enrichmentStages.id, chosenCount: schema.enrichmentStages.chosenCount, chosenDrillLabel: schema.enrichmentStages.chosenDrillLabel })
    .from(schema.enrichmentStages)
    .innerJoin(schema.meteringBlocks, eq(schema.meteringBlocks.id, schema.enrichmentStages.blockId))
    .where(eq(schema.meteringBlocks.jobId, jobId));
}

describe("chooseLayoutAction", () => {
  it("records a candidate other than the solver's first, and the plan then uses it, marked as the tuner's", async () => {
    const job = await makeJob("draft");
    const before = (await solveJob(job.id)).blocks[0]!.stages[0]!;
    expect(before.chosenBy).toBe("solver");
    const second = before.candidates[1]!;
    await actAs("tuner");
    const result = await chooseLayoutAction(job.id, undefined, formData({ stageId: before.stageId, count: String(second.count), drillLabel: second.drill.label }));
    expect(result.httpStatus).toBe(200);
    const after = (await solveJob(job.id)).blocks[0]!.stages[0]!;
    expect(after.chosenBy).toBe("tuner");
    expect(after.chosen.count).toBe(second.count);
    expect(after.chosen.drill.label).toBe(second.drill.label);
  });

  it("answers 400 naming the field, and records nothing", async () => {
    const job = await makeJob("draft");
    const stageId = (await stageRows(job.id))[0]!.id;
    await actAs("tuner");
    for (const [fields, field] of [
      [{ stageId: "not-an-id", count: "2", drillLabel: "#56" }, "stageId"],
      [{ stageId, count: "9", drillLabel: "#56" }, "count"],
      [{ stageId, count: "2", drillLabel: " " }, "drillLabel"],
    ] as const) {
      const result = await chooseLayoutAction(job.id, undefined, formData(fields));
      expect(result.httpStatus, field).toBe(400);
      expect(result.error?.[field], field).toBeTruthy();
    }
    expect((await stageRows(job.id)).every((s) => s.chosenCount === null && s.chosenDrillLabel === null)).toBe(true);
  });

  it("refuses a stage of another job (404) and a job that does not exist (404)", async () => {
    const job = await makeJob("draft");
    const other = await makeJob("draft");
    const foreignStage = (await stageRows(other.id))[0]!.id;
    await actAs("tuner");
    const fields = { stageId: foreignStage, count: "1", drillLabel: "#56" };
    expect((await chooseLayoutAction(job.id, undefined, formData(fields))).httpStatus).toBe(404);
    expect((await chooseLayoutAction("00000000-0000-4000-8000-000000000000", undefined, formData(fields))).httpStatus).toBe(404);
    expect((await chooseLayoutAction("nonsense", undefined, formData(fields))).httpStatus).toBe(404);
    expect((await stageRows(other.id)).every((s) => s.chosenCount === null)).toBe(true);
  });

  it("answers 401 to nobody and 403 to a machinist, even on released work", async () => {
    const job = await makeJob("released");
    const stageId = (await stageRows(job.id))[0]!.id;
    const fields = formData({ stageId, count: "1", drillLabel: "#56" });
    await actAs("anonymous");
    expect((await chooseLayoutAction(job.id, undefined, fields)).httpStatus).toBe(401);
    await actAs("machinist");
    expect((await chooseLayoutAction(job.id, undefined, fields)).httpStatus).toBe(403);
    expect((await jobRow(job.id)).state).toBe("released");
    expect((await stageRows(job.id)).every((s) => s.chosenCount === null)).toBe(true);
  });
});

describe("changeStateAction", () => {
  it("approves a draft as revision 1, releases it, and stamps the release", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const approved = await changeStateAction(job.id, undefined, formData({ to: "planned" }));
    expect(approved.httpStatus).toBe(200);
    expect(approved.message).toBe("Revision 1 approved.");
    const released = await changeStateAction(job.id, undefined, formData({ to: "released" }));
    expect(released.httpStatus).toBe(200);
    const record = await getJob({ id: "x", role: "admin" }, job.id);
    expect(record!.job.state).toBe("released");
    expect(record!.revisions).toHaveLength(1);
    expect(record!.revisions[0]).toMatchObject({ number: 1, status: "current" });
    expect(record!.revisions[0]!.releasedAt).not.toBeNull();
  });

  it("reopens a planned job for edits, keeping its revision", async () => {
    const job = await makeJob("planned");
    await actAs("admin");
    expect((await changeStateAction(job.id, undefined, formData({ to: "draft" }))).httpStatus).toBe(200);
    const row = await jobRow(job.id);
    expect(row.state).toBe("draft");
    expect(row.currentRevision).toBe(1);
  });

  it("marks a verified job delivered", async () => {
    const job = await makeJob("released");
    // The bench record that earns "verified" is another part's business; here the job is simply put there.
    await testDb.update(schema.jobs).set({ state: "verified" }).where(eq(schema.jobs.id, job.id));
    const tunerId = await actAs("tuner");
    // Who took the blocks is asked for, and nothing moves without it.
    const unnamed = await changeStateAction(job.id, undefined, formData({ to: "delivered", handedTo: "" }));
    expect(unnamed.httpStatus).toBe(400);
    expect(unnamed.error?.handedTo).toBeTruthy();
    expect((await jobRow(job.id)).state).toBe("verified");
    expect((await changeStateAction(job.id, undefined, formData({ to: "delivered", handedTo: "Wren Halloway" }))).httpStatus).toBe(200);
    expect((await jobRow(job.id)).state).toBe("delivered");
    const [delivery] = await testDb.select().from(schema.deliveries).where(eq(schema.deliveries.jobId, job.id));
    expect(delivery).toMatchObject({ handedTo: "Wren Halloway", handedOverById: tunerId, revisionNumber: 1 });
  });

  it("answers 409 to a move the state does not allow, naming the field, and moves nothing", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    for (const to of ["released", "delivered", "verified"]) {
      // A recipient is named so that delivering reaches the state check.
      const result = await changeStateAction(job.id, undefined, formData({ to, handedTo: "Wren Halloway" }));
      expect(result.httpStatus, to).toBe(409);
      expect(result.error?.to, to).toBeTruthy();
    }
    expect((await jobRow(job.id)).state).toBe("draft");
    expect(await testDb.select().from(schema.planRevisions)).toHaveLength(0);
  });

  it("answers 400 to a state that does not exist", async () => {
    const job = await makeJob("draft");
    await actAs("tuner");
    const result = await changeStateAction(job.id, undefined, formData({ to: "finished" }));
    expect(result.httpStatus).toBe(400);
    expect(result.error?.to).toBeTruthy();
  });

  it("answers 401 to nobody and 403 to a machinist, and the job stays where it is", async () => {
    const job = await makeJob("released");
    await actAs("anonymous");
    expect((await changeStateAction(job.id, undefined, formData({ to: "machining" }))).httpStatus).toBe(401);
    await actAs("machinist");
    expect((await changeStateAction(job.id, undefined, formData({ to: "machining" }))).httpStatus).toBe(403);
    expect((await jobRow(job.id)).state).toBe("released");
  });

  it("refuses to approve a job whose rack is empty, with the reason (409)", async () => {
    const job = await makeJob("draft", { useAllDrills: false });
    await actAs("tuner");
    const result = await changeStateAction(job.id, undefined, formData({ to: "planned" }));
    expect(result.httpStatus).toBe(409);
    expect(result.error?.[""]?.join(" ")).toMatch(/rack is empty/);
    expect((await jobRow(job.id)).state).toBe("draft");
  });
});
