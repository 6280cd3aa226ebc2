// Balance between the sides: the stages in opening order and how the enrichment splits between primary
// and secondary.

import { requireNonNegative } from "../checks";
import { jetBankArea, valveOpeningGaugePa, type PowerValve, type StagingModel } from "./model";

export interface StagingStage {
  openingGaugePa: number;
  valveIds: string[];
  addedPrimaryM2: number;
  addedSecondaryM2: number;
  cumulativePrimaryM2: number;
  cumulativeSecondaryM2: number;
  /** Primary share of all the enrichment area open at this stage (0..1). */
  primaryShare: number;
  /** Enrichment area open on each side as a fraction of that side's main jets (NaN when it has none). */
  primaryEnrichment: number;
  secondaryEnrichment: number;
}

export interface StagingBalance {
  stages: StagingStage[];
  firstPrimaryGaugePa: number | undefined;
  firstSecondaryGaugePa: number | undefined;
  /** Enrichment reaches the secondary before the primary (common practice: primary first). */
  secondaryFirst: boolean;
}

/** Stages in the order the valves open, with the enrichment on each side. Valves of zero area are skipped. */
export function stagingBalance(model: Pick<StagingModel, "mainJets" | "valves">): StagingBalance {
  const primaryMains = jetBankArea(model.mainJets.primary);
  const secondaryMains = jetBankArea(model.mainJets.secondary);
  const valves = model.valves
    .filter((v) => requireNonNegative(`valve ${v.id} restrictionAreaM2`, v.restrictionAreaM2) > 0)
    .slice()
    .sort((a, b) => valveOpeningGaugePa(a) - valveOpeningGaugePa(b));
  const stages: StagingStage[] = [];
  let cumulativePrimaryM2 = 0;
  let cumulativeSecondaryM2 = 0;
  let firstPrimaryGaugePa: number | undefined;
  let firstSecondaryGaugePa: number | undefined;
  for (let i = 0; i < valves.length; ) {
    const openingGaugePa = valveOpeningGaugePa(valves[i] as PowerValve);
    const group: PowerValve[] = [];
    while (i < valves.length && valveOpeningGaugePa(valves[i] as PowerValve) === openingGaugePa) group.push(valves[i++] as PowerValve);
    let addedPrimaryM2 = 0;
    let addedSecondaryM2 = 0;
    for (const v of group) {
      if (v.side === "primary") addedPrimaryM2 += v.restrictionAreaM2;
      else addedSecondaryM2 += v.restrictionAreaM2;
    }
    if (addedPrimaryM2 > 0 && firstPrimaryGaugePa === undefined) firstPrimaryGaugePa = openingGaugePa;
    if (addedSecondaryM2 > 0 && firstSecondaryGaugePa === undefined) firstSecondaryGaugePa = openingGaugePa;
    cumulativePrimaryM2 += addedPrimaryM2;
    cumulativeSecondaryM2 += addedSecondaryM2;
    stages.push({
      openingGaugePa,
      valveIds: group.map((v) => v.id),
      addedPrimaryM2,
      addedSecondaryM2,
      cumulativePrimaryM2,
      cumulativeSecondaryM2,
      primaryShare: cumulativePrimaryM2 / (cumulativePrimaryM2 + cumulativeSecondaryM2),
      primaryEnrichment: primaryMains > 0 ? cumulativePrimaryM2 / primaryMains : Number.NaN,
      secondaryEnrichment: secondaryMains > 0 ? cumulativeSecondaryM2 / secondaryMains : Number.NaN,
    });
  }
  const secondaryFirst =
    firstSecondaryGaugePa !== undefined && (firstPrimaryGaugePa === undefined || firstSecondaryGaugePa < firstPrimaryGaugePa);
  return { stages, firstPrimaryGaugePa, firstSecondaryGaugePa, secondaryFirst };
}

