"use client";

import { ResultPanel } from "@/components/forms/readings";
import { StagingChart, StagingChartKey } from "@/components/staging-chart";
import { Tag } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { areaNumber, areaUnitLabel, drillSize, fixed, formatArea, type DisplayLengthUnit } from "@/lib/format/display";
import type { StagingResultDto } from "./compute";

const pct = (value: number | null) => (value === null ? "—" : `${fixed(value, 1)} %`);

function BalanceTable({ result, unit }: { result: StagingResultDto; unit: DisplayLengthUnit }) {
  const { balance } = result;
  const area = areaUnitLabel(unit);
  if (balance.stages.length === 0) return <p className="text-sm text-graphite">No power valve adds area: nothing to balance.</p>;
  return (
    <div className="flex flex-col gap-2">
      <Table aria-label="Primary and secondary balance">
        <thead>
          <tr>
            <Th>Stage opens at</Th>
            <Th>Valves</Th>
            <Th numeric>Primary added, {area}</Th>
            <Th numeric>Secondary added, {area}</Th>
            <Th numeric>Primary share</Th>
            <Th numeric>Primary enrichment</Th>
            <Th numeric>Secondary enrichment</Th>
          </tr>
        </thead>
        <tbody>
          {balance.stages.map((stage) => (
            <tr key={stage.openingText + stage.marks.join()}>
              <Td className="numeric">{stage.openingText}</Td>
              <Td className="numeric">{stage.marks.join(", ")}</Td>
              <Td numeric>{areaNumber(stage.addedPrimary, unit)}</Td>
              <Td numeric>{areaNumber(stage.addedSecondary, unit)}</Td>
              <Td numeric>{fixed(stage.primarySharePct, 0)} %</Td>
              <Td numeric>{pct(stage.primaryEnrichmentPct)}</Td>
              <Td numeric>{pct(stage.secondaryEnrichmentPct)}</Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <p className="text-xs text-pencil">
        Enrichment: restriction area open on a side as a percent of that side&apos;s main-jet area (primary{" "}
        {formatArea(result.mainJets.primary, unit)}, secondary {formatArea(result.mainJets.secondary, unit)}); cumulative.
      </p>
      {balance.secondaryFirst ? (
        <p role="alert" className="rounded-[var(--radius-sheet)] border border-fault bg-fault-soft px-3 py-2 text-sm text-fault">
          Enrichment reaches the secondary before the primary. Bring it in on the primary first to keep the carburetor square.
        </p>
      ) : null}
    </div>
  );
}

function ProposalTable({ result, unit }: { result: StagingResultDto; unit: DisplayLengthUnit }) {
  const proposal = result.proposal;
  if (proposal === null) return null;
  const area = areaUnitLabel(unit);
  const worst = Math.max(1 - proposal.leanestRatio, proposal.richestRatio - 1) * 100;
  return (
    <section aria-label="Proposed setpoints" className="flex flex-col gap-2" data-testid="staging-proposal">
      <h4 className="flex flex-wrap items-center gap-2 text-sm font-semibold">
        Proposed boost valves
        {proposal.withinBand ? <Tag tone="accent">holds the band</Tag> : <Tag tone="fault">outside the band</Tag>}
      </h4>
      <Table aria-label="Proposed boost valves">
        <thead>
          <tr>
            <Th>Valve</Th>
            <Th>Side</Th>
            <Th numeric>Setpoint, psi</Th>
            <Th>Holes</Th>
            <Th numeric>Drill, {unit}</Th>
            <Th numeric>Area drilled, {area}</Th>
            <Th numeric>Area asked, {area}</Th>
          </tr>
        </thead>
        <tbody>
          {proposal.valves.map((v) => (
            <tr key={v.mark}>
              <Td className="numeric font-semibold">{v.mark}</Td>
              <Td>{v.side}</Td>
              <Td numeric>{fixed(v.setpointPsi, 1)}</Td>
              <Td className="numeric">{v.holes ? `${v.holes.count} × ${v.holes.drill.label}` : "none"}</Td>
              <Td numeric>{v.holes ? drillSize(v.holes.drill, unit) : "—"}</Td>
              <Td numeric>{areaNumber(v.area, unit)}</Td>
              <Td numeric className="text-graphite">
                {areaNumber(v.idealArea, unit)}
              </Td>
            </tr>
          ))}
        </tbody>
      </Table>
      <p className="text-xs text-pencil">
        The vacuum valves stay as entered; the boost valves above replace the ones in the form. Mixture over the boost range: leanest{" "}
        {fixed((1 - proposal.leanestRatio) * 100, 1)} % lean, richest {fixed((proposal.richestRatio - 1) * 100, 1)} % rich, worst{" "}
        {fixed(worst, 1)} % off target. Holes from inch drills, up to 4 per channel.
      </p>
    </section>
  );
}

export function StagingResults({ result, unit }: { result: StagingResultDto; unit: DisplayLengthUnit }) {
  const target = result.targetScale === "afr" ? "AFR" : "lambda";
  return (
    <ResultPanel title={result.command === "propose" ? "Staging with the proposed setpoints" : "Staging as entered"} testId="staging-result">
      <p className="text-sm text-graphite">
        {result.fuel.name} (stoichiometric {fixed(result.fuel.stoichAfr, 2)} : 1), target as {target}, band ±{fixed(result.chart.bandPct, 0)} %.
        Charge at peak boost {fixed(result.chargeAtPeak.f, 0)} °F ({fixed(result.chargeAtPeak.c, 0)} °C), from the ambient at zero boost.
        Ambient pressure: standard atmosphere.
      </p>
      <ProposalTable result={result} unit={unit} />
      <StagingChart chart={result.chart} mode="part" unit={unit} />
      <StagingChart chart={result.chart} mode="full" unit={unit} />
      <StagingChartKey />
      <h4 className="mt-2 text-sm font-semibold">Primary and secondary balance</h4>
      <BalanceTable result={result} unit={unit} />
    </ResultPanel>
  );
}
