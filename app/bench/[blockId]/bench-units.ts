// The bench's own arithmetic, light enough for the phone: the units a machinist reads gauges in, the
// tolerance in the unit they chose, and the total area of gauged restriction holes. The server converts
// again with lib/engineering/units (mathjs) and decides; what the phone shows is a preview of that.

import { BENCH_LENGTH_UNITS, BENCH_PRESSURE_UNITS } from "@/lib/bench/reading-units";
import { M2_PER_IN2, M2_PER_MM2, M_PER_IN, M_PER_MM, PA_PER_BAR, PA_PER_KPA, PA_PER_PSI } from "@/lib/engineering/unit-factors";

export type BenchLengthUnit = (typeof BENCH_LENGTH_UNITS)[number];
export type BenchPressureUnit = (typeof BENCH_PRESSURE_UNITS)[number];
export type BenchUnit = BenchLengthUnit | BenchPressureUnit;

const SI_PER_UNIT: Record<BenchUnit, number> = {
  in: M_PER_IN,
  mm: M_PER_MM,
  psi: PA_PER_PSI,
  kPa: PA_PER_KPA,
  bar: PA_PER_BAR,
};

/** Decimals each unit is read to at the bench: pin gauges to ten-thousandths, gauges to hundredths. */
const DECIMALS: Record<BenchUnit, number> = { in: 4, mm: 3, psi: 2, kPa: 1, bar: 3 };

export function unitsFor(quantity: "length" | "pressure"): readonly BenchUnit[] {
  return quantity === "length" ? BENCH_LENGTH_UNITS : BENCH_PRESSURE_UNITS;
}

export function defaultUnit(quantity: "length" | "pressure"): BenchUnit {
  return quantity === "length" ? "in" : "psi";
}

export function toBenchSI(value: number, unit: BenchUnit): number {
  return value * SI_PER_UNIT[unit];
}

export function fromBenchSI(valueSi: number, unit: BenchUnit): number {
  return valueSi / SI_PER_UNIT[unit];
}

export function formatIn(valueSi: number, unit: BenchUnit): string {
  return `${fromBenchSI(valueSi, unit).toFixed(DECIMALS[unit])} ${unit}`;
}

/** "0.0880–0.0900 in": the accepted range in the chosen unit. */
export function formatTolerance(minSi: number, maxSi: number, unit: BenchUnit): string {
  const decimals = DECIMALS[unit];
  return `${fromBenchSI(minSi, unit).toFixed(decimals)}–${fromBenchSI(maxSi, unit).toFixed(decimals)} ${unit}`;
}

/**
 * A typed reading as a number, or undefined while it is empty or not a number yet. Accepts a decimal comma,
 * which some phone keyboards offer instead of the point.
 */
export function parseReading(text: string): number | undefined {
  const cleaned = text.trim().replace(",", ".");
  if (cleaned === "") return undefined;
  const value = Number(cleaned);
  return Number.isFinite(value) ? value : undefined;
}

/** The same rule as the server's: inside [min, max], allowing for floating-point rounding only. */
export function withinPlan(valueSi: number, minSi: number, maxSi: number): boolean {
  return valueSi >= minSi - 1e-12 && valueSi <= maxSi + 1e-12;
}

/** Flow area of round holes: the sum of pi/4 d^2. */
export function holesArea(diametersSi: readonly number[]): number {
  return diametersSi.reduce((sum, d) => sum + (Math.PI / 4) * d * d, 0);
}

/** An area in the length unit's square: in² to five decimals, mm² to three. */
export function formatArea(areaM2: number, unit: BenchLengthUnit): string {
  return unit === "in" ? `${(areaM2 / M2_PER_IN2).toFixed(5)} in²` : `${(areaM2 / M2_PER_MM2).toFixed(3)} mm²`;
}
