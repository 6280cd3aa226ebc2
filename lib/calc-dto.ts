import type { Drill } from "@/lib/engineering/types";
import { fromSI } from "@/lib/engineering/units";

/** Removes binary floating-point noise from converted figures (0.08900000000000001 -> 0.089). */
export function tidy(value: number, digits = 6): number {
  return Number(value.toFixed(digits));
}

export interface DrillDto {
  label: string;
  system: Drill["system"];
  inch: number;
  mm: number;
}

export function drillDto(drill: Drill): DrillDto {
  return {
    label: drill.label,
    system: drill.system,
    inch: tidy(fromSI("length", drill.diameterM, "in")),
    mm: tidy(fromSI("length", drill.diameterM, "mm"), 4),
  };
}

export function areaIn2(areaM2: number): number {
  return tidy(fromSI("area", areaM2, "in²"), 8);
}

export function areaMm2(areaM2: number): number {
  return tidy(fromSI("area", areaM2, "mm²"), 5);
}
