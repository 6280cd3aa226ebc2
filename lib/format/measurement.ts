import type { PlannedMeasurement } from "@/lib/engineering/conversion-plan";
import { fromSI } from "@/lib/engineering/units";

/** A measured or planned value in the shop's units: lengths in inches (and mm), pressures in psi. */
export function formatMeasurement(quantity: PlannedMeasurement["quantity"], valueSi: number): string {
  if (quantity === "pressure") return `${fromSI("pressure", valueSi, "psi").toFixed(2)} psi`;
  return `${fromSI("length", valueSi, "in").toFixed(4)} in (${fromSI("length", valueSi, "mm").toFixed(3)} mm)`;
}

export function formatRange(m: PlannedMeasurement): string {
  return `${formatMeasurement(m.quantity, m.minSi)} to ${formatMeasurement(m.quantity, m.maxSi)}`;
}
