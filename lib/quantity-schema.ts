import { z } from "zod";
import type { FuelSpec } from "@/lib/engineering/fuels";
import {
  AREA_UNITS,
  LENGTH_UNITS,
  MASS_FLOW_UNITS,
  PRESSURE_UNITS,
  TEMPERATURE_UNITS,
  VOLUME_FLOW_UNITS,
} from "@/lib/engineering/units";

// zod pieces for inputs that carry their unit, shared by the JSON API and the forms.

const finite = (field: string) =>
  z.number({ error: `${field} must be a number` }).refine(Number.isFinite, { error: `${field} must be a finite number` });

export const positiveNumber = (field: string) => finite(field).refine((v) => v > 0, { error: `${field} must be greater than 0` });
export const nonNegativeNumber = (field: string) => finite(field).refine((v) => v >= 0, { error: `${field} must be 0 or more` });

function unitEnum<T extends readonly [string, ...string[]]>(units: T, what: string) {
  return z.enum(units, { error: `unit must be one of ${units.join(", ")} (${what})` });
}

export const lengthUnitSchema = unitEnum(LENGTH_UNITS, "length");
export const areaUnitSchema = unitEnum(AREA_UNITS, "area");
export const pressureUnitSchema = unitEnum(PRESSURE_UNITS, "pressure");
export const temperatureUnitSchema = unitEnum(TEMPERATURE_UNITS, "temperature");

export const FLOW_UNITS = [...MASS_FLOW_UNITS, ...VOLUME_FLOW_UNITS] as const;
export const flowUnitSchema = unitEnum(FLOW_UNITS, "fuel mass or volume flow");

export function isMassFlowUnit(unit: (typeof FLOW_UNITS)[number]): unit is (typeof MASS_FLOW_UNITS)[number] {
  return (MASS_FLOW_UNITS as readonly string[]).includes(unit);
}

export const positiveQuantity = <U extends z.ZodType>(field: string, unit: U) =>
  z.object({ value: positiveNumber(field), unit }, { error: `${field} must be { value, unit }` });

/** A fuel by name ("gasoline", "ethanol", "methanol", "E85", "E30") or described in full. */
export const fuelSchema = z.union(
  [
    z
      .string()
      .trim()
      .toLowerCase()
      .regex(/^(gasoline|ethanol|methanol|e(100|[1-9]?\d)(\.\d+)?)$/, {
        error: 'fuel must be "gasoline", "ethanol", "methanol" or an ethanol blend such as "E85"',
      })
      .transform((name): FuelSpec => {
        if (name === "gasoline" || name === "ethanol" || name === "methanol") return { kind: name };
        return { kind: "blend", ethanolPct: Number(name.slice(1)) };
      }),
    z.object({
      kind: z.literal("custom"),
      densityKgM3: positiveNumber("fuel.densityKgM3"),
      stoichAfr: positiveNumber("fuel.stoichAfr"),
    }),
  ],
  { error: 'fuel must be a fuel name such as "gasoline" or "E85", or { kind: "custom", densityKgM3, stoichAfr }' },
);
