import { describe, expect, it } from "vitest";
import { planConversion, type ConversionPlan, type EngineInput } from "@/lib/engineering/conversion-plan";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { GASOLINE } from "@/lib/engineering/fuels";
import { drillsInPlan } from "@/lib/engineering/plan-drills";
import { PLANNER_ENGINE, PLANNER_PRIMARY, PLANNER_SECONDARY } from "../../support/job-fixtures";

const engine: EngineInput = { fuel: GASOLINE, ...PLANNER_ENGINE };

describe("drillsInPlan", () => {
  const plan = planConversion({ engine, blocks: [PLANNER_PRIMARY, PLANNER_SECONDARY], drills: ALL_DRILLS });
  const drills = drillsInPlan(plan);

  it("names the vacuum-passage plug's tap drill where the bench drills it", () => {
    // The reference primary's 0.085 in passage takes #4-40 on a #43 drill (handbook tap-drill table; common practice).
    const plug = drills.find((d) => d.label === "#43");
    const op = plan.blocks[0]!.operations.find((o) => o.kind === "plug")!;
    expect(plug?.uses).toContain(`primary block, operation ${op.number}`);
  });

  it("names the restriction drill of the vacuum stage where the bench drills it", () => {
    // 31.5 % of two 0.080 in jets is the area of one #52 hole (ASME B94.11M: #52 = 0.0635 in; see conversion-plan.test.ts).
    const restriction = drills.find((d) => d.label === "#52");
    const op = plan.blocks[0]!.operations.find((o) => o.kind === "restriction" && o.parameters.drill === "#52")!;
    expect(restriction?.uses).toContain(`primary block, operation ${op.number}`);
  });

  it("lists each drill once, with every place it is used, and every chosen restriction drill among them", () => {
    const labels = drills.map((d) => d.label);
    expect(new Set(labels).size).toBe(labels.length);
    for (const block of plan.blocks) for (const stage of block.stages) expect(labels).toContain(stage.chosen.drill.label);
  });

  it("names a drill the plan chose though no operation names it, by the part that asks for it", () => {
    // A hand-made plan as an older revision might have kept it: a plug and a chosen layout, no operations.
    const kept = {
      blocks: [
        {
          blockId: "b1",
          side: "secondary",
          stages: [{ chosen: { count: 2, drill: { label: "#56" } } }, { stageId: "old" }],
          plug: { drill: { label: "#43" } },
          operations: [],
        },
      ],
    } as unknown as ConversionPlan;
    expect(drillsInPlan(kept)).toEqual([
      { label: "#56", uses: ["secondary block, restriction holes"] },
      { label: "#43", uses: ["secondary block, passage plug"] },
    ]);
  });
});
