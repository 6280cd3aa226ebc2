// Enrichment staging, the physics model: the carburetor's total metering area against manifold pressure,
// from vacuum to peak boost, compared with the area the target mixture needs.
//
// The model (SI; pressures are gauge, relative to the ambient, unless named absolute):
//
// * Supplied area at a manifold pressure = main jets + the restriction area of every open power valve.
//   Part throttle: primary side only (the secondaries are shut, their wells carry no signal).
//   Full throttle: both sides.
// * A vacuum valve is open while the vacuum is less than its rating: gauge > -rating.
//   A boost valve is open from its setpoint up: gauge >= setpoint.
// * At equal signal and Cd, fuel flow is proportional to area, and a carburetor's AFR grows as
//   sqrt(rho_air) (the metering signal rises as rho_air v², the air mass as rho_air; Heywood, Internal
//   Combustion Engine Fundamentals, carburetor chapter). To hold the target, the area must be
//     needed(p) = base * sqrt(rho(p) / rho_ref) * AFR_target(0) / AFR_target(p)
//   where base is the area that gave the target at the reference (the calibration: by default the
//   supplied area at zero gauge, i.e. the carburetor is assumed correctly jetted without boost).
// * rho(p) is the air density at the venturi. The venturi sits upstream of the throttle plates, so under
//   vacuum it still sees the ambient air (the compressor is not building boost) and only under boost does it
//   see the manifold pressure: P_venturi = P_ambient + max(gauge, 0). Under boost the temperature there is
//   either fixed or the compressor outlet (isentropic with an efficiency) after an optional intercooler; at
//   and below zero gauge it is the ambient temperature. The reference (where the jets were right) is the
//   ambient air, so a hot charge or a shop at altitude changes what boost needs.
// * mixture ratio = supplied / needed: above 1 is rich, below 1 lean. The mixture's AFR is AFR_target / ratio.
// * Only ratios of AFR enter, so lambda values work in place of AFR throughout.

import { chargeDensity, compressorOutletTemperature, intercoolerOutletTemperature } from "../engine-demand";
import { requireFinite, requireInRange, requireInteger, requireNonNegative, requirePositive } from "../checks";

export type CarburetorSide = "primary" | "secondary";
export type ThrottleMode = "part" | "full";

export interface VacuumPowerValve {
  id: string;
  side: CarburetorSide;
  kind: "vacuum";
  /** Opening rating as a vacuum, Pa below the ambient (positive number): open while gauge > -ratingPa. */
  ratingPa: number;
  /** Effective restriction area the valve circuit adds when open (holes with the valve window), m². */
  restrictionAreaM2: number;
}

export interface BoostPowerValve {
  id: string;
  side: CarburetorSide;
  kind: "boost";
  /** Opening pressure, Pa gauge: open while gauge >= setpointPa. */
  setpointPa: number;
  /** Effective restriction area the valve circuit adds when open, m². */
  restrictionAreaM2: number;
}

export type PowerValve = VacuumPowerValve | BoostPowerValve;

/** Main jets of one side: their total area (m²), or a count of identical jets and the area of one. */
export type JetBank = number | { count: number; areaM2: number };

/**
 * Target mixture against gauge pressure: atmosphereAfr at zero gauge, peakBoostAfr from peakBoostGaugePa
 * up, linear between; under vacuum atmosphereAfr, or cruiseAfr at and below cruiseBelowGaugePa when both are given.
 */
export interface TargetAfrCurve {
  atmosphereAfr: number;
  peakBoostAfr: number;
  peakBoostGaugePa: number;
  cruiseAfr?: number | undefined;
  /** Gauge pressure (zero or negative, a vacuum) at and below which the cruise target applies. */
  cruiseBelowGaugePa?: number | undefined;
}

/** The target as a curve, or any function of gauge pressure (Pa) returning an AFR (or lambda). */
export type TargetMixture = TargetAfrCurve | ((gaugePa: number) => number);

export type ChargeTemperatureModel =
  | { kind: "fixed"; temperatureK: number }
  | {
      kind: "compressor";
      /** Compressor isentropic efficiency, 0..1. */
      efficiency: number;
      /** Intercooler effectiveness, 0..1; omit for no intercooler. */
      intercoolerEffectiveness?: number | undefined;
      /** Intercooler coolant (or ambient air) temperature, K. Default: the ambient temperature. */
      coolantTemperatureK?: number | undefined;
    };

export interface StagingModel {
  mainJets: { primary: JetBank; secondary: JetBank };
  valves: readonly PowerValve[];
  /** Ambient (compressor inlet) pressure, absolute Pa, and temperature, K. Gauge pressures are relative to it. */
  ambient: { pressurePa: number; temperatureK: number };
  /**
   * Air at the venturi when the base calibration was right (absolute Pa, K). Default: the ambient air, where
   * the carburetor was jetted.
   */
  reference?: { pressurePa: number; temperatureK: number } | undefined;
  target: TargetMixture;
  charge: ChargeTemperatureModel;
  /** Area that gave the target at the reference. Default: the supplied area at zero gauge. */
  baseAreaM2?: { partThrottle: number; fullThrottle: number } | undefined;
}

// ---------------------------------------------------------------------------------------------------------
// Point evaluation

/** Whether a valve is open at a gauge pressure. */
export function valveIsOpen(valve: PowerValve, gaugePa: number): boolean {
  return valve.kind === "vacuum" ? gaugePa > -valve.ratingPa : gaugePa >= valve.setpointPa;
}

/**
 * Whether a valve is open just below a gauge pressure (the left limit): the state a pressure sweep sees
 * the instant before reaching it. Differs from valveIsOpen only at a boost valve's setpoint.
 */
export function valveIsOpenJustBelow(valve: PowerValve, gaugePa: number): boolean {
  return valve.kind === "vacuum" ? gaugePa > -valve.ratingPa : gaugePa > valve.setpointPa;
}

/** The gauge pressure where a valve's state changes: -rating for a vacuum valve, the setpoint for a boost one. */
export function valveOpeningGaugePa(valve: PowerValve): number {
  return valve.kind === "vacuum" ? -valve.ratingPa : valve.setpointPa;
}

export function jetBankArea(bank: JetBank): number {
  if (typeof bank === "number") return requireNonNegative("main jet area", bank);
  requireInteger("main jet count", bank.count, 0, 16);
  return bank.count * requireNonNegative("main jet areaM2", bank.areaM2);
}

export function targetAfrAt(target: TargetMixture, gaugePa: number): number {
  if (typeof target === "function") return requirePositive("target AFR", target(gaugePa));
  if (gaugePa >= target.peakBoostGaugePa) return target.peakBoostAfr;
  if (gaugePa >= 0) {
    return target.atmosphereAfr + ((target.peakBoostAfr - target.atmosphereAfr) * gaugePa) / target.peakBoostGaugePa;
  }
  // At the cruise limit itself a vacuum valve rated there is still shut: the engine is still cruising.
  if (target.cruiseAfr !== undefined && target.cruiseBelowGaugePa !== undefined && gaugePa <= target.cruiseBelowGaugePa) {
    return target.cruiseAfr;
  }
  return target.atmosphereAfr;
}

function validateTarget(target: TargetMixture): void {
  if (typeof target === "function") return;
  requirePositive("target.atmosphereAfr", target.atmosphereAfr);
  requirePositive("target.peakBoostAfr", target.peakBoostAfr);
  requirePositive("target.peakBoostGaugePa", target.peakBoostGaugePa);
  if ((target.cruiseAfr === undefined) !== (target.cruiseBelowGaugePa === undefined)) {
    throw new RangeError("target.cruiseAfr and target.cruiseBelowGaugePa go together");
  }
  if (target.cruiseAfr !== undefined) requirePositive("target.cruiseAfr", target.cruiseAfr);
  if (target.cruiseBelowGaugePa !== undefined && !(target.cruiseBelowGaugePa <= 0)) {
    throw new RangeError("target.cruiseBelowGaugePa must be a vacuum (zero or negative gauge pressure)");
  }
}

export interface VenturiAir {
  absolutePressurePa: number;
  temperatureK: number;
  densityKgM3: number;
}

/** Air at the venturi for a manifold gauge pressure (see the model notes at the top of this file). */
export function venturiAirAt(model: StagingModel, gaugePa: number): VenturiAir {
  const ambientPa = model.ambient.pressurePa;
  const absolutePressurePa = ambientPa + Math.max(gaugePa, 0);
  let temperatureK: number;
  const charge = model.charge;
  if (gaugePa <= 0) {
    // No boost: the compressor does no work and the venturi breathes ambient air, whatever the charge
    // reaches under boost.
    temperatureK = model.ambient.temperatureK;
  } else if (charge.kind === "fixed") {
    temperatureK = charge.temperatureK;
  } else {
    temperatureK = compressorOutletTemperature({
      inletTemperatureK: model.ambient.temperatureK,
      inletPressurePa: ambientPa,
      outletPressurePa: absolutePressurePa,
      efficiency: charge.efficiency,
    });
    if (charge.intercoolerEffectiveness !== undefined) {
      temperatureK = intercoolerOutletTemperature({
        inletTemperatureK: temperatureK,
        coolantTemperatureK: charge.coolantTemperatureK ?? model.ambient.temperatureK,
        effectiveness: charge.intercoolerEffectiveness,
      });
    }
  }
  return { absolutePressurePa, temperatureK, densityKgM3: chargeDensity({ absolutePressurePa, temperatureK }) };
}

/** Throws a RangeError naming the first field of the model that is out of range. */
export function validateModel(model: StagingModel): void {
  requirePositive("ambient.pressurePa", model.ambient.pressurePa);
  requirePositive("ambient.temperatureK", model.ambient.temperatureK);
  jetBankArea(model.mainJets.primary);
  jetBankArea(model.mainJets.secondary);
  const ids = new Set<string>();
  for (const v of model.valves) {
    if (ids.has(v.id)) throw new RangeError(`valve id ${v.id} is used twice`);
    ids.add(v.id);
    requireNonNegative(`valve ${v.id} restrictionAreaM2`, v.restrictionAreaM2);
    if (v.kind === "vacuum") requireNonNegative(`valve ${v.id} ratingPa`, v.ratingPa);
    else requireFinite(`valve ${v.id} setpointPa`, v.setpointPa);
  }
  validateTarget(model.target);
  const c = model.charge;
  if (c.kind === "fixed") requirePositive("charge.temperatureK", c.temperatureK);
  else {
    requireInRange("charge.efficiency", c.efficiency, Number.MIN_VALUE, 1);
    if (c.intercoolerEffectiveness !== undefined) requireInRange("charge.intercoolerEffectiveness", c.intercoolerEffectiveness, 0, 1);
    if (c.coolantTemperatureK !== undefined) requirePositive("charge.coolantTemperatureK", c.coolantTemperatureK);
  }
  if (model.reference !== undefined) {
    requirePositive("reference.pressurePa", model.reference.pressurePa);
    requirePositive("reference.temperatureK", model.reference.temperatureK);
  }
  if (model.baseAreaM2 !== undefined) {
    requirePositive("baseAreaM2.partThrottle", model.baseAreaM2.partThrottle);
    requirePositive("baseAreaM2.fullThrottle", model.baseAreaM2.fullThrottle);
  }
}

/** Whether a side meters in a throttle mode: the primary always, the secondary only at full throttle. */
export function sideCounts(mode: ThrottleMode, side: CarburetorSide): boolean {
  return mode === "full" || side === "primary";
}

function mainsArea(model: Pick<StagingModel, "mainJets">, mode: ThrottleMode): number {
  const primary = jetBankArea(model.mainJets.primary);
  return mode === "part" ? primary : primary + jetBankArea(model.mainJets.secondary);
}

/** Total metering area (mains + open valves) at a gauge pressure, m². justBelow: the left-limit state. */
export function suppliedAreaAt(
  model: Pick<StagingModel, "mainJets" | "valves">,
  gaugePa: number,
  mode: ThrottleMode,
  justBelow = false,
): number {
  let area = mainsArea(model, mode);
  for (const v of model.valves) {
    if (!sideCounts(mode, v.side)) continue;
    if (justBelow ? valveIsOpenJustBelow(v, gaugePa) : valveIsOpen(v, gaugePa)) area += v.restrictionAreaM2;
  }
  return area;
}

/** The base areas and the reference air the needed area is scaled from. */
export interface Calibration {
  basePart: number;
  baseFull: number;
  referenceDensity: number;
  referenceAfr: number;
}

export function calibrationOf(model: StagingModel): Calibration {
  const referenceDensity =
    model.reference === undefined
      ? venturiAirAt(model, 0).densityKgM3
      : chargeDensity({ absolutePressurePa: model.reference.pressurePa, temperatureK: model.reference.temperatureK });
  const basePart = model.baseAreaM2?.partThrottle ?? suppliedAreaAt(model, 0, "part");
  const baseFull = model.baseAreaM2?.fullThrottle ?? suppliedAreaAt(model, 0, "full");
  if (!(basePart > 0 && baseFull > 0)) throw new RangeError("the base metering area must be positive");
  return { basePart, baseFull, referenceDensity, referenceAfr: targetAfrAt(model.target, 0) };
}

/** The factor sqrt(rho/rho_ref) * AFR_ref/AFR_target(p) by which the needed area exceeds the base area. */
export function demandFactor(model: StagingModel, cal: Calibration, gaugePa: number): number {
  const air = venturiAirAt(model, gaugePa);
  return Math.sqrt(air.densityKgM3 / cal.referenceDensity) * (cal.referenceAfr / targetAfrAt(model.target, gaugePa));
}

/**
 * The mixture (lambda, or AFR when the target is AFR) the carburetor gives at a gauge pressure with a given
 * metering area open: the calibration's mixture, leaned by sqrt(rho/rho_ref), richened by the area added
 * since the calibration. Independent of the target curve away from zero gauge.
 */
export function predictedMixtureAt(model: StagingModel, gaugePa: number, mode: ThrottleMode, suppliedAreaM2: number): number {
  validateModel(model);
  requirePositive("supplied area", suppliedAreaM2);
  const cal = calibrationOf(model);
  const air = venturiAirAt(model, gaugePa);
  const base = mode === "part" ? cal.basePart : cal.baseFull;
  return cal.referenceAfr * Math.sqrt(air.densityKgM3 / cal.referenceDensity) * (base / suppliedAreaM2);
}
