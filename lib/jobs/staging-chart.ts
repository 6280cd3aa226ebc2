import "server-only";
import { areaPair, tidy, type AreaPair } from "@/lib/format/quantity-pairs";
import {
  stagingBalance,
  sweepStaging,
  valveOpeningGaugePa,
  type CarburetorSide,
  type PowerValve,
  type StagingModel,
  type ThrottleMode,
} from "@/lib/engineering/staging";
import { fromSI, PA_PER_INHG } from "@/lib/engineering/units";

// The staging chart and the side-balance table as small DTOs for the screen: pressures in psi gauge
// (vacuum negative) on one axis, areas in both display units. Built on the server from lib/engineering;
// drawn by components/staging-chart.tsx.

export interface StagingValveDto {
  id: string;
  /** Short name on the chart: "1", "2"... in the order given. */
  mark: string;
  side: CarburetorSide;
  kind: PowerValve["kind"];
  openingPsi: number;
  /** "6.5 inHg vacuum" or "3.0 psi boost". */
  openingText: string;
  area: AreaPair;
}

export interface StagingPointDto {
  psi: number;
  /** Mixture the carburetor gives (predicted) beside what the area shows; in the target's scale. */
  part: { needed: AreaPair; supplied: AreaPair; ratio: number; mixture: number };
  full: { needed: AreaPair; supplied: AreaPair; ratio: number; mixture: number };
  /** The target mixture there, AFR or lambda as the model was given. */
  target: number;
}

export interface StagingZoneDto {
  mode: ThrottleMode;
  kind: "lean" | "rich";
  fromPsi: number;
  /** End of the zone: where the mixture is back in the band (the next point of the sweep, or a vacuum valve's rating). */
  toPsi: number;
  worstRatio: number;
}

export interface StagingChartDto {
  fromPsi: number;
  toPsi: number;
  /** Half-width of the accepted band, percent. */
  bandPct: number;
  /** Full throttle is drawn from here up: a deeper vacuum only happens at part throttle. */
  fullFromPsi: number;
  points: StagingPointDto[];
  zones: StagingZoneDto[];
  valves: StagingValveDto[];
}

export interface StagingStageDto {
  openingText: string;
  marks: string[];
  addedPrimary: AreaPair;
  addedSecondary: AreaPair;
  cumulativePrimary: AreaPair;
  cumulativeSecondary: AreaPair;
  primarySharePct: number;
  /** Enrichment area open on each side as a percent of its main jets; null when the side has none. */
  primaryEnrichmentPct: number | null;
  secondaryEnrichmentPct: number | null;
}

export interface StagingBalanceDto {
  stages: StagingStageDto[];
  secondaryFirst: boolean;
}

const psiOf = (pa: number) => tidy(fromSI("pressure", pa, "psi"), 4);

export function openingText(valve: PowerValve): string {
  return valve.kind === "vacuum"
    ? `${(valve.ratingPa / PA_PER_INHG).toFixed(1)} inHg vacuum`
    : `${fromSI("pressure", valve.setpointPa, "psi").toFixed(1)} psi boost`;
}

function marksOf(model: StagingModel): Map<string, string> {
  return new Map(model.valves.map((v, i) => [v.id, String(i + 1)]));
}

export function stagingChartData(
  model: StagingModel,
  options: { fromGaugePa: number; toGaugePa: number; band: number; points?: number; fullThrottleFromGaugePa?: number | undefined },
): StagingChartDto {
  const sweep = sweepStaging(model, { ...options, points: options.points ?? 161 });
  const psi = sweep.gaugePa.map(psiOf);
  const marks = marksOf(model);
  const curve = (mode: ThrottleMode, i: number) => ({
    needed: areaPair(sweep[mode].neededM2[i] as number),
    supplied: areaPair(sweep[mode].suppliedM2[i] as number),
    ratio: tidy(sweep[mode].ratio[i] as number, 5),
    mixture: tidy(sweep[mode].afr[i] as number, 4),
  });
  return {
    fromPsi: psi[0] as number,
    toPsi: psi.at(-1) as number,
    bandPct: tidy(options.band * 100, 3),
    fullFromPsi: options.fullThrottleFromGaugePa === undefined ? (psi[0] as number) : Math.max(psi[0] as number, psiOf(options.fullThrottleFromGaugePa)),
    points: psi.map((p, i) => ({ psi: p, part: curve("part", i), full: curve("full", i), target: tidy(sweep.targetAfr[i] as number, 4) })),
    zones: sweep.zones.map((zone) => {
      // A zone lasts until the next point of the sweep, unless its last point is where a vacuum valve opens:
      // the valve is still shut there and open just above, so the zone ends exactly at the rating.
      const last = sweep.gaugePa.indexOf(zone.toGaugePa);
      const next = sweep.gaugePa[last + 1];
      const endsAtVacuumValve = model.valves.some((v) => v.kind === "vacuum" && valveOpeningGaugePa(v) === zone.toGaugePa);
      return {
        mode: zone.mode,
        kind: zone.kind,
        fromPsi: psiOf(zone.fromGaugePa),
        toPsi: psiOf(endsAtVacuumValve ? zone.toGaugePa : (next ?? zone.toGaugePa)),
        worstRatio: tidy(zone.worstRatio, 5),
      };
    }),
    valves: model.valves.map((v) => ({
      id: v.id,
      mark: marks.get(v.id) ?? v.id,
      side: v.side,
      kind: v.kind,
      openingPsi: psiOf(valveOpeningGaugePa(v)),
      openingText: openingText(v),
      area: areaPair(v.restrictionAreaM2),
    })),
  };
}

const pct = (fraction: number) => (Number.isNaN(fraction) ? null : tidy(fraction * 100, 3));

export function stagingBalanceData(model: StagingModel): StagingBalanceDto {
  const balance = stagingBalance(model);
  const marks = marksOf(model);
  const byId = new Map(model.valves.map((v) => [v.id, v]));
  return {
    secondaryFirst: balance.secondaryFirst,
    stages: balance.stages.map((stage) => ({
      openingText: openingText(byId.get(stage.valveIds[0] as string) as PowerValve),
      marks: stage.valveIds.map((id) => marks.get(id) ?? id),
      addedPrimary: areaPair(stage.addedPrimaryM2),
      addedSecondary: areaPair(stage.addedSecondaryM2),
      cumulativePrimary: areaPair(stage.cumulativePrimaryM2),
      cumulativeSecondary: areaPair(stage.cumulativeSecondaryM2),
      primarySharePct: tidy(stage.primaryShare * 100, 3),
      primaryEnrichmentPct: pct(stage.primaryEnrichment),
      secondaryEnrichmentPct: pct(stage.secondaryEnrichment),
    })),
  };
}
