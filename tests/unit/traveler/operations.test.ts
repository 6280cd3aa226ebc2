import { describe, expect, it } from "vitest";
import { planConversion, type BlockInput, type EngineInput } from "@/lib/engineering/conversion-plan";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { GASOLINE } from "@/lib/engineering/fuels";
import { formatDate } from "@/lib/format/dates";
import { acceptance, displacement, measured } from "@/lib/traveler/format";
import { travelerOperations } from "@/lib/traveler/operations";
import { PLANNER_ENGINE, PLANNER_PRIMARY } from "../../support/job-fixtures";

const IN = 0.0254; // exact, NIST SP 811
const PSI = 6894.757; // NIST SP 811

// The planner's reference job and its primary block (tests/support/job-fixtures.ts), as the planner's own tests
// use them: 0.040 in protrusion, no gap, 0.25 in wall; a 0.085 in vacuum passage; a vacuum stage of 31.5 % of two
// 0.080 in jets (one #52 hole) and a boost stage at 3 psi.
const engine: EngineInput = { fuel: GASOLINE, ...PLANNER_ENGINE };
const primary: BlockInput = PLANNER_PRIMARY;

const plan = planConversion({ engine, blocks: [primary], drills: ALL_DRILLS }).blocks[0]!;
const callout = (ops: ReturnType<typeof travelerOperations>, kind: string, label: string) =>
  ops.find((op) => op.kind === kind)?.callouts.find((c) => c.label === label);

describe("traveler operations from a solved plan", () => {
  const ops = travelerOperations(plan.operations, plan);

  it("keeps the operations in order, numbered in tens", () => {
    expect(ops.map((op) => op.number)).toEqual(ops.map((_, i) => (i + 1) * 10));
    expect(ops.map((op) => op.kind)).toEqual(["grind", "plug", "restriction", "restriction", "valveSetting", "finish"]);
  });

  it("prints the grind: 0.040 + 0.030 - 0 = 0.070 in (1.778 mm) in seven 0.010 in passes, clay after each, 0.180 in of wall left", () => {
    expect(callout(ops, "grind", "Grind depth")).toEqual({ label: "Grind depth", value: "0.0700 in", detail: "1.778 mm" });
    expect(callout(ops, "grind", "Passes")?.value).toBe("7 light");
    expect(callout(ops, "grind", "Clay check")?.value).toBe("every pass");
    expect(callout(ops, "grind", "Wall left")).toMatchObject({ value: "0.1800 in", detail: "4.572 mm" });
    const passes = ops.find((op) => op.kind === "grind")!.grindPasses;
    expect(passes.map((p) => p.pass)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    expect(passes.map((p) => Number((p.cumulativeDepthM / IN).toFixed(4)))).toEqual([0.01, 0.02, 0.03, 0.04, 0.05, 0.06, 0.07]);
    expect(passes.every((p) => p.clayCheck)).toBe(true);
  });

  it("prints the plug: #43 drill, 0.0890 in = 2.261 mm (ASME B94.11M), #4-40 UNC, set screw in sealant", () => {
    expect(callout(ops, "plug", "Drill")).toEqual({ label: "Drill", value: "#43", detail: "0.0890 in · 2.261 mm" });
    expect(callout(ops, "plug", "Thread")?.value).toBe("#4-40 UNC");
    expect(callout(ops, "plug", "Tap")?.value).toContain("#4-40 UNC");
    expect(callout(ops, "plug", "Set screw")?.value).toMatch(/^#4-40 UNC x /);
    expect(callout(ops, "plug", "Set screw")?.detail).toBe("in fuel-resistant thread sealant");
  });

  it("prints the vacuum stage's hole: 1 x #52, 0.0635 in = 1.613 mm, pi/4 x 0.0635² = 0.00317 in² = 2.043 mm²", () => {
    const vacuum = ops.filter((op) => op.kind === "restriction")[0]!;
    expect(vacuum.callouts).toEqual([
      { label: "Holes", value: "1 x #52" },
      { label: "Drill", value: "#52", detail: "0.0635 in · 1.613 mm" },
      { label: "Total hole area", value: "0.00317 in²", detail: "2.043 mm²" },
    ]);
    expect(vacuum.measurements).toHaveLength(1);
  });

  it("prints the boost valve: 3.0 psi = 20.7 kPa, ± 0.5 psi", () => {
    expect(callout(ops, "valveSetting", "Opening pressure")).toEqual({ label: "Opening pressure", value: "3.0 psi", detail: "20.7 kPa" });
    expect(callout(ops, "valveSetting", "Tolerance")).toEqual({ label: "Tolerance", value: "± 0.5 psi", detail: "2.5 psi – 3.5 psi" });
  });

  it("reads the stage from a stored operation's parameters as well", () => {
    const stored = plan.operations.map(({ stageId, ...op }) => ({ ...op, parameters: { ...op.parameters, ...(stageId ? { stageId } : {}) } }));
    expect(travelerOperations(stored.reverse(), plan)).toEqual(ops);
  });

  it("falls back to the operation's own figures when the plan is missing", () => {
    const bare = travelerOperations(plan.operations, undefined);
    expect(callout(bare, "plug", "Drill")).toMatchObject({ value: "#43" });
    expect(callout(bare, "restriction", "Holes")?.value).toBe("1 x #52");
    expect(callout(bare, "valveSetting", "Opening pressure")?.value).toBe("3.0 psi");
  });
});

describe("traveler figures", () => {
  it("gives the acceptance band as ± when symmetric, else as a range", () => {
    expect(acceptance("length", 0.0635 * IN, 0.0625 * IN, 0.0645 * IN)).toBe("± 0.0010 in");
    expect(acceptance("length", 0.07 * IN, 0.065 * IN, 0.19 * IN)).toBe("0.0650 – 0.1900 in");
    expect(acceptance("pressure", 3 * PSI, 2.5 * PSI, 3.5 * PSI)).toBe("± 0.5 psi");
  });

  it("converts at the edges: 5.7 L = 5.7 / 0.016387064 = 348 in³; 8 psi = 55.2 kPa", () => {
    expect(displacement(5.7e-3)).toBe("5.70 L · 348 in³");
    expect(measured("pressure", 8 * PSI)).toEqual({ main: "8.0 psi", other: "55.2 kPa" });
    expect(measured("length", 0.089 * IN)).toEqual({ main: "0.0890 in", other: "2.261 mm" });
    expect(formatDate("2025-06-02T08:00:00.000Z", "UTC")).toBe("2025-06-02");
  });
});
