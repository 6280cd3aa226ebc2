import { describe, expect, it } from "vitest";
import { planConversion, type BlockInput, type EngineInput } from "@/lib/engineering/conversion-plan";
import { extraFuelForMixtureChange } from "@/lib/engineering/stage-sizing";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { drillRack } from "./drill-rack";
import { GASOLINE } from "@/lib/engineering/fuels";
import { PLANNER_ENGINE, PLANNER_PRIMARY, PLANNER_SECONDARY } from "../../support/job-fixtures";

const IN = 0.0254;
const IN2 = IN * IN;
const PSI = 6894.757; // NIST SP 811: 1 psi = 6894.757 Pa
const INHG = 3386.389; // NIST SP 811: 1 inHg (conventional) = 3386.389 Pa

// The planner's reference job (tests/support/job-fixtures.ts): 10 psi peak, lambda 0.88 -> 0.78, ISO 2533 sea
// level, 298.15 K, compressor 70 %, intercooler 70 %.
const engine: EngineInput = { fuel: GASOLINE, ...PLANNER_ENGINE };

// Its primary: two 0.080 in main jets, a 0.085 in vacuum passage, 0.040 in protrusion, no gap, 0.25 in boss wall, the 31.5 % vacuum stage and
// an AFR 12.5 -> 11.5 stage at 3 psi. Its secondary: two 0.090 in jets, an 8 psi stage from lambda 0.85 to 0.78.
// Two 0.080 in main jets: 2 x pi/4 x 0.080^2 = 0.0100531 in2. 31.5 % of that is 0.0031667 in2, the area of one
// #52 hole (ASME B94.11M: #52 = 0.0635 in; pi/4 x 0.0635^2 = 0.0031669 in2).
const primary: BlockInput = PLANNER_PRIMARY;
const secondary: BlockInput = PLANNER_SECONDARY;

describe("extra fuel from the tuner's terms", () => {
  it("takes an AFR change: 12.5 -> 11.5 needs 12.5 / 11.5 - 1 = 8.70 % more fuel", () => {
    expect(extraFuelForMixtureChange(12.5, 11.5)).toBeCloseTo(0.086957, 5);
  });
  it("takes a lambda change: 0.85 -> 0.78 needs 0.85 / 0.78 - 1 = 8.97 % more fuel", () => {
    expect(extraFuelForMixtureChange(0.85, 0.78)).toBeCloseTo(0.089744, 5);
  });
  it("refuses a change that leans the mixture", () => {
    expect(() => extraFuelForMixtureChange(0.78, 0.85)).toThrow(RangeError);
  });
});

describe("planConversion", () => {
  const plan = planConversion({ engine, blocks: [primary, secondary], drills: ALL_DRILLS });
  const p = plan.blocks[0]!;
  const s = plan.blocks[1]!;

  it("solves the vacuum stage to one #52 hole", () => {
    const vac = p.stages[0]!;
    expect(vac.targetAreaM2 / IN2).toBeCloseTo(0.0031667, 6); // hand arithmetic above
    expect(vac.chosen).toMatchObject({ count: 1, drill: { label: "#52" } });
    expect(vac.chosenBy).toBe("solver");
  });

  it("plugs a 0.085 in vacuum passage with 4-40 on a #43 drill", () => {
    // common practice: #4-40 with a #43 drill (handbook tap-drill table: 4-40 -> #43 = 0.0890 in)
    expect(p.plug?.thread.label).toBe("#4-40 UNC");
    expect(p.plug?.drill.label).toBe("#43");
  });

  it("grinds protrusion plus clearance less the measured gap", () => {
    // 0.040 in protrusion + 0.030 in running clearance - 0 gap = 0.070 in, in 0.010 in passes = 7 passes
    expect(p.grind!.depthM / IN).toBeCloseTo(0.07, 6);
    expect(p.grind!.passes).toHaveLength(7);
  });

  it("numbers operations in tens in the order the work is done, each with its caution", () => {
    expect(p.operations.map((o) => o.number)).toEqual([10, 20, 30, 40, 50, 60]);
    expect(p.operations.map((o) => o.kind)).toEqual(["grind", "plug", "restriction", "restriction", "valveSetting", "finish"]);
    expect(p.operations.map((o) => o.caution)).toEqual(["grinding", "drilling", "drilling", "drilling", "pressurizedBowls", "fuel"]);
    expect(s.operations.map((o) => o.kind)).toEqual(["pickupTube", "restriction", "valveSetting", "finish"]);
  });

  it("asks the bench to gauge every hole and to measure each boost valve's opening", () => {
    const holes = p.operations.find((o) => o.kind === "restriction")!;
    expect(holes.measurements.map((m) => m.key)).toEqual(["hole-1"]);
    const valve = p.operations.find((o) => o.kind === "valveSetting")!;
    // setpoint 3 psi, tolerance 0.5 psi (common practice, no published source)
    expect(valve.measurements[0]!.minSi / PSI).toBeCloseTo(2.5, 6);
    expect(valve.measurements[0]!.maxSi / PSI).toBeCloseTo(3.5, 6);
  });

  it("cuts the pickup tube to runs + arc + swage", () => {
    // 0.25 + 0.5 + 0.375 x (pi/4) + 0.2 = 1.24452 in (arc = R x angle in radians)
    expect(s.tube!.cutLengthM / IN).toBeCloseTo(1.24452, 4);
  });

  it("honours the tuner's pick, and falls back with a warning when the drill left the rack", () => {
    const picked = planConversion({
      engine,
      blocks: [{ ...primary, stages: [{ ...primary.stages[0]!, chosen: { count: 2, drillLabel: "#60" } }] }],
      drills: ALL_DRILLS,
    });
    expect(picked.blocks[0]!.stages[0]).toMatchObject({ chosenBy: "tuner", chosen: { count: 2, drill: { label: "#60" } } });
    const stale = planConversion({
      engine,
      blocks: [{ ...primary, stages: [{ ...primary.stages[0]!, chosen: { count: 2, drillLabel: "#60" } }] }],
      drills: drillRack(["#52", "#43", "1/16"]),
    });
    expect(stale.blocks[0]!.stages[0]!.chosenBy).toBe("solver");
    expect(stale.blocks[0]!.warnings.map((w) => w.message).join(" ")).toMatch(/no longer offered/);
  });

  it("draws the staging of the whole carburetor from vacuum to peak boost", () => {
    const gauge = plan.staging.sweep.gaugePa;
    expect(gauge[0]! / INHG).toBeCloseTo(-20, 6);
    expect(gauge.at(-1)! / PSI).toBeCloseTo(10, 6);
    expect(plan.staging.balance.secondaryFirst).toBe(false);
  });
});
