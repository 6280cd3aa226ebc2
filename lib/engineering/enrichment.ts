// How much extra fuel an enrichment stage must add, and the main-jet area it is measured against.
//
// Fractions, not percents: 0.12 means 12 % more fuel than the main jets alone deliver. Multiply by 100 at
// the edge for display.
//
// The power-valve circuit feeds the same main well as the main jets, so its channel restriction sees the
// same metering signal (bowl pressure minus main-well pressure) and the same fuel. With equal discharge
// coefficients, fuel flow is proportional to area (m = Cd A sqrt(2 rho dP)), so
//   extra fuel / main-jet fuel = restriction area / main-jet area
// (stage-sizing.ts sizes the stages on it). This ignores the small change of main-well pressure that the
// extra flow itself causes.

import { circleArea } from "./orifice";
import { requireInteger, requirePositive } from "./checks";

/** Extra fuel, as a fraction of the fuel before, to move from one AFR to a richer one: AFR_before/AFR_after - 1. */
export function extraFuelFromAfr(afrBefore: number, afrAfter: number): number {
  return requirePositive("afrBefore", afrBefore) / requirePositive("afrAfter", afrAfter) - 1;
}

/** A set of identical jets, by measured bore diameter. */
export interface JetSet {
  diameterM: number;
  count: number;
}

export interface MainJetArea {
  primaryM2: number;
  secondaryM2: number;
  totalM2: number;
}

/** Main-jet flow area per side and in total, from measured jet diameters and counts. */
export function mainJetArea(jets: { primary: JetSet; secondary?: JetSet | undefined }): MainJetArea {
  const side = (name: string, set: JetSet | undefined): number => {
    if (set === undefined) return 0;
    requirePositive(`${name}.diameterM`, set.diameterM);
    requireInteger(`${name}.count`, set.count, 0, 16);
    return set.count * circleArea(set.diameterM);
  };
  const primaryM2 = side("primary", jets.primary);
  const secondaryM2 = side("secondary", jets.secondary);
  return { primaryM2, secondaryM2, totalM2: primaryM2 + secondaryM2 };
}
