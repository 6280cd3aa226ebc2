import { describe, expect, it } from "vitest";
import { planGrind } from "@/lib/engineering/grind-plan";
import { M_PER_IN } from "./nist-factors";

const inch = (v: number) => v * M_PER_IN;

describe("planGrind", () => {
  const base = {
    valveProtrusionM: inch(0.06),
    runningClearanceM: inch(0.01),
    measuredGapM: inch(0.02),
    maxDepthPerPassM: inch(0.015),
    wallThicknessM: inch(0.12),
    minRemainingWallM: inch(0.06),
  };

  it("splits the depth into equal light passes with a clay check after each", () => {
    const plan = planGrind(base);
    // Hand: 0.060 + 0.010 - 0.020 = 0.050 in; 0.050 / 0.015 = 3.33 -> 4 passes of 0.050 / 4 = 0.0125 in.
    // Wall: 0.120 - 0.060 = 0.060 in to spare >= 0.050 in; 0.120 - 0.050 = 0.070 in remains.
    expect(plan.ok).toBe(true);
    expect(plan.grindNeeded).toBe(true);
    expect(plan.depthM / M_PER_IN).toBeCloseTo(0.05, 9);
    expect(plan.passes).toHaveLength(4);
    for (const pass of plan.passes) expect(pass.depthM / M_PER_IN).toBeCloseTo(0.0125, 9);
    expect(plan.passes.map((p) => p.clayCheck)).toEqual([true, true, true, true]);
    expect((plan.passes.at(-1)?.cumulativeDepthM ?? 0) / M_PER_IN).toBeCloseTo(0.05, 9);
    expect(plan.remainingWallM / M_PER_IN).toBeCloseTo(0.07, 9);
  });

  it("checks with clay every Nth pass and always after the last", () => {
    // Hand: 4 passes, check every 3rd: after pass 3 and after pass 4 (the last).
    const plan = planGrind({ ...base, clayCheckEvery: 3 });
    expect(plan.passes.map((p) => p.clayCheck)).toEqual([false, false, true, true]);
  });

  it("does not add a pass for a depth that is a whole number of passes", () => {
    // Hand: 0.060 + 0.010 - 0.025 = 0.045 in = 3 x 0.015 in exactly: 3 passes, not 4.
    const plan = planGrind({ ...base, measuredGapM: inch(0.025) });
    expect(plan.passes).toHaveLength(3);
  });

  it("refuses a depth the wall cannot spare", () => {
    // Hand: wall 0.100 - 0.060 = 0.040 in to spare < 0.050 in to remove.
    const plan = planGrind({ ...base, wallThicknessM: inch(0.1) });
    expect(plan.ok).toBe(false);
    expect(plan.reason?.code).toBe("depth-exceeds-wall");
    expect(plan.passes).toEqual([]);
    expect(plan.wallSpareM / M_PER_IN).toBeCloseTo(0.04, 9);
  });

  it("needs no grind when the gap already covers protrusion and clearance", () => {
    // Hand: 0.060 + 0.010 - 0.080 = -0.010 in.
    const plan = planGrind({ ...base, measuredGapM: inch(0.08) });
    expect(plan).toMatchObject({ ok: true, grindNeeded: false, depthM: 0, passes: [] });
  });

  it("refuses a depth per pass that would take more than 100 passes", () => {
    // Hand: 0.050 in to remove; 0.050 / 0.0005 = 100 passes is the most taken (our own limit, no published source),
    // 0.050 / 0.0004 = 125 passes is refused, naming the depth per pass.
    expect(planGrind({ ...base, maxDepthPerPassM: inch(0.0005) }).passes).toHaveLength(100);
    expect(() => planGrind({ ...base, maxDepthPerPassM: inch(0.0004) })).toThrow(/maxDepthPerPassM: .*125 passes/);
  });

  it("refuses negative measurements", () => {
    expect(() => planGrind({ ...base, measuredGapM: -0.001 })).toThrow(RangeError);
    expect(() => planGrind({ ...base, maxDepthPerPassM: 0 })).toThrow(RangeError);
  });
});
