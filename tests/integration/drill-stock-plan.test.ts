// The solver answers from the shop's rack: take a drill off the rack and a job's plan changes.
import { beforeEach, describe, expect, it } from "vitest";
import { createJob, saveJobBlocks, type JobFields } from "@/db/jobs";
import type { Viewer } from "@/db/visibility";
import { setDrillStocked } from "@/db/drill-stock";
import { solveJob } from "@/lib/jobs/approve";
import { createJobSchema } from "@/lib/jobs/schema";
import { jobColumns } from "@/lib/jobs/input";
import { actAs, resetDatabase } from "./support/database";
import { jobBody } from "./support/jobs";

beforeEach(resetDatabase);

const M_PER_IN = 0.0254; // exact, by definition of the inch
const circle = (dIn: number) => (Math.PI / 4) * (dIn * M_PER_IN) ** 2;

// Drill sizes from the ASME B94.11M number and fractional series (the same table is in Machinery's Handbook).
const NO_56_IN = 0.0465;
const NO_60_IN = 0.04;
const SIXTEENTH_IN = 0.0625;

describe("removing a drill from stock", () => {
  it("changes the solver's answer for a job that solves from the rack", async () => {
    const tunerId = (await actAs("tuner"))!;
    const tuner: Viewer = { id: tunerId, role: "tuner" };
    const adminId = (await actAs("admin"))!;
    for (const label of ["#56", "#60", "1/16"]) await setDrillStocked(adminId, label, true);

    const { customerId, newCustomerName, tunerId: _t, ...fields } = createJobSchema.parse(jobBody({ useAllDrills: false }));
    const job = await createJob(tuner, { fields: jobColumns(fields) as JobFields, customerId, newCustomerName });
    // One stage asking for exactly the area of one #56 hole; no valve window and no channel length, so the
    // effective area is the holes' own area and every layout fits.
    const target = circle(NO_56_IN);
    await saveJobBlocks(tuner, job.id, [
      {
        side: "primary",
        mainJetDiameterM: 0.076 * M_PER_IN,
        mainJetCount: 2,
        stages: [{ valveKind: "boost", setpointPa: 3 * 6894.757, targetKind: "area", targetTo: target, maxHoles: 4 }],
      },
    ]);

    // With #56 on the rack, 1 x #56 meets the target exactly (error 0): nothing can rank above it.
    const before = (await solveJob(job.id)).blocks[0]!.stages[0]!;
    expect(before.chosenBy).toBe("solver");
    expect(`${before.chosen.count} x ${before.chosen.drill.label}`).toBe("1 x #56");
    expect(before.chosen.errorPct).toBeCloseTo(0, 9);

    await setDrillStocked(adminId, "#56", false);

    // Without it, by hand (area = pi/4 d², target = pi/4 x 0.0465² = 0.0016982 in²):
    //   1 x #60:  pi/4 x 0.040²        = 0.0012566 in²  -> -26.0 %
    //   2 x #60:  2 x 0.0012566        = 0.0025133 in²  -> +48.0 %
    //   1 x 1/16: pi/4 x 0.0625²       = 0.0030680 in²  -> +80.7 %
    //   larger counts of either drill only move further away.
    // The smallest error wins: 1 x #60.
    const after = (await solveJob(job.id)).blocks[0]!.stages[0]!;
    expect(`${after.chosen.count} x ${after.chosen.drill.label}`).toBe("1 x #60");
    const expectedPct = ((circle(NO_60_IN) - target) / target) * 100;
    expect(expectedPct).toBeCloseTo(-26.0, 1);
    expect(after.chosen.errorPct).toBeCloseTo(expectedPct, 6);
    expect(after.candidates.map((c) => c.drill.label)).not.toContain("#56");
    expect(after.candidates.some((c) => c.count === 1 && c.drill.label === "1/16" && Math.abs(c.errorPct - ((circle(SIXTEENTH_IN) - target) / target) * 100) < 1e-6)).toBe(true);
  });
});
