import type { Metadata } from "next";
import { PrintButton } from "@/components/print-button";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import type { DrillDto } from "@/lib/format/quantity-pairs";
import { drillSize, fixed, lengthNumber, type DisplayLengthUnit } from "@/lib/format/display";
import type { ThreadSystem } from "@/lib/engineering/threads";
import { ChartFilter } from "../chart-filter";
import { LengthUnitSwitch } from "../length-unit-switch";
import { searchChoice, searchText, type SearchParams } from "../search-params";
import { CHART_ENGAGEMENT_PCT, searchTapDrillRows } from "./chart-rows";

export const metadata: Metadata = { title: "Tap-drill chart" };

const SYSTEMS: readonly ThreadSystem[] = ["unified", "metric"];

function DrillCells({ drill, unit }: { drill: DrillDto; unit: DisplayLengthUnit }) {
  return (
    <>
      <Td className="numeric border-l border-rule font-semibold">{drill.label}</Td>
      <Td numeric className="text-graphite">
        {drillSize(drill, unit)}
      </Td>
    </>
  );
}

export default async function TapDrillChartPage({ searchParams }: { searchParams: SearchParams }) {
  const user = await requireRole(ALL_ROLES, "/reference/tap-drills");
  const params = await searchParams;
  const text = searchText(params.q);
  const system = searchChoice(params.system, SYSTEMS);
  const rows = searchTapDrillRows(text, system);
  const unit = user.lengthUnit;
  return (
    <>
      <PageHeader
        kicker="Reference"
        title="Tap-drill chart"
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
            action="/reference/tap-drills"
            text={text}
            textLabel="Find a thread"
            placeholder="4-40, 10-32, 1/4-20, M3, M8x1"
            choice={system}
            choiceLabel="Thread system"
            choices={[
              { value: "unified", label: "Unified inch (UNC, UNF)" },
              { value: "metric", label: "ISO metric" },
            ]}
            count={rows.length}
          />
          <p className="text-xs text-pencil">
            Tap drill: the standard drill nearest the size for {CHART_ENGAGEMENT_PCT} % thread engagement, engagement % = (D − d) /
            (1.299038 × P) × 100; inch drills for Unified threads, metric drills for ISO threads. Clearance: close and free fit for a
            screw of the thread (ISO 273 fine and medium series for metric). Sizes in {unit === "in" ? "inches" : "millimetres"}.
          </p>
          {rows.length === 0 ? (
            <p className="py-6 text-center text-graphite">No thread in the chart matches “{text}”. Try 4-40, 1/4-20 or M5.</p>
          ) : (
            <Table aria-label="Tap drills" data-testid="tap-drill-chart">
              <thead>
                <tr>
                  <Th rowSpan={2}>Thread</Th>
                  <Th rowSpan={2} numeric>
                    Major Ø, {unit}
                  </Th>
                  <Th rowSpan={2} numeric>
                    Pitch
                  </Th>
                  <Th colSpan={3} className="border-l border-rule text-center">
                    Tap drill, {CHART_ENGAGEMENT_PCT} %
                  </Th>
                  <Th colSpan={2} className="border-l border-rule text-center">
                    Close clearance
                  </Th>
                  <Th colSpan={2} className="border-l border-rule text-center">
                    Free clearance
                  </Th>
                </tr>
                <tr>
                  <Th className="border-l border-rule">Drill</Th>
                  <Th numeric>{unit}</Th>
                  <Th numeric>Engagement</Th>
                  <Th className="border-l border-rule">Drill</Th>
                  <Th numeric>{unit}</Th>
                  <Th className="border-l border-rule">Drill</Th>
                  <Th numeric>{unit}</Th>
                </tr>
              </thead>
              <tbody>
                {rows.map((row) => (
                  <tr key={row.label} className="hover:bg-accent-soft/40">
                    <Td className="numeric font-semibold">{row.label}</Td>
                    <Td numeric>{lengthNumber(row.major, unit)}</Td>
                    <Td numeric className="text-graphite">
                      {row.tpi !== null ? `${row.tpi} tpi` : `${fixed(row.pitch.mm, 2)} mm`}
                    </Td>
                    <Td className="numeric border-l border-rule font-semibold text-accent-strong">{row.tapDrill.label}</Td>
                    <Td numeric className="font-semibold">
                      {drillSize(row.tapDrill, unit)}
                    </Td>
                    <Td numeric className="text-graphite">
                      {fixed(row.engagementPct, 0)} %
                    </Td>
                    <DrillCells drill={row.closeClearance} unit={unit} />
                    <DrillCells drill={row.freeClearance} unit={unit} />
                  </tr>
                ))}
              </tbody>
            </Table>
          )}
        </div>
      </Sheet>
    </>
  );
}
