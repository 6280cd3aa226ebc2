// Releasing a revision whose plan needs a drill that has left the rack since approval: the release goes ahead
// (the plan was approved on that rack) and the answer says which drill, through the API, the job page's action
// and the notice the job page keeps while the bench works from that revision.
import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { changeStateAction } from "@/app/(office)/jobs/[id]/actions";
import { POST as stateRoute } from "@/app/api/jobs/[id]/state/route";
import { setDrillStocked, setSystemStocked } from "@/db/drill-stock";
import * as schema from "@/db/schema";
import { revisionOffRackDrills } from "@/lib/jobs/drill-rack-check";
import { actAs, formData, jsonRequest, resetDatabase, testDb } from "./support/database";
import { makeJob } from "./support/jobs";

beforeEach(resetDatabase);

/** Every standard drill on the rack, as a well-kept shop has it. */
async function stockEverything() {
  const admin = (await actAs("admin"))!;
  for (const system of ["number", "letter", "fraction", "metric"] as const) await setSystemStocked(admin, system, true);
}

/** The drill the revision's plug operation names on the primary block. */
async function plugDrillOf(jobId: string): Promise<string> {
  const [op] = await testDb
    .select({ parameters: schema.operations.parameters })
    .from(schema.operations)
    .innerJoin(schema.meteringBlocks, eq(schema.meteringBlocks.id, schema.operations.blockId))
    .where(and(eq(schema.meteringBlocks.jobId, jobId), eq(schema.meteringBlocks.side, "primary"), eq(schema.operations.kind, "plug")));
  return String((op!.parameters as Record<string, unknown>).drill);
}

const release = (jobId: string) => stateRoute(jsonRequest(`/api/jobs/${jobId}/state`, "POST", { to: "released" }), { params: Promise.resolve({ id: jobId }) });

async function jobState(jobId: string) {
  const [row] = await testDb.select({ state: schema.jobs.state }).from(schema.jobs).where(eq(schema.jobs.id, jobId));
  return row!.state;
}

describe("releasing with a drill off the rack", () => {
  it("releases, and the API's answer warns about the drill by name", async () => {
    await stockEverything();
    const job = await makeJob("planned", { useAllDrills: false });
    // The demo primary's 0.085 in passage takes #4-40 on a #43 drill (handbook tap-drill table; common practice).
    const drill = await plugDrillOf(job.id);
    expect(drill).toBe("#43");
    await setDrillStocked((await actAs("admin"))!, drill, false);

    await actAs("tuner");
    const response = await release(job.id);
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body).toMatchObject({ state: "released", revision: 1 });
    expect(body.warnings).toHaveLength(1);
    expect(body.warnings[0]).toMatchObject({ code: "drill_not_stocked", drill: "#43" });
    expect(body.warnings[0].message).toContain("#43");
    expect(body.warnings[0].message).toMatch(/primary block, operation \d+/);
    expect(await jobState(job.id)).toBe("released");
  });

  it("releases with no warning when every drill the plan uses is on the rack", async () => {
    await stockEverything();
    const job = await makeJob("planned", { useAllDrills: false });
    await actAs("tuner");
    const response = await release(job.id);
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({ state: "released", revision: 1, warnings: [] });
  });

  it("says nothing for a job that may use every standard drill, whatever the rack holds", async () => {
    const job = await makeJob("planned", { useAllDrills: true });
    expect(await testDb.select().from(schema.stockedDrills)).toHaveLength(0);
    await actAs("tuner");
    const response = await release(job.id);
    expect(response.status).toBe(200);
    expect((await response.json()).warnings).toEqual([]);
  });

  it("tells the job page's action in its status message", async () => {
    await stockEverything();
    const job = await makeJob("planned", { useAllDrills: false });
    await setDrillStocked((await actAs("admin"))!, "#43", false);
    await actAs("tuner");
    const result = await changeStateAction(job.id, undefined, formData({ to: "released" }));
    expect(result.httpStatus).toBe(200);
    expect(result.message).toMatch(/^The job is released\. Drill #43 is not on the rack/);
    expect(result.data?.warnings.map((w) => w.drill)).toEqual(["#43"]);
    expect(await jobState(job.id)).toBe("released");
  });

  it("keeps the job page's notice while the drill is off the rack, and drops it once the drill is back", async () => {
    await stockEverything();
    const job = await makeJob("released", { useAllDrills: false });
    expect(await revisionOffRackDrills(job.id, 1)).toEqual([]);
    const admin = (await actAs("admin"))!;
    await setDrillStocked(admin, "#43", false);
    expect((await revisionOffRackDrills(job.id, 1)).map((w) => w.drill)).toEqual(["#43"]);
    await setDrillStocked(admin, "#43", true);
    expect(await revisionOffRackDrills(job.id, 1)).toEqual([]);
  });
});
