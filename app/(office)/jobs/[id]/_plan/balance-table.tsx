import "server-only";
import type { StagingBalance } from "@/lib/engineering/staging";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { Table, Td, Th } from "@/components/ui/table";
import { area, manifold, percent } from "./format";

/** How enrichment builds on each side as the valves open, to keep the carburetor square. */
export function BalanceTable({ balance, marks, unit }: { balance: StagingBalance; marks: Map<string, string>; unit: DisplayLengthUnit }) {
  const share = (v: number) => (Number.isNaN(v) ? "—" : percent(v));
  return (
    <Table aria-label="Primary and secondary balance">
      <thead>
        <tr>
          <Th>Opens at</Th>
          <Th>Valves</Th>
          <Th numeric>Primary added</Th>
          <Th numeric>Secondary added</Th>
          <Th numeric>Primary share</Th>
          <Th numeric>Primary over mains</Th>
          <Th numeric>Secondary over mains</Th>
        </tr>
      </thead>
      <tbody>
        {balance.stages.map((stage) => (
          <tr key={stage.openingGaugePa}>
            <Td className="numeric">{manifold(stage.openingGaugePa)}</Td>
            <Td className="numeric">{stage.valveIds.map((id) => marks.get(id) ?? id).join(", ")}</Td>
            <Td numeric>{area(stage.addedPrimaryM2, unit)}</Td>
            <Td numeric>{area(stage.addedSecondaryM2, unit)}</Td>
            <Td numeric>{percent(stage.primaryShare, 0)}</Td>
            <Td numeric>{share(stage.primaryEnrichment)}</Td>
            <Td numeric>{share(stage.secondaryEnrichment)}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
