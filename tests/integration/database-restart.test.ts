// The app rides out a database restart: while PostgreSQL is down, requests are answered 503 (to be tried again)
// within seconds, never 500 and never hanging; what was answered 201 is stored; and once the server is back the
// same process answers again by itself (its pool connects anew). The restart happens on a cluster of this file's
// own, never on the shared one the other test files use.
import { and, eq, inArray } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import * as schema from "@/db/schema";
import { closeDb } from "@/db/client";
import { migrateDatabase } from "@/db/migrate";
import { stopMailQueue } from "@/lib/server/mail-queue";
import { startThrowawayCluster, type ThrowawayCluster } from "./support/throwaway-cluster";

type Planned = { key: string; quantity: "length" | "pressure"; plannedSi: number };
type Operation = { id: string; measurements: unknown };

interface Attempt {
  operationId: string;
  startedAt: number;
  endedAt: number;
  status: number;
  body: { error?: { code?: string; message?: string } };
  retryAfter: string | null;
}

/** A steady load: one sign-off every this many milliseconds, each started whether or not the last has answered. */
const INTERVAL_MS = 100;
/** No request may take longer than this, whatever the database is doing. */
const LONGEST_MS = 10_000;

let cluster: ThrowawayCluster | undefined;
const sharedUrl = process.env.DATABASE_URL;
let support: typeof import("./support/database");
let signOffRoute: typeof import("@/app/api/operations/[id]/sign-off/route").POST;
const operations: Operation[] = [];

beforeAll(async () => {
  cluster = await startThrowawayCluster("blockwright_restart");
  await migrateDatabase(cluster.url);
  // Before anything opens a pool or reads the configuration: this file's data layer works on the throwaway cluster.
  process.env.DATABASE_URL = cluster.url;
  support = await import("./support/database");
  const { makeJob } = await import("./support/jobs");
  signOffRoute = (await import("@/app/api/operations/[id]/sign-off/route")).POST;
  await support.resetDatabase();
  // Enough released work that every request of the run signs an operation of its own.
  while (operations.length < 120) {
    const job = await makeJob("released");
    operations.push(
      ...(await support.testDb
        .select({ id: schema.operations.id, measurements: schema.operations.measurements })
        .from(schema.operations)
        .innerJoin(schema.planRevisions, eq(schema.planRevisions.id, schema.operations.revisionId))
        .where(and(eq(schema.planRevisions.jobId, job.id), eq(schema.planRevisions.status, "current")))),
    );
  }
}, 120_000);

afterAll(async () => {
  // A job signed to the end queues its notice: the queue's connections go first, while the server still answers.
  await stopMailQueue();
  await closeDb();
  await cluster?.remove();
  process.env.DATABASE_URL = sharedUrl;
});

/** Readings exactly on plan, in the bench's units. */
function onPlan(planned: Planned[]) {
  return planned.map((m) =>
    m.quantity === "length"
      ? { key: m.key, value: m.plannedSi / 0.0254, unit: "in" } // 1 in = 0.0254 m exactly
      : { key: m.key, value: m.plannedSi / 6894.757, unit: "psi" }, // NIST SP 811: 1 psi = 6894.757 Pa
  );
}

async function signOff(operation: Operation): Promise<Attempt> {
  const startedAt = Date.now();
  const response = await signOffRoute(
    support.jsonRequest(`/api/operations/${operation.id}/sign-off`, "POST", { readings: onPlan(operation.measurements as Planned[]) }),
    { params: Promise.resolve({ id: operation.id }) },
  );
  return {
    operationId: operation.id,
    startedAt,
    endedAt: Date.now(),
    status: response.status,
    body: (await response.json()) as Attempt["body"],
    retryAfter: response.headers.get("retry-after"),
  };
}

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

describe("a database restart under load", () => {
  it("answers 503 while the database is down, loses nothing it answered 201, and recovers by itself", async () => {
    await support.actAs("machinist");
    const attempts: Promise<Attempt>[] = [];
    let next = 0;
    let stop = false;
    const load = (async () => {
      while (!stop && next < operations.length) {
        attempts.push(signOff(operations[next++]!));
        await pause(INTERVAL_MS);
      }
    })();

    await pause(1_000);
    const restartStarted = Date.now();
    await cluster!.restart();
    const restartEnded = Date.now();
    // The load goes on after the server is back: long enough to see the pool connect again, and then some.
    const recoveredBy = restartEnded + LONGEST_MS;
    let recoveredAt: number | undefined;
    while (Date.now() < recoveredBy && next < operations.length) {
      const settled = await Promise.all(attempts);
      recoveredAt = settled.find((a) => a.startedAt >= restartEnded && (a.status === 201 || a.status === 200))?.endedAt;
      if (recoveredAt !== undefined && Date.now() > recoveredAt + 1_500) break;
      await pause(200);
    }
    stop = true;
    await load;
    const settled = await Promise.all(attempts);

    // Nothing failed as a fault of the server, and nothing hung.
    const statuses = new Set(settled.map((a) => a.status));
    expect([...statuses].filter((status) => ![200, 201, 503].includes(status))).toEqual([]);
    for (const attempt of settled) expect(attempt.endedAt - attempt.startedAt).toBeLessThan(LONGEST_MS);

    // The outage was seen, and told as such: a 503 to try again, with the wait.
    const refused = settled.filter((a) => a.status === 503);
    expect(refused.length).toBeGreaterThan(0);
    for (const attempt of refused) {
      // Refused because of the restart, not before it.
      expect(attempt.endedAt).toBeGreaterThanOrEqual(restartStarted);
      expect(attempt.body.error).toEqual({ code: "unavailable", message: "The shop's database is not answering; try again shortly." });
      expect(attempt.retryAfter).toBe("5");
    }

    // The same process answers again within 10 s of the server being back, and keeps answering.
    expect(recoveredAt).toBeDefined();
    expect(recoveredAt! - restartEnded).toBeLessThan(LONGEST_MS);
    const afterRecovery = settled.filter((a) => a.startedAt > recoveredAt!);
    expect(afterRecovery.length).toBeGreaterThan(0);
    expect(afterRecovery.filter((a) => a.status !== 201)).toEqual([]);

    // Every sign-off answered 201 was stored.
    const recorded = settled.filter((a) => a.status === 201).map((a) => a.operationId);
    expect(recorded.length).toBeGreaterThan(0);
    const stored = await support.testDb
      .select({ operationId: schema.signOffs.operationId })
      .from(schema.signOffs)
      .where(inArray(schema.signOffs.operationId, recorded));
    expect(new Set(stored.map((row) => row.operationId))).toEqual(new Set(recorded));
  }, 90_000);
});
