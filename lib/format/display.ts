import type { AreaPair, DrillDto, LengthPair } from "@/lib/format/quantity-pairs";

// Formatting for screens, safe in client components: values arrive converted (lib/calc-dto pairs), and
// this only chooses the unit and the number of decimals. Decimals are fixed per unit so columns align.

export type DisplayLengthUnit = "in" | "mm";

/** Decimals a shop reads each unit to: inch to ten-thousandths, millimetres to thousandths. */
const LENGTH_DECIMALS: Record<DisplayLengthUnit, number> = { in: 4, mm: 3 };
const AREA_DECIMALS: Record<DisplayLengthUnit, number> = { in: 5, mm: 3 };

export function fixed(value: number, decimals: number): string {
  // A minus sign, not a hyphen; and never "-0.000".
  const text = value.toFixed(decimals);
  return Number(text) === 0 ? (0).toFixed(decimals) : text.replace("-", "−");
}

export function lengthNumber(length: LengthPair, unit: DisplayLengthUnit): string {
  return fixed(length[unit], LENGTH_DECIMALS[unit]);
}

export function formatLength(length: LengthPair, unit: DisplayLengthUnit): string {
  return `${lengthNumber(length, unit)} ${unit}`;
}

export function areaValue(area: AreaPair, unit: DisplayLengthUnit): number {
  return unit === "in" ? area.in2 : area.mm2;
}

export function areaNumber(area: AreaPair, unit: DisplayLengthUnit): string {
  return fixed(areaValue(area, unit), AREA_DECIMALS[unit]);
}

export function areaUnitLabel(unit: DisplayLengthUnit): string {
  return unit === "in" ? "in²" : "mm²";
}

export function formatArea(area: AreaPair, unit: DisplayLengthUnit): string {
  return `${areaNumber(area, unit)} ${areaUnitLabel(unit)}`;
}

export function drillSize(drill: Pick<DrillDto, "inch" | "mm">, unit: DisplayLengthUnit): string {
  return unit === "in" ? fixed(drill.inch, 4) : fixed(drill.mm, 3);
}

export function formatPercent(value: number, decimals = 1): string {
  return `${fixed(value, decimals)} %`;
}
