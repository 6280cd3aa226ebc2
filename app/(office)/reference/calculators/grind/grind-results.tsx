import { Reading, Readings, ResultPanel } from "@/components/forms/readings";
import { Table, Td, Th } from "@/components/ui/table";
import { formatLength, lengthNumber, type DisplayLengthUnit } from "@/lib/format/display";
import type { GrindResultDto } from "./compute";

export function GrindResults({ result, unit }: { result: GrindResultDto; unit: DisplayLengthUnit }) {
  if (!result.ok) {
    return (
      <ResultPanel title="Do not grind" testId="grind-result">
        <p role="alert" className="rounded-[var(--radius-sheet)] border-2 border-fault bg-fault-soft px-3 py-2 font-semibold text-fault">
          {result.stopReason}
        </p>
        <Readings label="Why">
          <Reading label="Depth it would take">{formatLength(result.depth, unit)}</Reading>
          <Reading label="Wall that can be spared">{formatLength(result.wallSpare, unit)}</Reading>
        </Readings>
      </ResultPanel>
    );
  }
  if (!result.grindNeeded) {
    return (
      <ResultPanel title="No grind needed" testId="grind-result">
        <p className="text-graphite">The clay gap already covers the valve&apos;s protrusion and the running clearance. Fit the block as it is.</p>
      </ResultPanel>
    );
  }
  const checks = result.passes.filter((p) => p.clayCheck).length;
  return (
    <ResultPanel title="Grind plan" testId="grind-result">
      <Readings label="Grind plan">
        <Reading label="Depth to remove" strong>
          {formatLength(result.depth, unit)}
        </Reading>
        <Reading label="Passes">{result.passes.length}</Reading>
        <Reading label="Clay checks">{checks}</Reading>
        <Reading label="Wall left">{formatLength(result.remainingWall, unit)}</Reading>
      </Readings>
      <Table aria-label="Passes">
        <thead>
          <tr>
            <Th numeric>Pass</Th>
            <Th numeric>Take off, {unit}</Th>
            <Th numeric>Total, {unit}</Th>
            <Th>Then</Th>
          </tr>
        </thead>
        <tbody>
          {result.passes.map((p) => (
            <tr key={p.pass}>
              <Td numeric>{p.pass}</Td>
              <Td numeric>{lengthNumber(p.depth, unit)}</Td>
              <Td numeric>{lengthNumber(p.cumulative, unit)}</Td>
              <Td className={p.clayCheck ? "font-semibold" : "text-pencil"}>{p.clayCheck ? "Check with clay" : "Next pass"}</Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <p className="text-xs text-pencil">Stop early if the clay shows the clearance before the last pass. Deburr, wash and blow out every passage.</p>
    </ResultPanel>
  );
}
