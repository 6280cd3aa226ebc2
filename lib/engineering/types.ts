// Shared shapes of the trade computations. Everything is SI inside: metres, square metres, pascals,
// kilograms per second, kelvin, kilograms per cubic metre. Conversions happen at the edges (units.ts).

export type DrillSystem = "number" | "letter" | "fraction" | "metric";

/** One twist drill of a standard series (ASME B94.11M sizes; metric by ISO steps). */
export interface Drill {
  /** Label as the shop writes it: "#43", "Q", "1/8", "2.50 mm". */
  label: string;
  system: DrillSystem;
  /** Nominal diameter in metres. */
  diameterM: number;
}

/** Fuel properties the computations need. */
export interface FuelProperties {
  name: string;
  /** Liquid density near room temperature (15-20 °C), kg/m³. */
  densityKgM3: number;
  /** Stoichiometric air-fuel ratio by mass. */
  stoichAfr: number;
}

/** Pressure reference: gauge (relative to the atmosphere) or absolute. Never mixed silently. */
export type PressureReference = "gauge" | "absolute";
