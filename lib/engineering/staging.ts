// Enrichment staging: the carburetor's total metering area against manifold pressure, from vacuum to peak
// boost, compared with the area the target mixture needs; and a proposal of boost-valve setpoints and
// restriction areas that keeps the mixture inside a band.
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

import { chargeDensity, compressorOutletTemperature, intercoolerOutletTemperature } from "./engine-demand";
import { MAX_HOLES_PER_CHANNEL, solveHoleLayout, type HoleLayoutCandidate } from "./hole-layout";
import { seriesPairArea } from "./orifice";
import { requireFinite, requireInRange, requireInteger, requireNonNegative, requirePositive } from "./checks";
import type { Drill } from "./types";

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

function validateModel(model: StagingModel): void {
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

interface Calibration {
  basePart: number;
  baseFull: number;
  referenceDensity: number;
  referenceAfr: number;
}

function calibrationOf(model: StagingModel): Calibration {
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
function demandFactor(model: StagingModel, cal: Calibration, gaugePa: number): number {
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

/** Area the target mixture needs at a gauge pressure, m². */
export function neededAreaAt(model: StagingModel, gaugePa: number, mode: ThrottleMode): number {
  validateModel(model);
  const cal = calibrationOf(model);
  return (mode === "part" ? cal.basePart : cal.baseFull) * demandFactor(model, cal, gaugePa);
}

// ---------------------------------------------------------------------------------------------------------
// Sweep

export interface StagingSweepOptions {
  /** First gauge pressure, Pa (a vacuum is negative). */
  fromGaugePa: number;
  /** Last gauge pressure, Pa. */
  toGaugePa: number;
  /** Evenly spaced points, at least 2. Every valve's opening pressure inside the range is added. */
  points: number;
  /** Half-width of the acceptable mixture band as a fraction: 0.05 accepts ratios 0.95 to 1.05. */
  band: number;
  /**
   * Lowest gauge pressure at which the engine can be at full throttle (default: the whole range). Deeper
   * vacuum only happens at part throttle, so full-throttle zones are not reported below it.
   */
  fullThrottleFromGaugePa?: number | undefined;
}

export interface MixtureCurve {
  suppliedM2: number[];
  neededM2: number[];
  /** supplied / needed: above 1 rich, below 1 lean. */
  ratio: number[];
  /** AFR (or lambda, if the target was given as lambda) the mixture actually has. */
  afr: number[];
}

export interface MixtureZone {
  mode: ThrottleMode;
  kind: "lean" | "rich";
  fromGaugePa: number;
  toGaugePa: number;
  /** The ratio furthest outside the band in the zone. */
  worstRatio: number;
}

export interface StagingSweep {
  gaugePa: number[];
  venturiTemperatureK: number[];
  venturiDensityKgM3: number[];
  targetAfr: number[];
  /** Ids of the valves open at each point. */
  openValveIds: string[][];
  part: MixtureCurve;
  full: MixtureCurve;
  /** Runs of consecutive points outside the band, per mode. */
  zones: MixtureZone[];
  baseAreaM2: { partThrottle: number; fullThrottle: number };
}

function sweepGrid(model: StagingModel, options: StagingSweepOptions): number[] {
  const from = requireFinite("fromGaugePa", options.fromGaugePa);
  const to = requireFinite("toGaugePa", options.toGaugePa);
  if (!(to > from)) throw new RangeError("toGaugePa must be above fromGaugePa");
  const n = requireInteger("points", options.points, 2, 100_000);
  const grid: number[] = [];
  for (let i = 0; i < n; i++) grid.push(i === n - 1 ? to : from + ((to - from) * i) / (n - 1));
  for (const v of model.valves) {
    const p = valveOpeningGaugePa(v);
    if (p > from && p < to) grid.push(p);
  }
  grid.sort((a, b) => a - b);
  return grid.filter((p, i) => i === 0 || p !== grid[i - 1]);
}

export function sweepStaging(model: StagingModel, options: StagingSweepOptions): StagingSweep {
  validateModel(model);
  const band = requireInRange("band", options.band, 0, 1);
  const cal = calibrationOf(model);
  const gaugePa = sweepGrid(model, options);
  const result: StagingSweep = {
    gaugePa,
    venturiTemperatureK: [],
    venturiDensityKgM3: [],
    targetAfr: [],
    openValveIds: [],
    part: { suppliedM2: [], neededM2: [], ratio: [], afr: [] },
    full: { suppliedM2: [], neededM2: [], ratio: [], afr: [] },
    zones: [],
    baseAreaM2: { partThrottle: cal.basePart, fullThrottle: cal.baseFull },
  };
  for (const p of gaugePa) {
    const air = venturiAirAt(model, p);
    const afrTarget = targetAfrAt(model.target, p);
    const factor = Math.sqrt(air.densityKgM3 / cal.referenceDensity) * (cal.referenceAfr / afrTarget);
    result.venturiTemperatureK.push(air.temperatureK);
    result.venturiDensityKgM3.push(air.densityKgM3);
    result.targetAfr.push(afrTarget);
    result.openValveIds.push(model.valves.filter((v) => valveIsOpen(v, p)).map((v) => v.id));
    for (const mode of ["part", "full"] as const) {
      const curve = result[mode];
      const supplied = suppliedAreaAt(model, p, mode);
      const needed = (mode === "part" ? cal.basePart : cal.baseFull) * factor;
      const ratio = supplied / needed;
      curve.suppliedM2.push(supplied);
      curve.neededM2.push(needed);
      curve.ratio.push(ratio);
      curve.afr.push(afrTarget / ratio);
    }
  }
  const fullFrom = options.fullThrottleFromGaugePa ?? -Infinity;
  result.zones.push(...zonesOf("part", gaugePa, result.part.ratio, band));
  const fullStart = gaugePa.findIndex((p) => p >= fullFrom);
  if (fullStart !== -1) result.zones.push(...zonesOf("full", gaugePa.slice(fullStart), result.full.ratio.slice(fullStart), band));
  return result;
}

function zonesOf(mode: ThrottleMode, gaugePa: readonly number[], ratio: readonly number[], band: number): MixtureZone[] {
  const zones: MixtureZone[] = [];
  let open: MixtureZone | undefined;
  for (let i = 0; i < ratio.length; i++) {
    const r = ratio[i] as number;
    const p = gaugePa[i] as number;
    const kind = r < 1 - band ? "lean" : r > 1 + band ? "rich" : undefined;
    if (open !== undefined && open.kind === kind) {
      open.toGaugePa = p;
      if (kind === "lean" ? r < open.worstRatio : r > open.worstRatio) open.worstRatio = r;
      continue;
    }
    if (open !== undefined) zones.push(open);
    open = kind === undefined ? undefined : { mode, kind, fromGaugePa: p, toGaugePa: p, worstRatio: r };
  }
  if (open !== undefined) zones.push(open);
  return zones;
}

// ---------------------------------------------------------------------------------------------------------
// Balance between the sides

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

// ---------------------------------------------------------------------------------------------------------
// Proposal

export interface StagingProposalInput {
  /** Main jets and the valves that stay as they are (typically the vacuum valve). */
  model: StagingModel;
  /** How many boost valves to add, 1 to 6. */
  boostValves: number;
  /** Top of the boost range the mixture must hold over (from zero gauge), Pa. */
  peakBoostGaugePa: number;
  /** Half-width of the acceptable band (fraction), for withinBand. */
  band: number;
  /** Candidate setpoints, Pa gauge, each in (0, peak]. Default: 32 even steps up to the peak. */
  setpointGridPa?: readonly number[] | undefined;
  /** Side of each added valve, in opening order. Default: primary, secondary, primary, ... (primary first). */
  sides?: readonly CarburetorSide[] | undefined;
  /** Modes the mixture must hold in. Default: both part and full throttle. */
  modes?: readonly ThrottleMode[] | undefined;
  /** Flow window of the added boost valves, m²: caps the restriction area one valve can add. */
  valveWindowAreaM2?: number | undefined;
  /** When given, each area is turned into holes from these drills and the as-drilled area is used. */
  layout?:
    | { drills: readonly Drill[]; maxHoles: number; channelLengthM?: number | undefined; minWebM?: number | undefined }
    | undefined;
  /** Ids of the added valves. Default: boost-1, boost-2, ... */
  ids?: readonly string[] | undefined;
}

export interface ProposedBoostValve extends BoostPowerValve {
  /** Area the search asked for before any rounding to drills, m². */
  idealAreaM2: number;
  /** The hole layout chosen for idealAreaM2, when drills were given. */
  holes?: HoleLayoutCandidate | undefined;
}

export interface StagingProposal {
  valves: ProposedBoostValve[];
  /** The model with the proposed valves added: pass it to sweepStaging for the chart. */
  model: StagingModel;
  /** Lowest and highest mixture ratio over the boost range, in the modes asked for. */
  leanestRatio: number;
  richestRatio: number;
  /** Largest |ratio - 1| over the boost range. */
  worstDeviation: number;
  withinBand: boolean;
}

/**
 * The rows a proposal is judged on: every pressure of the boost range the search looks at, in each mode,
 * both just below the pressure and at it, so the leanest instant of a step (just before the next valve
 * opens) is seen exactly. Between rows the needed area is monotone, so the extremes sit on rows.
 *
 * Rows are in blocks, one per mode, each sorted by pressure with the just-below row first; a valve set at
 * any pressure is therefore shut on a leading run of each block and open on the rest.
 */
interface Rows {
  n: number;
  needed: Float64Array;
  fixedSupplied: Float64Array;
  blocks: { part: boolean; start: number; end: number }[];
  /** openFrom[b * gridLength + g]: first row of block b where a valve set at grid[g] is open. */
  openFrom: Int32Array;
}

function buildRows(
  model: StagingModel,
  cal: Calibration,
  pressures: readonly number[],
  modes: readonly ThrottleMode[],
  grid: Float64Array,
): Rows {
  const uniqueModes = [...new Set(modes)];
  const perBlock = pressures.reduce((count, p) => count + (p > 0 ? 2 : 1), 0);
  const n = perBlock * uniqueModes.length;
  const rows: Rows = {
    n,
    needed: new Float64Array(n),
    fixedSupplied: new Float64Array(n),
    blocks: [],
    openFrom: new Int32Array(uniqueModes.length * grid.length),
  };
  const factors = pressures.map((p) => demandFactor(model, cal, p));
  let r = 0;
  uniqueModes.forEach((mode, b) => {
    const start = r;
    const base = mode === "part" ? cal.basePart : cal.baseFull;
    const rowPressure: number[] = [];
    const rowBelow: boolean[] = [];
    pressures.forEach((p, i) => {
      for (const below of p > 0 ? [true, false] : [false]) {
        rows.needed[r] = base * (factors[i] as number);
        rows.fixedSupplied[r] = suppliedAreaAt(model, p, mode, below);
        rowPressure.push(p);
        rowBelow.push(below);
        r++;
      }
    });
    rows.blocks.push({ part: mode === "part", start, end: r });
    grid.forEach((g, gi) => {
      let k = 0;
      while (k < rowPressure.length && !(rowBelow[k] ? (rowPressure[k] as number) > g : (rowPressure[k] as number) >= g)) k++;
      rows.openFrom[b * grid.length + gi] = start + k;
    });
  });
  return rows;
}

/** Search state: valve v opens at grid[setIndex[v]], adds area[v], on the primary side when primary[v] is 1. */
interface SearchState {
  grid: Float64Array;
  setIndex: Int32Array;
  area: Float64Array;
  primary: Uint8Array;
}

function valveCounts(block: { part: boolean }, primary: number): boolean {
  return !block.part || primary === 1;
}

/** Supplied area on every row with all the search's valves except `skip` (-1: none) added to the fixed ones. */
function suppliedWithout(rows: Rows, s: SearchState, skip: number, out: Float64Array): void {
  out.set(rows.fixedSupplied);
  const gridLength = s.grid.length;
  for (let v = 0; v < s.area.length; v++) {
    if (v === skip) continue;
    const a = s.area[v] as number;
    for (let b = 0; b < rows.blocks.length; b++) {
      const block = rows.blocks[b] as Rows["blocks"][number];
      if (!valveCounts(block, s.primary[v] as number)) continue;
      for (let r = rows.openFrom[b * gridLength + (s.setIndex[v] as number)] as number; r < block.end; r++) {
        out[r] = (out[r] as number) + a;
      }
    }
  }
}

function ratioExtremes(rows: Rows, supplied: Float64Array): { lean: number; rich: number; worst: number } {
  let lean = Infinity;
  let rich = -Infinity;
  for (let r = 0; r < rows.n; r++) {
    const ratio = (supplied[r] as number) / (rows.needed[r] as number);
    if (ratio < lean) lean = ratio;
    if (ratio > rich) rich = ratio;
  }
  return { lean, rich, worst: Math.max(1 - lean, rich - 1) };
}

/**
 * Finds, for one valve with the others fixed, the best setpoint between its neighbours' and the best area
 * there (the one minimizing max |ratio - 1| over all rows). Rows where the valve is shut give a constant,
 * read from a running maximum; on the rows where it is open the deviation above 1 grows with the area and
 * the one below shrinks, so the optimum is where max(ratio) + min(ratio) = 2, found exactly by following
 * the two extreme rows (each a straight line in the area), or lies at a bound.
 */
class ValveOptimizer {
  private readonly prefixWorst: Float64Array;
  private readonly others: Float64Array;
  private readonly ratioAtZero: Float64Array;
  private readonly slope: Float64Array;
  private readonly rangeFrom = new Int32Array(4);
  private readonly rangeTo = new Int32Array(4);
  private ranges = 0;
  private maxRatio = 0;
  private minRatio = 0;
  private argMax = -1;
  private argMin = -1;
  area = 0;
  worst = 0;

  constructor(private readonly rows: Rows) {
    this.prefixWorst = new Float64Array(rows.n);
    this.others = new Float64Array(rows.n);
    this.ratioAtZero = new Float64Array(rows.n);
    this.slope = new Float64Array(rows.n);
    for (let r = 0; r < rows.n; r++) this.slope[r] = 1 / (rows.needed[r] as number);
  }

  /** Fixes the other valves: computes their supplied area and the running worst deviation per block. */
  prepare(s: SearchState, v: number): void {
    const rows = this.rows;
    suppliedWithout(rows, s, v, this.others);
    for (const block of rows.blocks) {
      let worst = 0;
      for (let r = block.start; r < block.end; r++) {
        const ratio = (this.others[r] as number) * (this.slope[r] as number);
        this.ratioAtZero[r] = ratio;
        const d = Math.abs(ratio - 1);
        if (d > worst) worst = d;
        this.prefixWorst[r] = worst;
      }
    }
  }

  private extremes(a: number): void {
    let maxRatio = -Infinity;
    let minRatio = Infinity;
    for (let k = 0; k < this.ranges; k++) {
      const to = this.rangeTo[k] as number;
      for (let r = this.rangeFrom[k] as number; r < to; r++) {
        const ratio = (this.ratioAtZero[r] as number) + a * (this.slope[r] as number);
        if (ratio > maxRatio) {
          maxRatio = ratio;
          this.argMax = r;
        }
        if (ratio < minRatio) {
          minRatio = ratio;
          this.argMin = r;
        }
      }
    }
    this.maxRatio = maxRatio;
    this.minRatio = minRatio;
  }

  /** Best area for valve v at grid index g, at most maxArea; sets this.area and this.worst. */
  solve(s: SearchState, v: number, g: number, maxArea: number): void {
    const rows = this.rows;
    const gridLength = s.grid.length;
    let closedWorst = 0;
    this.ranges = 0;
    for (let b = 0; b < rows.blocks.length; b++) {
      const block = rows.blocks[b] as Rows["blocks"][number];
      const from = valveCounts(block, s.primary[v] as number) ? (rows.openFrom[b * gridLength + g] as number) : block.end;
      if (from > block.start) closedWorst = Math.max(closedWorst, this.prefixWorst[from - 1] as number);
      if (from < block.end) {
        this.rangeFrom[this.ranges] = from;
        this.rangeTo[this.ranges] = block.end;
        this.ranges++;
      }
    }
    if (this.ranges === 0) {
      this.area = 0;
      this.worst = closedWorst;
      return;
    }
    let lo = 0;
    let hi = maxArea;
    let a: number;
    this.extremes(lo);
    if (this.maxRatio + this.minRatio >= 2) a = lo;
    else {
      this.extremes(hi);
      if (this.maxRatio + this.minRatio <= 2) a = hi;
      else {
        a = lo;
        this.extremes(a);
        for (let iteration = 0; iteration < 64; iteration++) {
          const i = this.argMax;
          const j = this.argMin;
          // Where the current extreme rows' lines sum to 2.
          let next =
            (2 - (this.ratioAtZero[i] as number) - (this.ratioAtZero[j] as number)) /
            ((this.slope[i] as number) + (this.slope[j] as number));
          if (!(next > lo && next < hi)) next = 0.5 * (lo + hi);
          this.extremes(next);
          const h = this.maxRatio + this.minRatio - 2;
          a = next;
          if ((this.argMax === i && this.argMin === j) || h === 0 || hi - lo <= maxArea * 1e-12) break;
          if (h < 0) lo = next;
          else hi = next;
        }
      }
    }
    this.extremes(a);
    this.area = a;
    this.worst = Math.max(closedWorst, this.maxRatio - 1, 1 - this.minRatio);
  }
}

/**
 * Staircase start for the search, full throttle only and ignoring the sides: for a trial band, walk up the
 * boost range and open a valve at the last grid point below the first pressure where the mixture leaves
 * the band, sized to put the mixture at the rich edge there. The smallest band n valves can hold this way
 * (bisection) gives the start. Falls back to valves spread evenly over the grid with no area.
 */
function staircaseStart(rows: Rows, s: SearchState, maxArea: number): void {
  const n = s.area.length;
  const grid = s.grid;
  const full = rows.blocks.findIndex((block) => !block.part);
  const block = rows.blocks[full === -1 ? 0 : full] as Rows["blocks"][number];
  const b = full === -1 ? 0 : full;
  const trialIndex = new Int32Array(n);
  const trialArea = new Float64Array(n);
  const tryBand = (band: number): boolean => {
    let used = 0;
    let added = 0;
    let g = 0;
    for (let r = block.start; r < block.end; r++) {
      const needed = rows.needed[r] as number;
      if (((rows.fixedSupplied[r] as number) + added) / needed >= 1 - band) continue;
      if (used === n) return false;
      // Leaves the band at row r: open a valve at the last grid point whose valve is open on row r.
      while (g + 1 < grid.length && (rows.openFrom[b * grid.length + g + 1] as number) <= r) g++;
      if ((rows.openFrom[b * grid.length + g] as number) > r) return false;
      if (used > 0 && g <= (trialIndex[used - 1] as number)) return false;
      const at = rows.openFrom[b * grid.length + g] as number;
      const area = Math.min(Math.max((1 + band) * (rows.needed[at] as number) - (rows.fixedSupplied[at] as number) - added, 0), maxArea);
      trialIndex[used] = g;
      trialArea[used] = area;
      used++;
      added += area;
      r = at - 1; // re-check from where the valve opens
    }
    for (let v = used; v < n; v++) {
      const next = v === 0 ? 0 : (trialIndex[v - 1] as number) + 1;
      if (next >= grid.length) return false;
      trialIndex[v] = next;
      trialArea[v] = 0;
    }
    return true;
  };
  let found = tryBand(1);
  if (found) {
    let lo = 0;
    let hi = 1;
    for (let i = 0; i < 40; i++) {
      const mid = 0.5 * (lo + hi);
      if (tryBand(mid)) hi = mid;
      else lo = mid;
    }
    found = tryBand(hi);
  }
  if (!found) {
    for (let v = 0; v < n; v++) {
      trialIndex[v] = Math.round(((v + 1) * (grid.length - 1)) / (n + 1));
      trialArea[v] = 0;
    }
    for (let v = 1; v < n; v++) trialIndex[v] = Math.max(trialIndex[v] as number, (trialIndex[v - 1] as number) + 1);
    for (let v = n - 1; v >= 0; v--) trialIndex[v] = Math.min(trialIndex[v] as number, grid.length - n + v);
  }
  s.setIndex.set(trialIndex);
  s.area.set(trialArea);
}

const MAX_BOOST_VALVES = 6;
const DEFAULT_GRID_STEPS = 32;
const EVALUATION_STEPS = 48;

export function proposeStaging(input: StagingProposalInput): StagingProposal {
  const model = input.model;
  validateModel(model);
  const n = requireInteger("boostValves", input.boostValves, 1, MAX_BOOST_VALVES);
  const peak = requirePositive("peakBoostGaugePa", input.peakBoostGaugePa);
  const band = requireInRange("band", input.band, 0, 1);
  const modes = input.modes ?? (["part", "full"] as const);
  if (modes.length === 0) throw new RangeError("modes must name at least one throttle mode");
  const sides = input.sides ?? Array.from({ length: n }, (_, i) => (i % 2 === 0 ? "primary" : "secondary"));
  if (sides.length !== n) throw new RangeError(`sides must name ${n} sides, got ${sides.length}`);
  const ids = input.ids ?? Array.from({ length: n }, (_, i) => `boost-${i + 1}`);
  if (ids.length !== n || new Set(ids).size !== n) throw new RangeError(`ids must name ${n} different valves`);
  for (const id of ids) if (model.valves.some((v) => v.id === id)) throw new RangeError(`valve id ${id} is already in the model`);

  const gridValues =
    input.setpointGridPa === undefined
      ? Array.from({ length: DEFAULT_GRID_STEPS }, (_, i) => ((i + 1) * peak) / DEFAULT_GRID_STEPS)
      : input.setpointGridPa.map((p, i) => {
          requireFinite(`setpointGridPa[${i}]`, p);
          if (!(p > 0 && p <= peak)) throw new RangeError(`setpointGridPa[${i}] must be above zero and at most the peak`);
          return p;
        });
  const grid = Float64Array.from(new Set(gridValues)).sort();
  if (grid.length < n) throw new RangeError(`the setpoint grid needs at least ${n} distinct points`);

  // Largest effective area one valve can add: its window, or what the largest drill gives, or (neither
  // given) twice the largest needed area, which no sensible stage reaches.
  let maxArea = Infinity;
  if (input.valveWindowAreaM2 !== undefined) maxArea = requirePositive("valveWindowAreaM2", input.valveWindowAreaM2);
  if (input.layout !== undefined && input.layout.drills.length > 0) {
    requireInteger("layout.maxHoles", input.layout.maxHoles, 1, MAX_HOLES_PER_CHANNEL);
    let largest = 0;
    for (const d of input.layout.drills) largest = Math.max(largest, d.diameterM);
    const holes = input.layout.maxHoles * (Math.PI / 4) * largest * largest;
    maxArea = Number.isFinite(maxArea) ? seriesPairArea(holes, maxArea) : holes;
  }

  // The calibration is the carburetor's before the added valves (they all open above zero gauge).
  const cal = calibrationOf(model);
  const pressures = new Set<number>(grid);
  for (let i = 0; i <= EVALUATION_STEPS; i++) pressures.add((peak * i) / EVALUATION_STEPS);
  for (const v of model.valves) {
    const p = valveOpeningGaugePa(v);
    if (p > 0 && p < peak) pressures.add(p);
  }
  const rows = buildRows(model, cal, [...pressures].sort((a, b) => a - b), modes, grid);
  if (!Number.isFinite(maxArea)) {
    let neededMax = 0;
    for (let r = 0; r < rows.n; r++) neededMax = Math.max(neededMax, rows.needed[r] as number);
    maxArea = 2 * neededMax;
  }

  const state: SearchState = {
    grid,
    setIndex: new Int32Array(n),
    area: new Float64Array(n),
    primary: Uint8Array.from(sides, (side) => (side === "primary" ? 1 : 0)),
  };
  staircaseStart(rows, state, maxArea);

  // Coordinate search: each valve in turn takes the setpoint (between its neighbours', keeping the opening
  // order) and the area that minimize the worst deviation, until a round improves nothing. A minimax search
  // stalls where the worst point needs two valves to move together, so after it settles, runs of
  // neighbouring valves are shifted together by one or two grid steps (areas re-fitted); a shift that helps
  // is kept and the coordinate search resumes.
  const optimizer = new ValveOptimizer(rows);
  const supplied = new Float64Array(rows.n);
  const worstNow = (): number => {
    suppliedWithout(rows, state, -1, supplied);
    return ratioExtremes(rows, supplied).worst;
  };
  const coordinateSearch = (): void => {
    let worst = worstNow();
    for (let round = 0; round < 50; round++) {
      const before = worst;
      for (let v = 0; v < n; v++) {
        optimizer.prepare(state, v);
        const first = v === 0 ? 0 : (state.setIndex[v - 1] as number) + 1;
        const last = v === n - 1 ? grid.length - 1 : (state.setIndex[v + 1] as number) - 1;
        optimizer.solve(state, v, state.setIndex[v] as number, maxArea);
        let bestIndex = state.setIndex[v] as number;
        let bestArea = optimizer.area;
        let bestWorst = optimizer.worst;
        for (let g = first; g <= last; g++) {
          if (g === bestIndex) continue;
          optimizer.solve(state, v, g, maxArea);
          if (optimizer.worst < bestWorst - 1e-12) {
            bestWorst = optimizer.worst;
            bestIndex = g;
            bestArea = optimizer.area;
          }
        }
        state.setIndex[v] = bestIndex;
        state.area[v] = bestArea;
        worst = bestWorst;
      }
      if (!(worst < before - 1e-9)) break;
    }
  };
  const refitAreas = (rounds: number): number => {
    for (let round = 0; round < rounds; round++) {
      for (let v = 0; v < n; v++) {
        optimizer.prepare(state, v);
        optimizer.solve(state, v, state.setIndex[v] as number, maxArea);
        state.area[v] = optimizer.area;
      }
    }
    return worstNow();
  };
  coordinateSearch();
  const savedIndex = new Int32Array(n);
  const savedArea = new Float64Array(n);
  for (let pass = 0; pass < 10 && n > 1; pass++) {
    let improved = false;
    const current = worstNow();
    for (let from = 0; from < n && !improved; from++) {
      for (let to = from + 1; to < n && !improved; to++) {
        for (const shift of [-2, -1, 1, 2]) {
          const lowest = (state.setIndex[from] as number) + shift;
          const highest = (state.setIndex[to] as number) + shift;
          if (lowest < (from === 0 ? 0 : (state.setIndex[from - 1] as number) + 1)) continue;
          if (highest > (to === n - 1 ? grid.length - 1 : (state.setIndex[to + 1] as number) - 1)) continue;
          savedIndex.set(state.setIndex);
          savedArea.set(state.area);
          for (let v = from; v <= to; v++) state.setIndex[v] = (state.setIndex[v] as number) + shift;
          if (refitAreas(3) < current - 1e-9) {
            improved = true;
            break;
          }
          state.setIndex.set(savedIndex);
          state.area.set(savedArea);
        }
      }
    }
    if (!improved) break;
    coordinateSearch();
  }

  // Holes: turn each area into the best layout, then let each setpoint move again with the drilled areas.
  const holes: (HoleLayoutCandidate | undefined)[] = new Array<HoleLayoutCandidate | undefined>(n).fill(undefined);
  const ideal = Float64Array.from(state.area);
  if (input.layout !== undefined) {
    for (let v = 0; v < n; v++) {
      if (!((ideal[v] as number) > 0)) continue;
      const [best] = solveHoleLayout({
        targetEffectiveAreaM2: ideal[v] as number,
        drills: input.layout.drills,
        maxHoles: input.layout.maxHoles,
        valveWindowAreaM2: input.valveWindowAreaM2,
        channelLengthM: input.layout.channelLengthM,
        minWebM: input.layout.minWebM,
        limit: 1,
      }).candidates;
      holes[v] = best;
      state.area[v] = best?.effectiveAreaM2 ?? 0;
    }
    for (let v = 0; v < n; v++) {
      const first = v === 0 ? 0 : (state.setIndex[v - 1] as number) + 1;
      const last = v === n - 1 ? grid.length - 1 : (state.setIndex[v + 1] as number) - 1;
      const current = state.setIndex[v] as number;
      let bestIndex = current;
      let bestWorst = worstNow();
      for (let g = first; g <= last; g++) {
        if (g === current) continue;
        state.setIndex[v] = g;
        const w = worstNow();
        if (w < bestWorst - 1e-12) {
          bestWorst = w;
          bestIndex = g;
        }
      }
      state.setIndex[v] = bestIndex;
    }
  }

  suppliedWithout(rows, state, -1, supplied);
  const final = ratioExtremes(rows, supplied);
  const valves: ProposedBoostValve[] = [];
  for (let v = 0; v < n; v++) {
    valves.push({
      id: ids[v] as string,
      side: sides[v] as CarburetorSide,
      kind: "boost",
      setpointPa: grid[state.setIndex[v] as number] as number,
      restrictionAreaM2: state.area[v] as number,
      idealAreaM2: ideal[v] as number,
      holes: holes[v],
    });
  }
  return {
    valves,
    model: {
      ...model,
      baseAreaM2: { partThrottle: cal.basePart, fullThrottle: cal.baseFull },
      valves: [
        ...model.valves,
        ...valves.map(({ id, side, kind, setpointPa, restrictionAreaM2 }) => ({ id, side, kind, setpointPa, restrictionAreaM2 })),
      ],
    },
    leanestRatio: final.lean,
    richestRatio: final.rich,
    worstDeviation: final.worst,
    withinBand: final.worst <= band,
  };
}
