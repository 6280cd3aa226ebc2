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

/** A length in both display units, so the inch/mm switch needs no new computation. */
export interface LengthPair {
  in: number;
  mm: number;
}

/** An area in both display units. */
export interface AreaPair {
  in2: number;
  mm2: number;
}

export function lengthPair(m: number): LengthPair {
  return { in: tidy(fromSI("length", m, "in"), 7), mm: tidy(fromSI("length", m, "mm"), 5) };
}

export function areaPair(m2: number): AreaPair {
  return { in2: areaIn2(m2), mm2: areaMm2(m2) };
}
