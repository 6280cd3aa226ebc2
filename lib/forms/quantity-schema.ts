import { z } from "zod";
import { drillLabelProblem, findDrill } from "@/lib/engineering/drills";
import { LARGEST_FIGURE, SMALLEST_FIGURE } from "@/lib/forms/form-schema";
import type { FuelSpec } from "@/lib/engineering/fuels";
import { parseThread, type Thread } from "@/lib/engineering/threads";
import type { Drill } from "@/lib/engineering/types";
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
  z
    .number({ error: `${field} must be a number` })
    .refine(Number.isFinite, { error: `${field} must be a finite number` })
    .refine((v) => Math.abs(v) <= LARGEST_FIGURE, { error: `${field} is far larger than any carburetor job needs: check the number` })
    .refine((v) => v === 0 || Math.abs(v) >= SMALLEST_FIGURE, { error: `${field} is too small to be a measured figure: check the number` });

/** Liquid fuels from gasoline (about 745 kg/m³) to methanol (about 792) and beyond sit well inside 500-1500 kg/m³. */
export const FUEL_DENSITY_RANGE_KG_M3 = { min: 500, max: 1500 } as const;

/** A fuel density in kg/m³; a figure typed in g/cm³ (0.745) is refused with the conversion. */
export const fuelDensity = (field: string) =>
  finite(field).superRefine((v, ctx) => {
    const { min, max } = FUEL_DENSITY_RANGE_KG_M3;
    if (v >= min && v <= max) return;
    const hint = v > 0.5 && v < 1.5 ? `: ${v} looks like g/cm³, which is ${Number((v * 1000).toFixed(3))} kg/m³` : "";
    ctx.addIssue({ code: "custom", message: `${field} must be between ${min} and ${max} kg/m³${hint}` });
  });

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
      densityKgM3: fuelDensity("fuel.densityKgM3"),
      stoichAfr: positiveNumber("fuel.stoichAfr"),
    }),
  ],
  { error: 'fuel must be a fuel name such as "gasoline" or "E85", or { kind: "custom", densityKgM3, stoichAfr }' },
);

/**
 * A list of drills written with their series ("#2", "2 mm", "1/16", "A"), parsed to drills. A bare "2" is
 * refused: it could be the number drill, millimetres or inches.
 */
export const drillList = (field: string) =>
  z
    .array(
      z.string({ error: `${field} must be a list of drill labels` }).transform((label, ctx): Drill => {
        const drill = findDrill(label);
        if (drill === undefined) {
          ctx.addIssue({ code: "custom", message: drillLabelProblem(label) ?? `"${label}" is not a drill` });
          return z.NEVER;
        }
        return drill;
      }),
      { error: `${field} must be a list of drill labels` },
    )
    .min(1, { error: `${field} must name at least one drill` })
    .max(500, { error: `${field} may name at most 500 drills` });

/** A list of threads as a shop writes them ("4-40", "1/4-20", "M4x0.7"), parsed to threads. */
export const threadList = (field: string) =>
  z
    .array(
      z.string({ error: `${field} must be a list of thread labels` }).transform((label, ctx): Thread => {
        const thread = parseThread(label);
        if (thread === undefined) {
          ctx.addIssue({
            code: "custom",
            message: `"${label}" is not a thread in the tables: write a Unified size from #0 to 1/2 in ("4-40", "1/4-20") or ISO M1.6 to M12 ("M4x0.7")`,
          });
          return z.NEVER;
        }
        return thread;
      }),
      { error: `${field} must be a list of thread labels` },
    )
    .min(1, { error: `${field} must name at least one thread` })
    .max(200, { error: `${field} may name at most 200 threads` });
