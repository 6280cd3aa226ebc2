import type { AreaUnit, LengthUnit, PressureUnit, TemperatureUnit } from "@/lib/engineering/units";

// The units the calculator forms offer, a shop's subset of what lib/engineering/units converts. Kept here
// (with type-only imports) so client forms validate without loading the unit-conversion library.

export const FORM_LENGTH_UNITS = ["in", "mm"] as const satisfies readonly LengthUnit[];
export const FORM_AREA_UNITS = ["in²", "mm²"] as const satisfies readonly AreaUnit[];
/** Boost and bench pressures. */
export const FORM_BOOST_UNITS = ["psi", "kPa", "bar"] as const satisfies readonly PressureUnit[];
/** Manifold vacuum, written as a positive number. */
export const FORM_VACUUM_UNITS = ["inHg", "kPa"] as const satisfies readonly PressureUnit[];
/** Valve opening points: a vacuum rating or a boost setpoint. */
export const FORM_OPENING_UNITS = ["inHg", "psi", "kPa"] as const satisfies readonly PressureUnit[];
export const FORM_TEMPERATURE_UNITS = ["°F", "°C"] as const satisfies readonly TemperatureUnit[];

export type FormLengthUnit = (typeof FORM_LENGTH_UNITS)[number];
export type FormAreaUnit = (typeof FORM_AREA_UNITS)[number];

/** The area unit that goes with a length unit. */
export function areaUnitFor(length: FormLengthUnit): FormAreaUnit {
  return length === "in" ? "in²" : "mm²";
}
