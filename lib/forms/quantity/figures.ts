import { z } from "zod";

// The numbers a form box or a JSON field carries. Conform turns the text of each input into a number (an
// empty box into undefined) before these run; every message names the field.

/**
 * No figure a calculator takes is larger than a million or, unless zero, smaller than a millionth in the unit it is
 * typed in: beyond that it is a slip (1e308, 5e-324) that would overflow or underflow the arithmetic.
 */
export const LARGEST_FIGURE = 1e6;
export const SMALLEST_FIGURE = 1e-6;

/** Bounds on a figure in the unit it is typed in; by default the minimum is exclusive and the maximum inclusive. */
export type Bound = { min?: number; minInclusive?: boolean; max?: number; maxInclusive?: boolean };

/** How the messages start: a form names the field by its label ("The peak boost"), the JSON API by its path ("cd"). */
type Wording = { subject: string; missing: string; notANumber: string; above: string; end: string };

function formWording(label: string): Wording {
  return { subject: `The ${label}`, missing: `Enter the ${label}.`, notANumber: `The ${label} must be a number.`, above: "more than", end: "." };
}

function fieldWording(field: string): Wording {
  return { subject: field, missing: `${field} must be a number`, notANumber: `${field} must be a number`, above: "greater than", end: "" };
}

function figure(words: Wording, bound: Bound = {}) {
  const { subject, end } = words;
  const { min, minInclusive = false, max, maxInclusive = true } = bound;
  let schema = z
    .number({ error: (issue) => (issue.input === undefined ? words.missing : words.notANumber) })
    .refine(Number.isFinite, { error: `${subject} must be a finite number${end}` })
    .refine((v) => Math.abs(v) <= LARGEST_FIGURE, { error: `${subject} is far larger than any carburetor job needs: check the number${end}` })
    .refine((v) => v === 0 || Math.abs(v) >= SMALLEST_FIGURE, { error: `${subject} is too small to be a measured figure: check the number${end}` });
  if (min !== undefined) {
    schema = minInclusive
      ? schema.min(min, { error: `${subject} must be ${min} or more${end}` })
      : schema.gt(min, { error: `${subject} must be ${words.above} ${min}${end}` });
  }
  if (max !== undefined) {
    schema = maxInclusive
      ? schema.max(max, { error: `${subject} must be at most ${max}${end}` })
      : schema.lt(max, { error: `${subject} must be less than ${max}${end}` });
  }
  return schema;
}

/** A number typed into a form box, with the field's label in every message. */
export function formNumber(label: string, bound: Bound = {}) {
  return figure(formWording(label), bound);
}

/** A whole number typed into a form box. */
export function formWholeNumber(label: string, min: number, max: number) {
  return formNumber(label, { min, minInclusive: true, max }).int({ error: `The ${label} must be a whole number.` });
}

/** A number a JSON field carries, named by its path; above zero. */
export const positiveNumber = (field: string) => figure(fieldWording(field), { min: 0 });

/** A number a JSON field carries, named by its path; zero or more. */
export const nonNegativeNumber = (field: string) => figure(fieldWording(field), { min: 0, minInclusive: true });

/** Liquid fuels from gasoline (about 745 kg/m³) to methanol (about 792) and beyond sit well inside 500-1500 kg/m³. */
export const FUEL_DENSITY_RANGE_KG_M3 = { min: 500, max: 1500 } as const;

/** A fuel density in kg/m³; a figure typed in g/cm³ (0.745) is refused with the conversion. */
export const fuelDensity = (field: string) =>
  figure(fieldWording(field)).superRefine((v, ctx) => {
    const { min, max } = FUEL_DENSITY_RANGE_KG_M3;
    if (v >= min && v <= max) return;
    const hint = v > 0.5 && v < 1.5 ? `: ${v} looks like g/cm³, which is ${Number((v * 1000).toFixed(3))} kg/m³` : "";
    ctx.addIssue({ code: "custom", message: `${field} must be between ${min} and ${max} kg/m³${hint}` });
  });
