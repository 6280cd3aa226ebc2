// Who a job belongs to, and who keeps the shop: a tuner cannot put work in someone else's name through the
// API, and two admins deactivated at the same moment still leave one.
import { and, eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { POST as createJobRoute } from "@/app/api/jobs/route";
import { PATCH as patchJobRoute } from "@/app/api/jobs/[id]/route";
import { changeAccount, createAccount } from "@/lib/auth/accounts";
import { RequestRefusal } from "@/db/refusal";
import * as schema from "@/db/schema";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { jobBody, makeJob } from "./support/jobs";
import { tableCounts } from "./support/state-changing-routes";

beforeEach(resetDatabase);

async function secondTuner(): Promise<string> {
  const adminId = (await actAs("admin"))!;
  const other = await createAccount(adminId, { email: "wren.tuner@blockwright.test", name: "Wren Ostby", role: "tuner", password: "quiet-lathe-harbor-91" });
  return other.id;
}

describe("a tuner and other people's names", () => {
  it("cannot open a job in another tuner's name (403 on tunerId), and nothing is saved", async () => {
    const otherId = await secondTuner();
    await actAs("tuner");
    const before = await tableCounts();
    const response = await createJobRoute(jsonRequest("/api/jobs", "POST", jobBody({ tunerId: otherId })));
    expect(response.status).toBe(403);
    expect((await response.json()).error.field).toBe("tunerId");
    expect(await tableCounts()).toEqual(before);
  });

  it("cannot reassign a job to another tuner (403), and the job keeps its tuner", async () => {
    const otherId = await secondTuner();
    const job = await makeJob("draft");
    const tunerId = await actAs("tuner");
    const response = await patchJobRoute(jsonRequest(`/api/jobs/${job.id}`, "PATCH", { tunerId: otherId }), { params: Promise.resolve({ id: job.id }) });
    expect(response.status).toBe(403);
    const [row] = await testDb.select({ tunerId: schema.jobs.tunerId }).from(schema.jobs).where(eq(schema.jobs.id, job.id));
    expect(row!.tunerId).toBe(tunerId);
  });

  it("an admin may assign a job to any active tuner", async () => {
    const otherId = await secondTuner();
    await actAs("admin");
    const response = await createJobRoute(jsonRequest("/api/jobs", "POST", jobBody({ tunerId: otherId })));
    expect(response.status).toBe(201);
  });
});

describe("the last admin", () => {
  it("two admins deactivated at the same moment leave one active admin", async () => {
    const firstId = (await actAs("admin"))!;
    const second = await createAccount(firstId, { email: "kit.admin@blockwright.test", name: "Kit Arnaud", role: "admin", password: "quiet-lathe-harbor-91" });
    // Called below the route: the route would answer the second call 401 once its own admin is deactivated.
    const deactivate = (id: string) =>
      changeAccount(firstId, { userId: id, active: false }).then(
        () => 200,
        (error: unknown) => (error instanceof RequestRefusal ? error.status : 500),
      );
    for (let round = 0; round < 5; round++) {
      const statuses = (await Promise.all([deactivate(firstId), deactivate(second.id)])).sort();
      expect(statuses).toEqual([200, 409]);
      const admins = await testDb
        .select({ id: schema.users.id })
        .from(schema.users)
        .where(and(eq(schema.users.role, "admin"), eq(schema.users.active, true)));
      expect(admins).toHaveLength(1);
      // Put both back for the next round.
      await testDb.update(schema.users).set({ active: true }).where(eq(schema.users.role, "admin"));
    }
  });
});
