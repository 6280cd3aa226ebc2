import type { DisplacementUnit, PowerUnit, PressureUnit, TemperatureUnit } from "@/lib/engineering/units";

// The engine-and-fuel fields as the browser holds them (the new-job form and the edit form share them), and
// the units each quantity offers. Type-only imports: the forms are checked on the server, where the unit
// library lives.

export const DISPLACEMENT_UNITS = ["in³", "L", "cc"] as const satisfies readonly DisplacementUnit[];
export const POWER_UNITS = ["hp", "kW"] as const satisfies readonly PowerUnit[];
export const BOOST_UNITS = ["psi", "kPa", "bar"] as const satisfies readonly PressureUnit[];
export const TEMPERATURE_UNITS = ["°F", "°C", "K"] as const satisfies readonly TemperatureUnit[];
/** A barometer's station reading (absolute). */
export const AMBIENT_PRESSURE_UNITS = ["inHg", "kPa", "psi"] as const satisfies readonly PressureUnit[];
export const ELEVATION_UNITS = ["ft", "m"] as const;

export const DRILL_SYSTEM_OPTIONS = [
  { value: "inch", label: "Inch sizes (number, letter, fraction)" },
  { value: "metric", label: "Metric sizes" },
  { value: "mixed", label: "Both inch and metric" },
] as const;

export const FUEL_OPTIONS = [
  { value: "gasoline", label: "Gasoline" },
  { value: "ethanol", label: "Ethanol (E100)" },
  { value: "methanol", label: "Methanol" },
  { value: "blend", label: "Ethanol blend (E85, E30 …)" },
  { value: "custom", label: "Other: give density and stoichiometric AFR" },
] as const;

type Quantity<U extends string> = { value?: number; unit?: U };

export type JobFieldsForm = {
  carburetor?: string;
  displacement?: Quantity<(typeof DISPLACEMENT_UNITS)[number]>;
  fuelKind?: (typeof FUEL_OPTIONS)[number]["value"];
  ethanolPct?: number;
  fuelDensityKgM3?: number;
  fuelStoichAfr?: number;
  targetPower?: Quantity<(typeof POWER_UNITS)[number]>;
  peakBoost?: Quantity<(typeof BOOST_UNITS)[number]>;
  targetLambdaAtmosphere?: number;
  targetLambdaPeak?: number;
  intercooled?: boolean;
  chargeTemperature?: Quantity<(typeof TEMPERATURE_UNITS)[number]>;
  ambientTemperature?: Quantity<(typeof TEMPERATURE_UNITS)[number]>;
  ambientPressure?: Quantity<(typeof AMBIENT_PRESSURE_UNITS)[number]>;
  siteElevation?: Quantity<(typeof ELEVATION_UNITS)[number]>;
  cruiseLambda?: number;
  drillSystem?: (typeof DRILL_SYSTEM_OPTIONS)[number]["value"];
  compressorEfficiencyPct?: number;
  intercoolerEffectivenessPct?: number;
  useAllDrills?: boolean;
  notes?: string;
};
