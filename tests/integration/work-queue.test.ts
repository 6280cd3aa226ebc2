// The home pages' work queues: GET /api/work-queue answers each role its own lists.
import { beforeEach, describe, expect, it } from "vitest";
import { and, asc, eq } from "drizzle-orm";
import { GET as queueRoute } from "@/app/api/work-queue/route";
import * as schema from "@/db/schema";
import { signOffOperation } from "@/db/bench";
import { setDrillStocked } from "@/db/drill-stock";
import { approveRevision } from "@/lib/jobs/approve";
import type { AdminQueue, MachinistQueue, TunerQueue } from "@/lib/work-queue/types";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { blockIdOf, makeJob } from "./support/jobs";

beforeEach(resetDatabase);

const readQueue = () => queueRoute(jsonRequest("/api/work-queue", "GET"), { params: Promise.resolve({}) });

async function currentOperations(jobId: string, blockId: string) {
  return testDb
    .select({ id: schema.operations.id, number: schema.operations.number, title: schema.operations.title, measurements: schema.operations.measurements })
    .from(schema.operations)
    .innerJoin(schema.planRevisions, eq(schema.planRevisions.id, schema.operations.revisionId))
    .where(and(eq(schema.planRevisions.jobId, jobId), eq(schema.planRevisions.status, "current"), eq(schema.operations.blockId, blockId)))
    .orderBy(asc(schema.operations.number));
}

type Planned = { key: string; label: string; quantity: "length" | "pressure"; plannedSi: number; maxSi: number };

/** Signs the first operation of the block that asks for a reading, with every reading twice the planned maximum. */
async function signOneOutOfPlan(jobId: string, blockId: string) {
  const ops = await currentOperations(jobId, blockId);
  const measured = ops.find((op) => (op.measurements as Planned[]).length > 0)!;
  const readings = Object.fromEntries((measured.measurements as Planned[]).map((m) => [m.key, m.maxSi * 2]));
  const machinistId = (await actAs("machinist"))!;
  await signOffOperation({ id: machinistId, role: "machinist" }, { operationId: measured.id, measurements: readings, note: "" });
  return { operation: measured, total: ops.length };
}

describe("who may read a work queue", () => {
  it("answers 401 to nobody signed in, before anything is read", async () => {
    await actAs("anonymous");
    const response = await readQueue();
    expect(response.status).toBe(401);
    expect((await response.json()).error.code).toBe("unauthenticated");
  });

  it("answers a deactivated account 401 like nobody signed in", async () => {
    const id = await actAs("tuner");
    await testDb.update(schema.users).set({ active: false }).where(eq(schema.users.id, id!));
    const response = await readQueue();
    expect(response.status).toBe(401);
  });

  it("answers each role its own queue", async () => {
    for (const role of ["tuner", "machinist", "admin"] as const) {
      await actAs(role);
      const response = await readQueue();
      expect(response.status).toBe(200);
      expect((await response.json()).role).toBe(role);
    }
  });
});

describe("the tuner's queue", () => {
  it("lists drafts, plans with warnings, failed readings, work to deliver and logs waiting", async () => {
    const calm = await makeJob("draft");
    // Far past what the demo stages were sized for: 20 psi with a much richer peak target leaves the top of the
    // boost range lean beyond 10 %, a danger.
    const lean = await makeJob("draft", { peakBoost: { value: 20, unit: "psi" }, targetLambdaPeak: 0.7 });
    const bare = await makeJob("draft");
    await testDb.delete(schema.meteringBlocks).where(eq(schema.meteringBlocks.jobId, bare.id));
    const held = await makeJob("released");
    const heldBlock = await blockIdOf(held.id, "primary");
    const { operation } = await signOneOutOfPlan(held.id, heldBlock);
    const done = await makeJob("released");
    await testDb.update(schema.jobs).set({ state: "verified" }).where(eq(schema.jobs.id, done.id));
    const tunerId = (await actAs("tuner"))!;
    const logRow = {
      jobId: held.id,
      fileName: "pull-3.csv",
      byteSize: 100,
      mapping: {},
      totalRows: 10,
      usedRows: 10,
      setAside: {},
      rejected: [],
      rejectedCount: 0,
      analysis: {},
      uploadedById: tunerId,
    };
    await testDb.insert(schema.tuningLogs).values([
      { ...logRow, revisionNumber: 1, storageKey: "logs/waiting" },
      { ...logRow, revisionNumber: 1, storageKey: "logs/accepted", fileName: "pull-1.csv", acceptedAt: new Date(), acceptedById: tunerId },
      { ...logRow, revisionNumber: 0, storageKey: "logs/older", fileName: "pull-0.csv" },
    ]);

    const response = await readQueue();
    expect(response.status).toBe(200);
    const queue = (await response.json()) as TunerQueue;
    expect(queue.role).toBe("tuner");
    expect(queue.drafts.map((d) => d.id).sort()).toEqual([calm.id, lean.id, bare.id].sort());
    expect(queue.drafts.find((d) => d.id === bare.id)!.problem).toMatch(/metering blocks/);
    expect(queue.drafts.find((d) => d.id === calm.id)!.problem).toBeNull();
    expect(queue.draftsChecked).toBe(3);

    // The lean plan carries a danger (approval refuses it without an acknowledgement); the demo plan has only a
    // caution, below the levels the queue lists.
    await expect(approveRevision({ id: tunerId, role: "tuner" }, lean.id)).rejects.toThrow(/danger/);
    expect(queue.planWarnings.map((p) => p.job.id)).toEqual([lean.id]);
    expect(queue.planWarnings[0]!.warnings[0]!.level).toBe("danger");

    expect(queue.held).toHaveLength((operation.measurements as Planned[]).length);
    const reading = queue.held[0]!;
    expect(reading.job.id).toBe(held.id);
    expect(reading.operation).toBe(`${operation.number} ${operation.title}`);
    expect(reading.benchHref).toBe(`/bench/${heldBlock}?revision=1`);
    const planned = (operation.measurements as Planned[])[0]!;
    expect(reading.reading.startsWith(`${planned.label}: `)).toBe(true);
    expect(reading.planned).toMatch(/ to /);

    expect(queue.toDeliver.map((j) => j.id)).toEqual([done.id]);
    expect(queue.logs.map((l) => l.fileName)).toEqual(["pull-3.csv"]);
    expect(queue.logs[0]!.href).toMatch(new RegExp(`^/jobs/${held.id}/logs/`));
  });

  it("leaves out another tuner's work", async () => {
    await makeJob("draft");
    const adminId = await actAs("admin");
    await testDb.update(schema.jobs).set({ tunerId: adminId! });
    await actAs("tuner");
    const queue = (await (await readQueue()).json()) as TunerQueue;
    expect(queue.drafts).toEqual([]);
  });
});

describe("the machinist's queue", () => {
  it("lists released blocks not started, blocks in progress with operations left, and recent sign-offs", async () => {
    await makeJob("draft");
    const fresh = await makeJob("released");
    const started = await makeJob("released");
    const startedBlock = await blockIdOf(started.id, "primary");
    const { operation, total } = await signOneOutOfPlan(started.id, startedBlock);

    const queue = (await (await readQueue()).json()) as MachinistQueue;
    expect(queue.role).toBe("machinist");
    const freshBlocks = [await blockIdOf(fresh.id, "primary"), await blockIdOf(fresh.id, "secondary")];
    const startedSecondary = await blockIdOf(started.id, "secondary");
    expect(queue.notStarted.map((b) => b.href).sort()).toEqual(
      [...freshBlocks, startedSecondary].map((id) => `/bench/${id}?revision=1`).sort(),
    );
    expect(queue.notStarted.every((b) => b.operationsLeft === b.operations)).toBe(true);
    expect(queue.inProgress).toHaveLength(1);
    expect(queue.inProgress[0]).toMatchObject({ href: `/bench/${startedBlock}?revision=1`, operations: total, operationsLeft: total - 1, side: "primary" });
    expect(queue.recent).toHaveLength(1);
    expect(queue.recent[0]).toMatchObject({ operationId: operation.id, href: `/bench/${startedBlock}?revision=1`, revision: 1 });

    // Sent back to draft (a correction from a log), the job leaves the bench's sight and the queue with it.
    await testDb.update(schema.jobs).set({ state: "draft" }).where(eq(schema.jobs.id, started.id));
    const after = (await (await readQueue()).json()) as MachinistQueue;
    expect(after.recent).toEqual([]);
    expect(after.inProgress).toEqual([]);
  });
});

describe("the admin's queue", () => {
  it("counts jobs by state this week, lists the longest waiting and the people and rack changes", async () => {
    const old = await makeJob("draft");
    await makeJob("released");
    await testDb.update(schema.jobs).set({ updatedAt: new Date("2020-01-01T00:00:00Z") }).where(eq(schema.jobs.id, old.id));
    const adminId = (await actAs("admin"))!;
    await setDrillStocked(adminId, "#43", true);
    await setDrillStocked(adminId, "#43", false);

    const queue = (await (await readQueue()).json()) as AdminQueue;
    expect(queue.role).toBe("admin");
    const counts = Object.fromEntries(queue.byState.map((s) => [s.state, s.jobs]));
    expect(counts).toEqual({ draft: 0, planned: 0, released: 1, machining: 0, held: 0, verified: 0, delivered: 0 });
    expect(queue.longestWaiting[0]!.id).toBe(old.id);
    expect(queue.longestWaiting[0]!.tuner).toBe("Mara Quillon");
    expect(queue.changes.map((c) => c.what)).toEqual(["Took drill #43 off the rack", "Put drill #43 on the rack"]);
    expect(queue.changes[0]!.actor).toBe("Avery Lindqvist");
  });
});
