import { ResultPanel } from "@/components/forms/readings";
import { Tag } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { areaNumber, areaUnitLabel, drillSize, fixed, formatArea, type DisplayLengthUnit } from "@/lib/format/display";
import type { RestrictionResultDto } from "./compute";

export function RestrictionResults({ result, unit }: { result: RestrictionResultDto; unit: DisplayLengthUnit }) {
  const area = areaUnitLabel(unit);
  return (
    <ResultPanel title="Hole layouts, best first" testId="restriction-result">
      <p className="text-sm text-graphite">
        Target effective area <span className="numeric font-semibold text-ink">{formatArea(result.target, unit)}</span>
        {result.enrichmentPct !== null && result.mainJetArea !== null ? (
          <>
            {" "}
            = <span className="numeric">{fixed(result.enrichmentPct, 1)} %</span> of main-jet area{" "}
            <span className="numeric">{formatArea(result.mainJetArea, unit)}</span>
          </>
        ) : null}
        . Error: effective area against the target, + is richer.
      </p>
      <Table aria-label="Hole layouts">
        <thead>
          <tr>
            <Th>Holes</Th>
            <Th numeric>Drill, {unit}</Th>
            <Th numeric>Holes, {area}</Th>
            <Th numeric>Effective, {area}</Th>
            <Th numeric>Error</Th>
            <Th>Checks</Th>
          </tr>
        </thead>
        <tbody>
          {result.candidates.map((c, i) => (
            <tr key={`${c.count}-${c.drill.label}`} className={i === 0 ? "bg-accent-soft/60 font-semibold" : ""}>
              <Td className="numeric">
                {c.count} × {c.drill.label}
              </Td>
              <Td numeric>{drillSize(c.drill, unit)}</Td>
              <Td numeric>{areaNumber(c.holesArea, unit)}</Td>
              <Td numeric>{areaNumber(c.effectiveArea, unit)}</Td>
              <Td numeric>
                {c.errorPct > 0 ? "+" : ""}
                {fixed(c.errorPct, 2)} %
              </Td>
              <Td>
                <span className="flex flex-wrap gap-1">
                  {c.fits ? null : <Tag tone="fault">does not fit</Tag>}
                  {c.valveLimited ? <Tag tone="muted">valve-limited</Tag> : null}
                  {c.fits && !c.valveLimited ? <span className="text-pencil">—</span> : null}
                </span>
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <p className="text-xs text-pencil">
        Valve-limited: the holes pass at least the valve&apos;s own window, so the valve sets the flow. Does not fit: the row of
        holes with the least web between them is longer than the channel.
      </p>
    </ResultPanel>
  );
}
