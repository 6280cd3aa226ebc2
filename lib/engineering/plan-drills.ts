// Which drills a plan puts in the machinist's hand: every stage's restriction holes, the vacuum-passage plug's
// tap drill, and any other drill the bench operations name. Read from the plan as it was kept, so a plan
// approved by an older version (a stage without its chosen layout) is read as far as it goes.

import type { ConversionPlan } from "./conversion-plan";

/** One drill the plan uses, and where: "primary block, operation 20". */
export interface PlanDrill {
  label: string;
  uses: string[];
}

/** Every drill the plan uses, in the order the bench meets them, each with the places it is used. */
export function drillsInPlan(plan: ConversionPlan): PlanDrill[] {
  const found = new Map<string, string[]>();
  const record = (label: string, where: string) => {
    const uses = found.get(label) ?? [];
    if (!uses.includes(where)) uses.push(where);
    found.set(label, uses);
  };
  for (const block of plan.blocks) {
    const side = `${block.side} block`;
    const named = new Set<string>();
    for (const op of block.operations ?? []) {
      const drill = op.parameters?.drill;
      if (typeof drill !== "string" || !drill) continue;
      named.add(drill);
      record(drill, `${side}, operation ${op.number}`);
    }
    // A drill the plan chose but no operation names is still the plan's: say which part of the block asks for it.
    for (const stage of block.stages) {
      const drill = stage.chosen?.drill?.label;
      if (drill && !named.has(drill)) record(drill, `${side}, restriction holes`);
    }
    const plug = block.plug?.drill?.label;
    if (plug && !named.has(plug)) record(plug, `${side}, passage plug`);
  }
  return [...found].map(([label, uses]) => ({ label, uses }));
}
