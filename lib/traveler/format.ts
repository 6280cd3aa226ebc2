// Figures as the traveler prints them: inch first with millimetres beside, psi with kPa; fixed decimals per
// unit so that a column of figures lines up. The factors come from lib/engineering/unit-factors.

import { M2_PER_IN2, M2_PER_MM2, M3_PER_IN3, M3_PER_L, M_PER_IN, M_PER_MM, PA_PER_KPA, PA_PER_PSI } from "@/lib/engineering/unit-factors";
import { fixed } from "@/lib/format/display";

export function inches(m: number, decimals = 4): string {
  return `${fixed(m / M_PER_IN, decimals)} in`;
}

export function millimetres(m: number, decimals = 3): string {
  return `${fixed(m / M_PER_MM, decimals)} mm`;
}

/** "0.0890 in · 2.261 mm". */
export function lengthBoth(m: number): string {
  return `${inches(m)} · ${millimetres(m)}`;
}

export function squareInches(m2: number): string {
  return `${fixed(m2 / M2_PER_IN2, 5)} in²`;
}

export function squareMillimetres(m2: number): string {
  return `${fixed(m2 / M2_PER_MM2, 3)} mm²`;
}

export function psi(pa: number, decimals = 1): string {
  return `${fixed(pa / PA_PER_PSI, decimals)} psi`;
}

export function kilopascals(pa: number, decimals = 1): string {
  return `${fixed(pa / PA_PER_KPA, decimals)} kPa`;
}

/** "5.70 L · 348 in³". */
export function displacement(m3: number): string {
  return `${fixed(m3 / M3_PER_L, 2)} L · ${fixed(m3 / M3_PER_IN3, 0)} in³`;
}

/** A planned measurement in its unit, with the other unit beside. */
export function measured(quantity: "length" | "pressure", si: number): { main: string; other: string } {
  return quantity === "length" ? { main: inches(si), other: millimetres(si) } : { main: psi(si), other: kilopascals(si) };
}

/** "± 0.0010 in" when the band is symmetric about the plan, else "0.0600 – 0.2550 in". */
export function acceptance(quantity: "length" | "pressure", plannedSi: number, minSi: number, maxSi: number): string {
  const below = plannedSi - minSi;
  const above = maxSi - plannedSi;
  const unitless = (si: number) => (quantity === "length" ? fixed(si / M_PER_IN, 4) : fixed(si / PA_PER_PSI, 1));
  const unit = quantity === "length" ? "in" : "psi";
  if (Math.abs(below - above) <= 1e-9 * Math.max(1, Math.abs(plannedSi))) return `± ${unitless(below)} ${unit}`;
  return `${unitless(minSi)} – ${unitless(maxSi)} ${unit}`;
}
