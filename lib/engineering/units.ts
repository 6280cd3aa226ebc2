// Unit conversion at the edges. Everything inside lib/engineering is SI: m, m², Pa, kg/s, m³/s, K, kg/m³.
// Conversions go through a private mathjs instance that knows only units, plus the two pressure units
// mathjs lacks (inch of mercury and inch of water; their factors, like every other, live in unit-factors.ts).

import { create, createUnitDependencies, unitDependencies } from "mathjs";
import type { PressureReference } from "./types";
import { PA_PER_INH2O, PA_PER_INHG, STANDARD_ATMOSPHERE_PA } from "./unit-factors";

export * from "./unit-factors";

// mathjs types its dependency maps as possibly undefined under noUncheckedIndexedAccess; they are always there.
function dependency<T>(map: T | undefined, name: string): T {
  if (map === undefined) throw new Error(`mathjs: ${name} is missing`);
  return map;
}

const math = create({
  unitDependencies: dependency(unitDependencies, "unitDependencies"),
  createUnitDependencies: dependency(createUnitDependencies, "createUnitDependencies"),
});

math.createUnit({
  inHg: { definition: `${PA_PER_INHG} Pa` },
  inH2O: { definition: `${PA_PER_INH2O} Pa` },
});

export const LENGTH_UNITS = ["in", "mm", "m"] as const;
export const AREA_UNITS = ["in²", "mm²", "m²"] as const;
export const PRESSURE_UNITS = ["psi", "kPa", "Pa", "bar", "inHg", "inH2O"] as const;
export const MASS_FLOW_UNITS = ["lb/h", "kg/h", "g/s", "kg/s"] as const;
/** "gal/h" is the US liquid gallon (231 in³). */
export const VOLUME_FLOW_UNITS = ["cc/min", "L/h", "gal/h", "m³/s"] as const;
export const TEMPERATURE_UNITS = ["°F", "°C", "K"] as const;
/** "lb/gal" is pounds (mass) per US liquid gallon. */
export const DENSITY_UNITS = ["kg/m³", "g/cc", "lb/gal"] as const;
/** Engine displacement: litres, cubic inches, cubic centimetres. */
export const DISPLACEMENT_UNITS = ["L", "in³", "cc", "m³"] as const;
/** "hp" is mechanical horsepower (550 ft·lbf/s). */
export const POWER_UNITS = ["hp", "kW", "W"] as const;

export type LengthUnit = (typeof LENGTH_UNITS)[number];
export type AreaUnit = (typeof AREA_UNITS)[number];
export type PressureUnit = (typeof PRESSURE_UNITS)[number];
export type MassFlowUnit = (typeof MASS_FLOW_UNITS)[number];
export type VolumeFlowUnit = (typeof VOLUME_FLOW_UNITS)[number];
export type TemperatureUnit = (typeof TEMPERATURE_UNITS)[number];
export type DensityUnit = (typeof DENSITY_UNITS)[number];
export type DisplacementUnit = (typeof DISPLACEMENT_UNITS)[number];
export type PowerUnit = (typeof POWER_UNITS)[number];

/** The unit names each quantity kind accepts. */
export interface UnitsByKind {
  length: LengthUnit;
  area: AreaUnit;
  pressure: PressureUnit;
  massFlow: MassFlowUnit;
  volumeFlow: VolumeFlowUnit;
  temperature: TemperatureUnit;
  density: DensityUnit;
  displacement: DisplacementUnit;
  power: PowerUnit;
}

export type QuantityKind = keyof UnitsByKind;

export const UNITS_BY_KIND: { readonly [K in QuantityKind]: readonly UnitsByKind[K][] } = {
  length: LENGTH_UNITS,
  area: AREA_UNITS,
  pressure: PRESSURE_UNITS,
  massFlow: MASS_FLOW_UNITS,
  volumeFlow: VOLUME_FLOW_UNITS,
  temperature: TEMPERATURE_UNITS,
  density: DENSITY_UNITS,
  displacement: DISPLACEMENT_UNITS,
  power: POWER_UNITS,
};

// Our unit names -> mathjs unit expressions.
const MATHJS_UNIT: { readonly [K in QuantityKind]: Readonly<Record<UnitsByKind[K], string>> } = {
  length: { in: "in", mm: "mm", m: "m" },
  area: { "in²": "in^2", "mm²": "mm^2", "m²": "m^2" },
  pressure: { psi: "psi", kPa: "kPa", Pa: "Pa", bar: "bar", inHg: "inHg", inH2O: "inH2O" },
  massFlow: { "lb/h": "lbm/h", "kg/h": "kg/h", "g/s": "g/s", "kg/s": "kg/s" },
  volumeFlow: { "cc/min": "cc/min", "L/h": "L/h", "gal/h": "gal/h", "m³/s": "m^3/s" },
  temperature: { "°F": "degF", "°C": "degC", K: "K" },
  density: { "kg/m³": "kg/m^3", "g/cc": "g/cc", "lb/gal": "lbm/gal" },
  displacement: { L: "L", "in³": "in^3", cc: "cc", "m³": "m^3" },
  power: { hp: "hp", kW: "kW", W: "W" },
};

const MATHJS_SI: { readonly [K in QuantityKind]: string } = {
  length: "m",
  area: "m^2",
  pressure: "Pa",
  massFlow: "kg/s",
  volumeFlow: "m^3/s",
  temperature: "K",
  density: "kg/m^3",
  displacement: "m^3",
  power: "W",
};

function mathjsUnit<K extends QuantityKind>(kind: K, unit: UnitsByKind[K]): string {
  const table: Readonly<Record<string, string>> = MATHJS_UNIT[kind];
  const expr = table[unit];
  if (expr === undefined) throw new RangeError(`unit: "${String(unit)}" is not a ${kind} unit`);
  return expr;
}

function requireFinite(value: number, field: string): void {
  if (!Number.isFinite(value)) throw new RangeError(`${field}: expected a finite number, got ${value}`);
}

/**
 * Converts a value in the given unit to SI. Temperatures are points on the scale (68 °F -> 293.15 K), not
 * differences. Pressures here are plain magnitudes (a pressure difference across a jet, say); a pressure that
 * sits on a scale with a reference belongs in a `Pressure` (see `pressure()`).
 */
export function toSI<K extends QuantityKind>(kind: K, value: number, unit: UnitsByKind[K]): number {
  requireFinite(value, "value");
  return math.unit(value, mathjsUnit(kind, unit)).toNumber(MATHJS_SI[kind]);
}

/** Converts an SI value to the given unit; the inverse of `toSI`. */
export function fromSI<K extends QuantityKind>(kind: K, valueSI: number, unit: UnitsByKind[K]): number {
  requireFinite(valueSI, "valueSI");
  return math.unit(valueSI, MATHJS_SI[kind]).toNumber(mathjsUnit(kind, unit));
}

// ---------------------------------------------------------------------------------------------------------
// Pressures with a reference. A gauge pressure and an absolute pressure are different types, so a function
// that needs one cannot be handed the other without an explicit conversion.

export interface GaugePressure {
  readonly reference: "gauge";
  /** Pascals above (positive: boost) or below (negative: vacuum) the ambient atmosphere. */
  readonly pa: number;
}

export interface AbsolutePressure {
  readonly reference: "absolute";
  /** Pascals above a perfect vacuum; never negative. */
  readonly pa: number;
}

export type Pressure = GaugePressure | AbsolutePressure;

export function gaugePressure(pa: number): GaugePressure {
  requireFinite(pa, "pa");
  return { reference: "gauge", pa };
}

export function absolutePressure(pa: number): AbsolutePressure {
  requireFinite(pa, "pa");
  if (pa < 0) throw new RangeError(`pa: an absolute pressure cannot be negative, got ${pa} Pa`);
  return { reference: "absolute", pa };
}

/** A pressure read in the given unit, with its reference stated: `pressure(8, "psi", "gauge")`. */
export function pressure(value: number, unit: PressureUnit, reference: "gauge"): GaugePressure;
export function pressure(value: number, unit: PressureUnit, reference: "absolute"): AbsolutePressure;
export function pressure(value: number, unit: PressureUnit, reference: PressureReference): Pressure;
export function pressure(value: number, unit: PressureUnit, reference: PressureReference): Pressure {
  const pa = toSI("pressure", value, unit);
  return reference === "gauge" ? gaugePressure(pa) : absolutePressure(pa);
}

function requireAmbient(ambientPa: number): void {
  requireFinite(ambientPa, "ambientPa");
  if (ambientPa <= 0) throw new RangeError(`ambientPa: must be above zero, got ${ambientPa} Pa`);
}

/** Gauge pressure from an absolute one; the ambient defaults to the standard atmosphere. */
export function gaugeFromAbsolute(p: AbsolutePressure, ambientPa: number = STANDARD_ATMOSPHERE_PA): GaugePressure {
  requireAmbient(ambientPa);
  return { reference: "gauge", pa: p.pa - ambientPa };
}

/** Either kind of pressure as gauge. */
export function toGauge(p: Pressure, ambientPa: number = STANDARD_ATMOSPHERE_PA): GaugePressure {
  return p.reference === "gauge" ? p : gaugeFromAbsolute(p, ambientPa);
}
