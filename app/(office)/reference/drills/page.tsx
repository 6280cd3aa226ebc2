import type { Metadata } from "next";
import { PrintButton } from "@/components/print-button";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { drillDto } from "@/lib/format/quantity-pairs";
import { drillSize } from "@/lib/format/display";
import { ALL_DRILLS, DRILL_SYSTEMS } from "@/lib/engineering/drills";
import type { DrillSystem } from "@/lib/engineering/types";
import { ChartFilter } from "../chart-filter";
import { LengthUnitSwitch } from "../length-unit-switch";
import { searchChoice, searchText, type SearchParams } from "../search-params";
import { searchDrills } from "./drill-search";

export const metadata: Metadata = { title: "Drill chart" };

const SYSTEM_NAMES: Record<DrillSystem, string> = {
  number: "Number",
  letter: "Letter",
  fraction: "Fractional inch",
  metric: "Metric",
};

const ALL_DRILL_ROWS = ALL_DRILLS.map(drillDto);

export default async function DrillChartPage({ searchParams }: { searchParams: SearchParams }) {
  const user = await requireRole(ALL_ROLES, "/reference/drills");
  const params = await searchParams;
  const text = searchText(params.q);
  const system = searchChoice(params.system, DRILL_SYSTEMS);
  const rows = searchDrills(ALL_DRILL_ROWS, { text, system });
  const unit = user.lengthUnit;
  const other = unit === "in" ? "mm" : "in";
  return (
    <>
      <PageHeader
        kicker="Reference"
        title="Drill chart"
        actions={
          <>
            <LengthUnitSwitch unit={unit} />
            <PrintButton />
          </>
        }
      />
      <Sheet>
        <div className="flex flex-col gap-4">
          <ChartFilter
            action="/reference/drills"
            text={text}
            textLabel="Find a drill"
            placeholder="43, Q, 1/8, 0.089, 2.5 mm"
            choice={system}
            choiceLabel="Series"
            choices={DRILL_SYSTEMS.map((s) => ({ value: s, label: SYSTEM_NAMES[s] }))}
            count={rows.length}
          />
          <p className="text-xs text-pencil">
            Number, letter and fractional sizes per ASME B94.11M; metric sizes in 0.05 mm steps to 2.95 mm, then 0.1 mm steps to
            13 mm. Smallest first.
            {text || system ? ` Showing ${[system ? SYSTEM_NAMES[system].toLowerCase() : "", text ? `“${text}”` : ""].filter(Boolean).join(", ")}.` : ""}
          </p>
          {rows.length === 0 ? (
            <p className="py-6 text-center text-graphite">No standard drill matches “{text}”. Try a label such as 43 or a size such as 0.089.</p>
          ) : (
            <div className="max-w-3xl">
              <Table aria-label="Drills" data-testid="drill-chart">
                <thead>
                  <tr>
                    <Th>Drill</Th>
                    <Th>Series</Th>
                    <Th numeric>Diameter, {unit}</Th>
                    <Th numeric className="text-pencil">
                      {other}
                    </Th>
                  </tr>
                </thead>
                <tbody>
                  {rows.map((drill) => (
                    <tr key={`${drill.system}-${drill.label}`} className="hover:bg-accent-soft/40">
                      <Td className="numeric font-semibold">{drill.label}</Td>
                      <Td className="text-graphite">{SYSTEM_NAMES[drill.system]}</Td>
                      <Td numeric className="font-semibold">
                        {drillSize(drill, unit)}
                      </Td>
                      <Td numeric className="text-graphite">
                        {drillSize(drill, other)}
                      </Td>
                    </tr>
                  ))}
                </tbody>
              </Table>
            </div>
          )}
        </div>
      </Sheet>
    </>
  );
}
