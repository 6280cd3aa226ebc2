// How much extra fuel an enrichment stage must add, and the restriction area that adds it.
//
// Fractions, not percents: 0.12 means 12 % more fuel than the main jets alone deliver. Multiply by 100 at
// the edge for display.
//
// The power-valve circuit feeds the same main well as the main jets, so its channel restriction sees the
// same metering signal (bowl pressure minus main-well pressure) and the same fuel. With equal discharge
// coefficients, fuel flow is proportional to area (m = Cd A sqrt(2 rho dP)), so
//   extra fuel / main-jet fuel = restriction area / main-jet area.
// Where the restriction's Cd differs from the jets', the area scales by Cd_jet / Cd_restriction. This
// ignores the small change of main-well pressure that the extra flow itself causes.

import { areaFromMassFlow, circleArea, massFlowFromArea } from "./orifice";
import { requireInteger, requireNonNegative, requirePositive } from "./checks";

/** Extra fuel, as a fraction of the fuel before, to move from one AFR to a richer one: AFR_before/AFR_after - 1. */
export function extraFuelFromAfr(afrBefore: number, afrAfter: number): number {
  return requirePositive("afrBefore", afrBefore) / requirePositive("afrAfter", afrAfter) - 1;
}

/**
 * The same from lambda values. For one fuel, lambda = AFR / stoichiometric AFR, so the stoichiometric ratio
 * cancels: lambda_before/lambda_after - 1.
 */
export function extraFuelFromLambda(lambdaBefore: number, lambdaAfter: number): number {
  return requirePositive("lambdaBefore", lambdaBefore) / requirePositive("lambdaAfter", lambdaAfter) - 1;
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

export interface CdPair {
  /** Discharge coefficient of the main jets. Default: equal to the restriction's. */
  mainJetCd?: number | undefined;
  /** Discharge coefficient of the channel restriction. Default: equal to the main jets'. */
  restrictionCd?: number | undefined;
}

function cdRatio(cds: CdPair): number {
  if (cds.mainJetCd === undefined || cds.restrictionCd === undefined) return 1;
  return requirePositive("mainJetCd", cds.mainJetCd) / requirePositive("restrictionCd", cds.restrictionCd);
}

/** Restriction area (m²) that adds the given extra-fuel fraction to main jets of the given area. */
export function addedAreaForExtraFuel(input: { extraFuelFraction: number; mainJetAreaM2: number } & CdPair): number {
  requireNonNegative("extraFuelFraction", input.extraFuelFraction);
  requirePositive("mainJetAreaM2", input.mainJetAreaM2);
  return input.extraFuelFraction * input.mainJetAreaM2 * cdRatio(input);
}

/** Extra-fuel fraction that a restriction of the given area adds to main jets of the given area. */
export function extraFuelFromAddedArea(input: { addedAreaM2: number; mainJetAreaM2: number } & CdPair): number {
  requireNonNegative("addedAreaM2", input.addedAreaM2);
  requirePositive("mainJetAreaM2", input.mainJetAreaM2);
  return input.addedAreaM2 / (input.mainJetAreaM2 * cdRatio(input));
}

export interface MeteringSignal {
  /** Main-jet discharge coefficient. */
  cd: number;
  fuelDensityKgM3: number;
  /** Metering signal across the jets, Pa. */
  signalPa: number;
}

/**
 * Extra-fuel fraction from a wanted extra fuel mass flow: extra / (flow of the main jets at the signal).
 */
export function extraFuelFromMassFlow(
  input: MeteringSignal & { extraFuelKgS: number; mainJetAreaM2: number },
): number {
  requireNonNegative("extraFuelKgS", input.extraFuelKgS);
  const mainFlow = massFlowFromArea({
    areaM2: requirePositive("mainJetAreaM2", input.mainJetAreaM2),
    cd: input.cd,
    densityKgM3: input.fuelDensityKgM3,
    deltaPPa: input.signalPa,
  });
  return input.extraFuelKgS / mainFlow;
}

/** Restriction area (m²) that passes a wanted extra fuel mass flow at the metering signal. */
export function addedAreaForMassFlow(input: MeteringSignal & { extraFuelKgS: number }): number {
  return areaFromMassFlow({
    massFlowKgS: input.extraFuelKgS,
    cd: input.cd,
    densityKgM3: input.fuelDensityKgM3,
    deltaPPa: input.signalPa,
  });
}
