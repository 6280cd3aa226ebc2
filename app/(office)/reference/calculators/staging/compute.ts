import "server-only";
import { areaPair, drillDto, tidy, type AreaPair, type DrillDto } from "@/lib/format/quantity-pairs";
import { INCH_DRILLS } from "@/lib/engineering/drills";
import { mainJetArea } from "@/lib/engineering/enrichment";
import { fuelProperties, type FuelSpec } from "@/lib/engineering/fuels";
import { proposeStaging, valveOpeningGaugePa, type CarburetorSide, type PowerValve, type StagingModel } from "@/lib/engineering/staging";
import { fromSI, PA_PER_INHG, STANDARD_ATMOSPHERE_PA, toSI } from "@/lib/engineering/units";
import { RequestRefusal } from "@/db/refusal";
import { stagingBalanceData, stagingChartData, type StagingBalanceDto, type StagingChartDto } from "@/lib/jobs/staging-chart";
import { refuseOutOfRange } from "../refusal";
import { chargeModelFromPeak } from "@/lib/engineering/charge-temperature";
import type { STAGING_FUELS, StagingInput } from "./schema";

/** The chart starts at 20 inHg of vacuum (about idle), or 4 inHg below the deepest vacuum-valve rating. */
const CHART_VACUUM_INHG = 20;

export interface ProposedValveDto {
  mark: string;
  side: CarburetorSide;
  setpointPsi: number;
  area: AreaPair;
  idealArea: AreaPair;
  holes: { count: number; drill: DrillDto } | null;
}

export interface StagingResultDto {
  command: "chart" | "propose";
  fuel: { name: string; stoichAfr: number };
  targetScale: "afr" | "lambda";
  mainJets: { primary: AreaPair; secondary: AreaPair };
  chargeAtPeak: { f: number; c: number };
  chart: StagingChartDto;
  balance: StagingBalanceDto;
  proposal: {
    valves: ProposedValveDto[];
    leanestRatio: number;
    richestRatio: number;
    withinBand: boolean;
  } | null;
}

function fuelSpec(name: (typeof STAGING_FUELS)[number]): FuelSpec {
  if (name === "gasoline" || name === "ethanol" || name === "methanol") return { kind: name };
  return { kind: "blend", ethanolPct: Number(name.slice(1)) };
}

export function computeStaging(input: StagingInput): StagingResultDto {
  const length = (q: { value: number; unit: "in" | "mm" }) => toSI("length", q.value, q.unit);
  const area = (q: { value: number; unit: "in²" | "mm²" }) => toSI("area", q.value, q.unit);
  const peakPa = toSI("pressure", input.peakBoost.value, input.peakBoost.unit);
  const ambientK = toSI("temperature", input.ambientTemperature.value, input.ambientTemperature.unit);
  const chargeK = toSI("temperature", input.chargeTemperature.value, input.chargeTemperature.unit);
  const charge = chargeModelFromPeak({
    ambientTemperatureK: ambientK,
    ambientPressurePa: STANDARD_ATMOSPHERE_PA,
    peakBoostGaugePa: peakPa,
    chargeAtPeakK: chargeK,
  });
  if (charge === undefined) {
    throw new RequestRefusal(400, "The charge at peak boost cannot be cooler than the ambient air.", "chargeTemperature.value");
  }
  const valves: PowerValve[] = input.valves.map((v, i) => {
    const pa = toSI("pressure", v.opening.value, v.opening.unit);
    const id = `valve-${i + 1}`;
    return v.kind === "vacuum"
      ? { id, side: v.side, kind: "vacuum", ratingPa: pa, restrictionAreaM2: area(v.area) }
      : { id, side: v.side, kind: "boost", setpointPa: pa, restrictionAreaM2: area(v.area) };
  });
  const deepestRatingPa = Math.max(0, ...valves.map((v) => -valveOpeningGaugePa(v)));
  const jets = mainJetArea({
    primary: { diameterM: length(input.primaryJet), count: input.primaryJets },
    secondary: { diameterM: length(input.secondaryJet), count: input.secondaryJets },
  });
  const model: StagingModel = {
    mainJets: { primary: jets.primaryM2, secondary: jets.secondaryM2 },
    valves,
    ambient: { pressurePa: STANDARD_ATMOSPHERE_PA, temperatureK: ambientK },
    target: {
      atmosphereAfr: input.targetAtmosphere,
      peakBoostAfr: input.targetPeak,
      peakBoostGaugePa: peakPa,
      // Cruise: while every vacuum valve is still shut, i.e. at and below the highest rating (the 1 Pa puts the
      // rating itself, where the valve is still shut, on the cruise side).
      ...(input.targetCruise === undefined ? {} : { cruiseAfr: input.targetCruise, cruiseBelowGaugePa: 1 - deepestRatingPa }),
    },
    charge,
  };
  const fromGaugePa = -Math.max(CHART_VACUUM_INHG * PA_PER_INHG, deepestRatingPa + 4 * PA_PER_INHG);
  const band = input.band / 100;
  const fuel = fuelProperties(fuelSpec(input.fuel));

  return refuseOutOfRange(() => {
    let charted = model;
    let proposal: StagingResultDto["proposal"] = null;
    if (input.command === "propose") {
      const kept = valves.filter((v) => v.kind === "vacuum");
      const result = proposeStaging({
        model: { ...model, valves: kept },
        boostValves: input.proposeValves,
        peakBoostGaugePa: peakPa,
        band,
        valveWindowAreaM2: input.boostWindow && area(input.boostWindow),
        layout: { drills: INCH_DRILLS, maxHoles: 4 },
        ids: Array.from({ length: input.proposeValves }, (_, i) => `proposed-${i + 1}`),
      });
      charted = result.model;
      proposal = {
        valves: result.valves.map((v, i) => ({
          mark: String(kept.length + i + 1),
          side: v.side,
          setpointPsi: tidy(fromSI("pressure", v.setpointPa, "psi"), 3),
          area: areaPair(v.restrictionAreaM2),
          idealArea: areaPair(v.idealAreaM2),
          holes: v.holes ? { count: v.holes.count, drill: drillDto(v.holes.drill) } : null,
        })),
        leanestRatio: tidy(result.leanestRatio, 5),
        richestRatio: tidy(result.richestRatio, 5),
        withinBand: result.withinBand,
      };
    }
    return {
      command: input.command,
      fuel: { name: fuel.name, stoichAfr: tidy(fuel.stoichAfr, 3) },
      targetScale: input.targetScale,
      mainJets: { primary: areaPair(jets.primaryM2), secondary: areaPair(jets.secondaryM2) },
      chargeAtPeak: { f: tidy(fromSI("temperature", chargeK, "°F"), 1), c: tidy(fromSI("temperature", chargeK, "°C"), 1) },
      chart: stagingChartData(charted, { fromGaugePa, toGaugePa: peakPa, band }),
      balance: stagingBalanceData(charted),
      proposal,
    };
  });
}
