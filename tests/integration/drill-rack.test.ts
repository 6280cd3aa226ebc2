// The drill rack: ticking and unticking through the actions, a whole series at once, and the solver
// picking from the rack as it stands at the moment it solves.
import { beforeEach, describe, expect, it } from "vitest";
import { setDrillStockedAction, setDrillSystemStockedAction } from "@/app/(office)/shop/drills/actions";
import { listStockedLabels } from "@/db/drill-stock";
import { solveJob } from "@/lib/jobs/approve";
import * as schema from "@/db/schema";
import { actAs, formData, resetDatabase, testDb } from "./support/database";
import { makeJob } from "./support/jobs";

beforeEach(resetDatabase);

const stock = (label: string, stocked: boolean) => setDrillStockedAction(undefined, formData({ label, stocked: String(stocked) }));
const stockSystem = (system: string, stocked: boolean) => setDrillSystemStockedAction(undefined, formData({ system, stocked: String(stocked) }));

describe("setDrillStockedAction", () => {
  it("puts a drill on the rack and takes it off again, each with an audit line", async () => {
    await actAs("admin");
    expect((await stock("#43", true)).httpStatus).toBe(200);
    expect((await stock("1/8", true)).httpStatus).toBe(200);
    expect([...(await listStockedLabels())].sort()).toEqual(["#43", "1/8"]);
    // Ticking twice is harmless.
    expect((await stock("#43", true)).httpStatus).toBe(200);
    expect((await stock("#43", false)).httpStatus).toBe(200);
    expect([...(await listStockedLabels())]).toEqual(["1/8"]);
    const audit = await testDb.select({ action: schema.auditEvents.action, subject: schema.auditEvents.subjectId }).from(schema.auditEvents);
    expect(audit.filter((a) => a.subject === "#43").map((a) => a.action)).toEqual(["drill.stock", "drill.stock", "drill.unstock"]);
  });

  it("answers 400 naming the field for a drill that is not standard or a missing choice, changing nothing", async () => {
    await actAs("admin");
    const unknown = await stock("#99", true);
    expect(unknown.httpStatus).toBe(400);
    expect(Object.keys(unknown.error ?? {})).toEqual(["label"]);
    const vague = await setDrillStockedAction(undefined, formData({ label: "#43", stocked: "maybe" }));
    expect(vague.httpStatus).toBe(400);
    expect(Object.keys(vague.error ?? {})).toEqual(["stocked"]);
    expect((await listStockedLabels()).size).toBe(0);
  });

  it("lets only an admin change the rack: anonymous 401, machinist and tuner 403", async () => {
    for (const [actor, status] of [
      ["anonymous", 401],
      ["machinist", 403],
      ["tuner", 403],
    ] as const) {
      await actAs(actor);
      expect((await stock("#43", true)).httpStatus, actor).toBe(status);
    }
    expect((await listStockedLabels()).size).toBe(0);
  });
});

describe("setDrillSystemStockedAction", () => {
  it("stocks and clears one whole series, leaving the others as they were", async () => {
    await actAs("admin");
    await stock("#43", true);
    expect((await stockSystem("letter", true)).httpStatus).toBe(200);
    const stocked = await listStockedLabels();
    // ASME B94.11M letter drills run A to Z: 26 sizes.
    expect([...stocked].filter((l) => /^[A-Z]$/.test(l))).toHaveLength(26);
    expect(stocked.size).toBe(27);
    expect((await stockSystem("letter", false)).httpStatus).toBe(200);
    expect([...(await listStockedLabels())]).toEqual(["#43"]);
  });

  it("answers 400 on an unknown series, 401 anonymous and 403 for a tuner, changing nothing", async () => {
    await actAs("admin");
    const bad = await stockSystem("wire-gauge", true);
    expect(bad.httpStatus).toBe(400);
    expect(Object.keys(bad.error ?? {})).toEqual(["system"]);
    await actAs("anonymous");
    expect((await stockSystem("number", true)).httpStatus).toBe(401);
    await actAs("tuner");
    expect((await stockSystem("number", true)).httpStatus).toBe(403);
    expect((await listStockedLabels()).size).toBe(0);
  });
});

describe("the solver and the rack", () => {
  it("picks holes only from the drills on the rack at the moment it solves", async () => {
    const job = await makeJob("draft", { useAllDrills: false });
    await actAs("admin");
    await stock("#43", true);
    const drillsUsed = async () =>
      new Set((await solveJob(job.id)).blocks.flatMap((b) => b.stages.flatMap((s) => s.candidates.map((c) => c.drill.label))));
    expect(await drillsUsed()).toEqual(new Set(["#43"]));
    await stock("1/16", true);
    await stock("#43", false);
    expect(await drillsUsed()).toEqual(new Set(["1/16"]));
  });
});
