import "server-only";
import type { BlockRow } from "@/db/jobs";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { Table, Td, Th } from "@/components/ui/table";
import { area, drillSize, inHg, psi, signedPercent } from "./format";

/** One line per stage: where its valve opens, what it needs and what is drilled for it. */
export function PlanSummary({ blocks, plan, marks, unit }: { blocks: BlockRow[]; plan: ConversionPlan; marks: Map<string, string>; unit: DisplayLengthUnit }) {
  const rows = plan.blocks.flatMap((blockPlan) => {
    const block = blocks.find((b) => b.id === blockPlan.blockId);
    return blockPlan.stages.map((stagePlan) => ({ block, stage: block?.stages.find((s) => s.id === stagePlan.stageId), stagePlan }));
  });
  return (
    <Table aria-label="Plan at a glance">
      <thead>
        <tr>
          <Th>Valve</Th>
          <Th>Opens at</Th>
          <Th numeric>Area needed</Th>
          <Th>Holes</Th>
          <Th numeric>Drill size</Th>
          <Th numeric>Error</Th>
          <Th>Chosen by</Th>
        </tr>
      </thead>
      <tbody>
        {rows.map(({ block, stage, stagePlan }) =>
          block && stage ? (
            <tr key={stage.id}>
              <Td className="numeric font-semibold">
                {marks.get(stage.id)} <span className="font-normal text-graphite">{block.side}</span>
              </Td>
              <Td className="numeric">{stage.valveKind === "vacuum" ? `${inHg(stage.vacuumRatingPa ?? 0)} vacuum` : `${psi(stage.setpointPa ?? 0)} boost`}</Td>
              <Td numeric>{area(stagePlan.targetAreaM2, unit)}</Td>
              <Td className="numeric font-semibold">
                {stagePlan.chosen.count} × {stagePlan.chosen.drill.label}
              </Td>
              <Td numeric>{drillSize(stagePlan.chosen.drill.diameterM, unit)}</Td>
              <Td numeric>{signedPercent(stagePlan.chosen.errorPct)}</Td>
              <Td>{stagePlan.chosenBy}</Td>
            </tr>
          ) : null,
        )}
      </tbody>
    </Table>
  );
}
