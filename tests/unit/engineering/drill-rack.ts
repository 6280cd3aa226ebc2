// A rack of standard drills named by label, for writing test inputs the way a shop lists its stock.
import { findDrill } from "@/lib/engineering/drills";
import type { Drill } from "@/lib/engineering/types";

export function drillRack(labels: readonly string[]): Drill[] {
  return labels.map((label) => {
    const drill = findDrill(label);
    if (drill === undefined) throw new Error(`test rack: no standard drill ${label}`);
    return drill;
  });
}
