import "server-only";
import { areaPair, lengthPair } from "@/lib/format/quantity-pairs";
import { fixed, formatArea, formatLength, type DisplayLengthUnit } from "@/lib/format/display";
import { fromSI, PA_PER_INHG } from "@/lib/engineering/units";

// Figures of the job pages, formatted on the server from SI. Fixed decimals per unit so that columns of
// figures line up; the unit always beside the number.

export function length(m: number, unit: DisplayLengthUnit): string {
  return formatLength(lengthPair(m), unit);
}

/** An area in both units, the user's first: "0.00312 in² · 2.013 mm²". */
export function areaBoth(m2: number, unit: DisplayLengthUnit): { first: string; second: string } {
  const pair = areaPair(m2);
  const other: DisplayLengthUnit = unit === "in" ? "mm" : "in";
  return { first: formatArea(pair, unit), second: formatArea(pair, other) };
}

export function area(m2: number, unit: DisplayLengthUnit): string {
  return formatArea(areaPair(m2), unit);
}

export function psi(pa: number, decimals = 1): string {
  return `${fixed(fromSI("pressure", pa, "psi"), decimals)} psi`;
}

export function inHg(pa: number, decimals = 1): string {
  return `${fixed(pa / PA_PER_INHG, decimals)} inHg`;
}

/** A manifold pressure as the shop reads it: vacuum in inHg below the atmosphere, boost in psi above. */
export function manifold(gaugePa: number): string {
  return gaugePa < 0 ? `${inHg(-gaugePa)} vacuum` : `${psi(gaugePa)} boost`;
}

export function percent(fraction: number, decimals = 1): string {
  return `${fixed(fraction * 100, decimals)} %`;
}

export function signedPercent(pct: number, decimals = 1): string {
  const text = fixed(pct, decimals);
  return pct > 0 && Number(text) !== 0 ? `+${text} %` : `${text} %`;
}

export function temperature(k: number, unit: DisplayLengthUnit): string {
  return unit === "in" ? `${fixed(fromSI("temperature", k, "°F"), 0)} °F` : `${fixed(fromSI("temperature", k, "°C"), 0)} °C`;
}

export function displacement(m3: number): string {
  return `${fixed(fromSI("displacement", m3, "L"), 2)} L · ${fixed(fromSI("displacement", m3, "in³"), 0)} in³`;
}

export function power(w: number): string {
  return `${fixed(fromSI("power", w, "hp"), 0)} hp · ${fixed(fromSI("power", w, "kW"), 0)} kW`;
}

export function drillSize(m: number, unit: DisplayLengthUnit): string {
  return formatLength(lengthPair(m), unit);
}
