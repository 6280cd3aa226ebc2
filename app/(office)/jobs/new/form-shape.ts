import type { DisplacementUnit, PowerUnit, PressureUnit, TemperatureUnit } from "@/lib/engineering/units";

// The new-job form as the browser holds it (Conform's view of createJobSchema's fields) and the units each
// quantity offers. Type-only imports: the form is checked on the server, so the unit library stays there.

export const DISPLACEMENT_CHOICES = ["in³", "L", "cc"] as const satisfies readonly DisplacementUnit[];
export const POWER_CHOICES = ["hp", "kW"] as const satisfies readonly PowerUnit[];
export const BOOST_CHOICES = ["psi", "kPa", "bar"] as const satisfies readonly PressureUnit[];
export const TEMPERATURE_CHOICES = ["°F", "°C", "K"] as const satisfies readonly TemperatureUnit[];

export const FUEL_CHOICES = [
  { value: "gasoline", label: "Gasoline" },
  { value: "ethanol", label: "Ethanol (E100)" },
  { value: "methanol", label: "Methanol" },
  { value: "blend", label: "Ethanol blend (E85, E30 …)" },
  { value: "custom", label: "Other: give density and stoichiometric AFR" },
] as const;
export type FuelChoice = (typeof FUEL_CHOICES)[number]["value"];

type Quantity<U extends string> = { value?: number; unit?: U };

export type NewJobForm = {
  customerId?: string;
  newCustomerName?: string;
  tunerId?: string;
  carburetor?: string;
  displacement?: Quantity<(typeof DISPLACEMENT_CHOICES)[number]>;
  fuelKind?: FuelChoice;
  ethanolPct?: number;
  fuelDensityKgM3?: number;
  fuelStoichAfr?: number;
  targetPower?: Quantity<(typeof POWER_CHOICES)[number]>;
  peakBoost?: Quantity<(typeof BOOST_CHOICES)[number]>;
  targetLambdaAtmosphere?: number;
  targetLambdaPeak?: number;
  intercooled?: boolean;
  chargeTemperature?: Quantity<(typeof TEMPERATURE_CHOICES)[number]>;
  ambientTemperature?: Quantity<(typeof TEMPERATURE_CHOICES)[number]>;
  compressorEfficiencyPct?: number;
  intercoolerEffectivenessPct?: number;
  useAllDrills?: boolean;
  notes?: string;
};
