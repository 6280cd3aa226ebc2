// Back from the dyno: a log read against the released revision, its corrections, and the next revision.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { GET as listRoute, POST as uploadRoute } from "@/app/api/jobs/[id]/logs/route";
import { POST as previewRoute } from "@/app/api/jobs/[id]/logs/preview/route";
import { GET as analysisRoute } from "@/app/api/jobs/[id]/logs/[logId]/analysis/route";
import { POST as acceptRoute } from "@/app/api/jobs/[id]/logs/[logId]/accept/route";
import { GET as planRoute } from "@/app/api/jobs/[id]/plan/route";
import * as schema from "@/db/schema";
import { approveRevision } from "@/lib/jobs/approve";
import { getTravelerData } from "@/lib/traveler/data";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { startS3Fake, type S3Fake } from "./support/fakes";
import { blockIdOf, makeJob } from "./support/jobs";

let s3: S3Fake;
beforeAll(async () => {
  s3 = await startS3Fake();
});
afterAll(async () => s3.stop());
beforeEach(resetDatabase);

// The fixture job (support/jobs.ts): 8 psi peak, target lambda 0.86 from peak boost up, cruise lambda 1.0 (the
// default), stages opening at 6.5 inHg vacuum (primary, part throttle), 3 psi (primary, full) and 7 psi
// (secondary, full). Ambient is the standard atmosphere, 101.325 kPa.
// Absolute manifold pressures, worked by hand (1 psi = 6.894757 kPa, 1 inHg = 3.386389 kPa; NIST SP 811):
//   9.2 psi gauge  = 63.432 kPa + 101.325 = 164.757 kPa absolute (above peak: target 0.86)
//   10 inHg vacuum = 101.325 - 33.864     =  67.461 kPa absolute (below the vacuum valve: cruise, target 1.0)
const BOOST_ROW = "164,757;0,92;5200;98";
const CRUISE_ROW = "67,461;1,00;2400;20";
function dynoLog(): string {
  const lines = ["MAP [kPa];Lambda;RPM;TPS"];
  for (let i = 0; i < 8; i++) lines.push(CRUISE_ROW.replace("2400", String(2400 + i * 10)));
  lines.push("67,461;abc;2500;20"); // line 10: not a number
  for (let i = 0; i < 8; i++) lines.push(BOOST_ROW.replace("5200", String(5200 + i * 50)));
  lines.push("164,757;3,10;5700;98"); // line 19: lambda beyond what a wideband reads
  return lines.join("\n") + "\n";
}
const MAPPING = {
  pressure: { column: "MAP [kPa]", unit: "kPa", reference: "absolute" },
  mixture: { column: "Lambda", kind: "lambda" },
  rpm: { column: "RPM" },
  throttle: { column: "TPS" },
};

const params = (id: string, logId?: string) => ({ params: Promise.resolve<Record<string, string>>(logId ? { id, logId } : { id }) });

function uploadRequest(jobId: string, csv: string, mapping: unknown = MAPPING, path = "logs"): Request {
  const form = new FormData();
  form.set("file", new Blob([csv], { type: "text/csv" }), "dyno-pull-3.csv");
  if (mapping !== undefined) form.set("mapping", typeof mapping === "string" ? mapping : JSON.stringify(mapping));
  return new Request(`http://127.0.0.1/api/jobs/${jobId}/${path}`, { method: "POST", body: form });
}

async function uploaded(jobId: string) {
  await actAs("tuner");
  const response = await uploadRoute(uploadRequest(jobId, dynoLog()), params(jobId));
  expect(response.status).toBe(201);
  return ((await response.json()) as { log: { id: string; rows: number; used: number; setAside: number; rejected: { line: number; reason: string }[] } }).log;
}

describe("POST /api/jobs/{id}/logs", () => {
  it("reads a semicolon, decimal-comma log and lists the refused rows by line", async () => {
    const job = await makeJob("released");
    const log = await uploaded(job.id);
    // 18 rows below the header: 8 cruise, 1 unreadable, 8 boost, 1 out of range.
    expect(log.rows).toBe(18);
    expect(log.used).toBe(16);
    expect(log.setAside).toBe(0);
    expect(log.rejected.map((r) => r.line)).toEqual([10, 19]);
    expect(log.rejected[0]!.reason).toContain("Lambda");
    expect(log.rejected[1]!.reason).toMatch(/lambda/i);
    expect(s3.storedObjects().some((name) => name.includes(`logs/${job.id}`) || name.includes(job.id))).toBe(true);
  });

  it("refuses before reading: a machinist (403), a draft job (409), a column the file lacks (400 naming it)", async () => {
    const released = await makeJob("released");
    await actAs("machinist");
    expect((await uploadRoute(uploadRequest(released.id, dynoLog()), params(released.id))).status).toBe(403);
    const draft = await makeJob("draft");
    await actAs("tuner");
    expect((await uploadRoute(uploadRequest(draft.id, dynoLog()), params(draft.id))).status).toBe(409);
    const wrong = await uploadRoute(uploadRequest(released.id, dynoLog(), { ...MAPPING, mixture: { column: "AFR", kind: "lambda" } }), params(released.id));
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).error.message).toMatch(/mapping\.mixture.*AFR/);
    const afrNoScale = await uploadRoute(uploadRequest(released.id, dynoLog(), { ...MAPPING, mixture: { column: "Lambda", kind: "afr" } }), params(released.id));
    expect((await afrNoScale.json()).error.field).toBe("mapping.mixture.scale");
    expect(await testDb.select().from(schema.tuningLogs)).toEqual([]);
  });

  it("previews the columns and remembers the mapping for the next file with the same header", async () => {
    const job = await makeJob("released");
    await actAs("tuner");
    const first = await (await previewRoute(uploadRequest(job.id, dynoLog(), undefined, "logs/preview"), params(job.id))).json();
    expect(first.preview.headers).toEqual(["MAP [kPa]", "Lambda", "RPM", "TPS"]);
    expect(first.preview.delimiter).toBe(";");
    expect(first.preview.decimalComma).toBe(true);
    expect(first.preview.remembered).toBeNull();
    await uploaded(job.id);
    const second = await (await previewRoute(uploadRequest(job.id, dynoLog(), undefined, "logs/preview"), params(job.id))).json();
    expect(second.preview.remembered).toEqual(MAPPING);
  });
});

describe("GET /api/jobs/{id}/logs/{logId}/analysis", () => {
  it("judges boost readings against the power target and cruise against the cruise target", async () => {
    const job = await makeJob("released");
    const log = await uploaded(job.id);
    await actAs("tuner");
    const response = await analysisRoute(new Request(`http://127.0.0.1/api/jobs/${job.id}/logs/${log.id}/analysis`), params(job.id, log.id));
    expect(response.status).toBe(200);
    const analysis = await response.json();
    const boost = analysis.bins.find((b: { mode: string; gaugePsi: number }) => b.mode === "full" && b.gaugePsi > 9);
    // All eight boost readings sit at 164.757 kPa: 9.2 psi gauge; the median of eight readings of 0.92 is 0.92.
    expect(boost).toMatchObject({ count: 8, lambda: 0.92, targetLambda: 0.86 });
    expect(boost.gaugePsi).toBeCloseTo(9.2, 2);
    const cruise = analysis.bins.find((b: { mode: string }) => b.mode === "part");
    expect(cruise).toMatchObject({ count: 8, lambda: 1, targetLambda: 1 });
    expect(cruise.gaugePsi).toBeCloseTo(-33.864 / 6.894757, 2); // 10 inHg of vacuum
    // Cruise on target: the main jets are fine.
    expect(analysis.jetAdvice).toBeNull();

    // The secondary stage (7 psi) is the last open at 9.2 psi in full throttle. Its change is
    // (0.92 / 0.86 - 1) x the whole area open there = 0.069767 x the area the plan supplies at full throttle
    // above 7 psi (read at peak boost, where the same valves are open).
    const { plan } = await (await planRoute(new Request(`http://127.0.0.1/api/jobs/${job.id}/plan`), params(job.id))).json();
    const openAtPeak = plan.sweep.full.at(-1).suppliedAreaIn2 as number;
    const secondary = analysis.corrections.find((c: { side: string }) => c.side === "secondary");
    expect(secondary.mode).toBe("full");
    expect(secondary.proposedAreaIn2 - secondary.currentAreaIn2).toBeCloseTo(0.069767 * openAtPeak, 5);
    expect(secondary.layout.count).toBeGreaterThan(0);
    expect(secondary.limitedBy === null || secondary.limitedBy === "rack").toBe(true);
    // No readings between 3 and 7 psi nor at part throttle above the vacuum valve: those stages stay.
    const others = analysis.corrections.filter((c: { side: string }) => c.side === "primary");
    expect(others.map((c: { limitedBy: string }) => c.limitedBy)).toEqual(["readings", "readings"]);
    expect(others.every((c: { proposedAreaIn2: number; currentAreaIn2: number }) => c.proposedAreaIn2 === c.currentAreaIn2)).toBe(true);
  });

  it("answers 404 for a log of another job", async () => {
    const a = await makeJob("released");
    const b = await makeJob("released");
    const log = await uploaded(a.id);
    await actAs("tuner");
    expect((await analysisRoute(new Request(`http://127.0.0.1/api/jobs/${b.id}/logs/${log.id}/analysis`), params(b.id, log.id))).status).toBe(404);
  });
});

describe("POST /api/jobs/{id}/logs/{logId}/accept", () => {
  it("puts the accepted change into the next revision, printed on its traveler", async () => {
    const job = await makeJob("released");
    const log = await uploaded(job.id);
    await actAs("tuner");
    const analysis = await (await analysisRoute(new Request(`http://127.0.0.1/x`), params(job.id, log.id))).json();
    const secondary = analysis.corrections.find((c: { side: string }) => c.side === "secondary");

    const refused = await acceptRoute(jsonRequest(`/api/jobs/${job.id}/logs/${log.id}/accept`, "POST", { stageIds: [] }), params(job.id, log.id));
    expect(refused.status).toBe(400);
    expect((await refused.json()).error.field).toBe("stageIds");
    const unchanged = analysis.corrections.find((c: { side: string }) => c.side === "primary");
    const nothing = await acceptRoute(jsonRequest(`/x`, "POST", { stageIds: [unchanged.stageId] }), params(job.id, log.id));
    expect(nothing.status).toBe(400);
    expect((await nothing.json()).error.field).toBe("stageIds.0");

    const response = await acceptRoute(jsonRequest(`/x`, "POST", { stageIds: [secondary.stageId] }), params(job.id, log.id));
    expect(response.status).toBe(201);
    expect(await response.json()).toEqual({ revision: { number: 2 } });
    const [row] = await testDb.select().from(schema.jobs).where(eq(schema.jobs.id, job.id));
    expect(row!.state).toBe("draft");
    const [stage] = await testDb.select().from(schema.enrichmentStages).where(eq(schema.enrichmentStages.id, secondary.stageId));
    expect(stage).toMatchObject({ targetKind: "area", chosenCount: secondary.layout.count, chosenDrillLabel: secondary.layout.drill.label });
    // 1 in² = 6.4516e-4 m² (exact, NIST SP 811).
    expect(stage!.targetTo).toBeCloseTo(secondary.proposedAreaIn2 * 6.4516e-4, 10);

    const again = await acceptRoute(jsonRequest(`/x`, "POST", { stageIds: [secondary.stageId] }), params(job.id, log.id));
    expect(again.status).toBe(409);

    const tunerId = (await actAs("tuner"))!;
    await approveRevision({ id: tunerId, role: "tuner" }, job.id, { acknowledgeWarnings: true });
    const traveler = await getTravelerData({ id: tunerId, role: "tuner" }, { blockId: await blockIdOf(job.id, "secondary") });
    expect(traveler.revision.number).toBe(2);
    expect(traveler.changes).toEqual({ fromRevision: 1, lines: [secondary.change] });
    expect(secondary.change).toMatch(/^secondary stage 1: \d+ x \S+ -> \d+ x \S+/);

    const listed = await (await listRoute(new Request(`http://127.0.0.1/x`), params(job.id))).json();
    expect(listed.logs[0]).toMatchObject({ id: log.id, revision: 1, nextRevision: 2, changes: [{ stageId: secondary.stageId, side: "secondary", change: secondary.change }] });
  });
});
