import type { Metadata } from "next";
import { listStockedLabels } from "@/db/drill-stock";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { fixed } from "@/lib/display";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import type { DrillSystem } from "@/lib/engineering/types";
import { PageHeader } from "@/components/ui/sheet";
import { DrillRack, type RackGroup } from "./drill-rack";
import { RACK_SYSTEMS } from "./schema";

export const metadata: Metadata = { title: "Drill rack" };

const TITLES: Record<DrillSystem, string> = {
  number: "Number drills",
  letter: "Letter drills",
  fraction: "Fractional drills",
  metric: "Metric drills",
};

const M_PER_IN = 0.0254;

export default async function DrillRackPage() {
  const user = await requireRole(OFFICE_ROLES, "/shop/drills");
  const stocked = await listStockedLabels();
  const size = (diameterM: number) =>
    user.lengthUnit === "mm" ? `${fixed(diameterM * 1000, 3)} mm` : `${fixed(diameterM / M_PER_IN, 4)} in`;
  const groups: RackGroup[] = RACK_SYSTEMS.map((system) => {
    const drills = ALL_DRILLS.filter((d) => d.system === system);
    const smallest = drills[0]?.label ?? "";
    const largest = drills[drills.length - 1]?.label ?? "";
    return {
      system,
      title: TITLES[system],
      range: `${smallest} – ${largest}${system === "fraction" ? " in" : ""}`,
      drills: drills.map((d) => ({ label: d.label, size: size(d.diameterM) })),
    };
  });
  return (
    <>
      <PageHeader kicker="Shop" title="Drill rack" />
      <p className="mb-6 max-w-3xl text-sm text-graphite">
        The drills the shop has on hand. The planner picks restriction holes from these every time it solves a job, unless the
        job is set to use every standard drill. Sizes are nominal, smallest first in each series.
      </p>
      <DrillRack groups={groups} stocked={[...stocked]} canEdit={user.role === "admin"} />
    </>
  );
}
