import "server-only";
import { areaPair, drillDto, tidy, type AreaPair, type DrillDto } from "@/lib/format/quantity-pairs";
import { ALL_DRILLS, FRACTION_DRILLS, INCH_DRILLS, METRIC_DRILLS, NUMBER_DRILLS } from "@/lib/engineering/drills";
import { extraFuelFromAfr, mainJetArea } from "@/lib/engineering/enrichment";
import { solveHoleLayout } from "@/lib/engineering/hole-layout";
import { DEFAULT_RESTRICTION_DRILL_LIMITS, type PlanDrillSystem } from "@/lib/engineering/restriction-limits";
import type { Drill } from "@/lib/engineering/types";
import { toSI } from "@/lib/engineering/units";
import { refuseOutOfRange } from "../refusal";
import type { DRILL_SETS, RestrictionInput } from "./schema";

const DRILLS: Record<(typeof DRILL_SETS)[number], readonly Drill[]> = {
  inch: INCH_DRILLS,
  number: NUMBER_DRILLS,
  fraction: FRACTION_DRILLS,
  metric: METRIC_DRILLS,
  all: ALL_DRILLS,
};

// "All drills" is the one set that mixes inch and metric sizes; the solver keeps to one system unless told.
const SYSTEMS: Record<(typeof DRILL_SETS)[number], PlanDrillSystem> = {
  inch: "inch",
  number: "inch",
  fraction: "inch",
  metric: "metric",
  all: "mixed",
};

/** Candidates shown: enough to compare, few enough to read. */
const SHOWN_CANDIDATES = 12;

export interface RestrictionCandidateDto {
  count: number;
  drill: DrillDto;
  holesArea: AreaPair;
  effectiveArea: AreaPair;
  errorPct: number;
  fits: boolean;
  valveLimited: boolean;
}

export interface RestrictionResultDto {
  target: AreaPair;
  /** The enrichment the target came from, percent of main-jet fuel; null for an area target. */
  enrichmentPct: number | null;
  mainJetArea: AreaPair | null;
  candidates: RestrictionCandidateDto[];
}

export function computeRestriction(input: RestrictionInput): RestrictionResultDto {
  const length = (q: { value: number; unit: "in" | "mm" }) => toSI("length", q.value, q.unit);
  const area = (q: { value: number; unit: "in²" | "mm²" }) => toSI("area", q.value, q.unit);
  return refuseOutOfRange(() => {
    let targetM2: number;
    let fraction: number | null = null;
    let jetsM2: number | null = null;
    if (input.targetKind === "area") {
      targetM2 = area(input.targetArea!);
    } else {
      jetsM2 = mainJetArea({ primary: { diameterM: length(input.mainJet!), count: input.mainJetCount! } }).totalM2;
      fraction = input.targetKind === "afr" ? extraFuelFromAfr(input.afrBefore!, input.afrAfter!) : input.percent! / 100;
      targetM2 = fraction * jetsM2;
    }
    const candidates = solveHoleLayout({
      targetEffectiveAreaM2: targetM2,
      drills: DRILLS[input.drillSet],
      limits: { ...DEFAULT_RESTRICTION_DRILL_LIMITS, system: SYSTEMS[input.drillSet] },
      maxHoles: input.maxHoles,
      valveWindowAreaM2: input.valveWindow && area(input.valveWindow),
      channelLengthM: input.channelLength && length(input.channelLength),
      minWebM: input.minWeb && length(input.minWeb),
      limit: SHOWN_CANDIDATES,
    }).candidates;
    return {
      target: areaPair(targetM2),
      enrichmentPct: fraction === null ? null : tidy(fraction * 100, 3),
      mainJetArea: jetsM2 === null ? null : areaPair(jetsM2),
      candidates: candidates.map((c) => ({
        count: c.count,
        drill: drillDto(c.drill),
        holesArea: areaPair(c.holesAreaM2),
        effectiveArea: areaPair(c.effectiveAreaM2),
        errorPct: tidy(c.errorPct, 3),
        fits: c.fits,
        valveLimited: c.valveLimited,
      })),
    };
  });
}
