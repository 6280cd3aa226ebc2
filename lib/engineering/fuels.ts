// Fuel properties: liquid density and stoichiometric air-fuel ratio (by mass) for gasoline, the two alcohols,
// ethanol-gasoline blends by volume, and a fuel the user describes. Lambda conversions.

import type { FuelProperties } from "./types";

// Gasoline: 14.7:1 is the ratio lambda readouts scale by for gasoline (common practice); Heywood, "Internal
// Combustion Engine Fundamentals", appendix D, lists 14.6 for a typical gasoline. Density 745 kg/m³ sits in the
// 720-775 kg/m³ band EN 228 allows at 15 °C (from memory). Real pump fuel varies by a few percent either way.
export const GASOLINE: FuelProperties = { name: "Gasoline", densityKgM3: 745, stoichAfr: 14.7 };
// Ethanol: stoichiometric 9.0:1 (Heywood, appendix D, from memory; chemistry: C2H5OH + 3 O2). Density 789 kg/m³
// at 20 °C (CRC Handbook of Chemistry and Physics, 0.7893 g/cm³, from memory).
export const ETHANOL: FuelProperties = { name: "Ethanol", densityKgM3: 789, stoichAfr: 9.0 };
// Methanol: stoichiometric 6.47:1 (Heywood, appendix D, from memory; chemistry: CH3OH + 1.5 O2). Density
// 791 kg/m³ at 20 °C (CRC Handbook, 0.7914 g/cm³, from memory).
export const METHANOL: FuelProperties = { name: "Methanol", densityKgM3: 791, stoichAfr: 6.47 };

export const FUEL_KINDS = ["gasoline", "ethanol", "methanol", "blend", "custom"] as const;
export type FuelKind = (typeof FUEL_KINDS)[number];

export const FUEL_KIND_LABELS: Readonly<Record<FuelKind, string>> = {
  gasoline: "Gasoline",
  ethanol: "Ethanol",
  methanol: "Methanol",
  blend: "Ethanol blend (E10, E85, ...)",
  custom: "Other fuel (density and stoichiometric ratio known)",
};

export type FuelSpec =
  | { kind: "gasoline" }
  | { kind: "ethanol" }
  | { kind: "methanol" }
  /** Ethanol in gasoline, percent by volume (E85: ethanolPct 85). Use the measured content where known. */
  | { kind: "blend"; ethanolPct: number }
  | { kind: "custom"; densityKgM3: number; stoichAfr: number; name?: string };

// Ranges for a described fuel: wide enough for light hydrocarbons through nitromethane (about 1140 kg/m³,
// 1.7:1), narrow enough to catch a density typed in g/cc or a ratio typed as lambda.
export const CUSTOM_DENSITY_RANGE_KG_M3 = { min: 500, max: 1500 } as const;
export const CUSTOM_STOICH_AFR_RANGE = { min: 1, max: 20 } as const;

function requireInRange(value: number, field: string, min: number, max: number, unit = ""): void {
  if (!Number.isFinite(value) || value < min || value > max) {
    throw new RangeError(`${field}: must be between ${min} and ${max}${unit}, got ${value}`);
  }
}

/**
 * Ethanol-gasoline blend by volume. Density mixes by volume (ideal mixing; the real blend shrinks by well under
 * 1 %). The air requirement adds by mass: stoich = w_e * 9.0 + (1 - w_e) * 14.7, with w_e the ethanol mass
 * fraction from the volume fraction and the two densities.
 */
export function ethanolBlend(ethanolPct: number): FuelProperties {
  requireInRange(ethanolPct, "ethanolPct", 0, 100, " %");
  const ve = ethanolPct / 100;
  const massEthanol = ve * ETHANOL.densityKgM3;
  const massGasoline = (1 - ve) * GASOLINE.densityKgM3;
  const we = massEthanol / (massEthanol + massGasoline);
  return {
    name: `E${Number(ethanolPct.toFixed(1))}`,
    densityKgM3: massEthanol + massGasoline,
    stoichAfr: we * ETHANOL.stoichAfr + (1 - we) * GASOLINE.stoichAfr,
  };
}

/** Density and stoichiometric ratio of the fuel described; out-of-range inputs throw a RangeError naming the field. */
export function fuelProperties(spec: FuelSpec): FuelProperties {
  switch (spec.kind) {
    case "gasoline":
      return { ...GASOLINE };
    case "ethanol":
      return { ...ETHANOL };
    case "methanol":
      return { ...METHANOL };
    case "blend":
      return ethanolBlend(spec.ethanolPct);
    case "custom": {
      const { min: dMin, max: dMax } = CUSTOM_DENSITY_RANGE_KG_M3;
      const { min: aMin, max: aMax } = CUSTOM_STOICH_AFR_RANGE;
      requireInRange(spec.densityKgM3, "densityKgM3", dMin, dMax, " kg/m³");
      requireInRange(spec.stoichAfr, "stoichAfr", aMin, aMax);
      const name = spec.name?.trim();
      return { name: name ? name : "Custom fuel", densityKgM3: spec.densityKgM3, stoichAfr: spec.stoichAfr };
    }
  }
}
