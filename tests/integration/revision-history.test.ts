// An approved revision's record never changes afterwards: its traveler, bench page and revision page print the
// customer's and the people's names as they were when it was approved and released, whatever is renamed later.
import { execFile } from "node:child_process";
import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { promisify } from "node:util";
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { getBenchView } from "@/db/bench";
import { updateCustomer } from "@/db/customers";
import { getJob } from "@/db/jobs";
import { getRevisionSnapshot } from "@/db/revisions";
import * as schema from "@/db/schema";
import { getTravelerData } from "@/lib/traveler/data";
import { renderTravelerPdf } from "@/lib/traveler/pdf/render-traveler";
import { actAs, resetDatabase, testDb } from "./support/database";
import { blockIdOf, makeJob } from "./support/jobs";

const run = promisify(execFile);
let dir: string;
let fileCount = 0;

beforeAll(async () => {
  dir = await mkdtemp(path.join(tmpdir(), "blockwright-history-"));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});
beforeEach(resetDatabase);

// One moment for every print, so two prints of the same record differ only if the record does.
const PRINTED_AT = new Date("2026-03-02T12:00:00Z");

/** The text of the block's traveler in revision 1, printed as the office prints it. */
async function travelerText(blockId: string): Promise<string> {
  const tuner = { id: (await actAs("tuner"))!, role: "tuner" as const };
  const data = await getTravelerData(tuner, { blockId, revision: 1 });
  const file = path.join(dir, `traveler-${++fileCount}.pdf`);
  await writeFile(file, await renderTravelerPdf(data, { paper: "letter", timeZone: "UTC", printedAt: PRINTED_AT }));
  return (await run("pdftotext", ["-layout", file, "-"])).stdout;
}

/** Renames the job's customer through the store, and the demo tuner (who approved and released the job). */
async function renameCustomerAndTuner(jobId: string) {
  const admin = (await actAs("admin"))!;
  const [job] = await testDb.select({ customerId: schema.jobs.customerId, tunerId: schema.jobs.tunerId }).from(schema.jobs).where(eq(schema.jobs.id, jobId));
  expect(await updateCustomer(admin, job!.customerId, { name: "Wren Halloway-Oduya" })).toBeTruthy();
  await testDb.update(schema.users).set({ name: "Mara Quillon-Brandt" }).where(eq(schema.users.id, job!.tunerId));
}

describe("an approved revision's record", () => {
  it("prints the same traveler after the customer and the tuner are renamed", async () => {
    const job = await makeJob("released");
    const blockId = await blockIdOf(job.id, "primary");
    const before = await travelerText(blockId);
    // The demo job's customer, and the demo tuner who approved and released it.
    expect(before).toContain("Wren Halloway");
    expect(before).toContain("Mara Quillon");

    await renameCustomerAndTuner(job.id);
    const after = await travelerText(blockId);
    expect(after).toBe(before);
    expect(after).not.toContain("Halloway-Oduya");
    expect(after).not.toContain("Quillon-Brandt");
  });

  it("shows the bench and the revision page the names as approved, while the job itself carries the new ones", async () => {
    const job = await makeJob("released");
    const blockId = await blockIdOf(job.id, "secondary");
    await renameCustomerAndTuner(job.id);

    const machinist = { id: (await actAs("machinist"))!, role: "machinist" as const };
    const bench = await getBenchView(machinist, blockId);
    expect(bench?.job.customer).toBe("Wren Halloway");
    expect(bench?.job.tuner).toBe("Mara Quillon");
    expect(bench?.job.carburetor).toBe("Four-barrel, vacuum secondaries, blow-through hat");

    const revision = await getRevisionSnapshot(job.id, 1);
    expect(revision?.names).toEqual({ customer: "Wren Halloway", tuner: "Mara Quillon", approvedBy: "Mara Quillon", releasedBy: "Mara Quillon" });

    const tuner = { id: (await actAs("tuner"))!, role: "tuner" as const };
    const record = await getJob(tuner, job.id);
    expect(record?.revisions.find((r) => r.number === 1)?.approvedBy).toBe("Mara Quillon");
    // The working job is not history: it names the customer as the customer is called now.
    expect(record?.customer.name).toBe("Wren Halloway-Oduya");
  });

  it("keeps the carburetor as approved on the bench after the working inputs change", async () => {
    const job = await makeJob("released");
    const blockId = await blockIdOf(job.id, "primary");
    await testDb.update(schema.jobs).set({ carburetor: "Two-barrel, mechanical secondaries" }).where(eq(schema.jobs.id, job.id));
    const machinist = { id: (await actAs("machinist"))!, role: "machinist" as const };
    expect((await getBenchView(machinist, blockId))?.job.carburetor).toBe("Four-barrel, vacuum secondaries, blow-through hat");
  });

  it("reads a revision approved before names were kept from the rows it points at, without rewriting it", async () => {
    const job = await makeJob("released");
    const blockId = await blockIdOf(job.id, "primary");
    // A snapshot as revisions kept it before: job, blocks and plan, no names.
    await testDb.update(schema.planRevisions).set({ snapshot: sql`${schema.planRevisions.snapshot} - 'names'` }).where(eq(schema.planRevisions.jobId, job.id));
    const [kept] = await testDb.select({ snapshot: schema.planRevisions.snapshot }).from(schema.planRevisions).where(eq(schema.planRevisions.jobId, job.id));
    await renameCustomerAndTuner(job.id);

    const text = await travelerText(blockId);
    expect(text).toContain("Wren Halloway-Oduya");
    expect(text).toContain("Mara Quillon-Brandt");
    const machinist = { id: (await actAs("machinist"))!, role: "machinist" as const };
    expect((await getBenchView(machinist, blockId))?.job.customer).toBe("Wren Halloway-Oduya");
    expect((await getRevisionSnapshot(job.id, 1))?.names).toEqual({
      customer: "Wren Halloway-Oduya",
      tuner: "Mara Quillon-Brandt",
      approvedBy: "Mara Quillon-Brandt",
      releasedBy: "Mara Quillon-Brandt",
    });
    const [after] = await testDb.select({ snapshot: schema.planRevisions.snapshot }).from(schema.planRevisions).where(eq(schema.planRevisions.jobId, job.id));
    expect(after!.snapshot).toEqual(kept!.snapshot);
  });
});
