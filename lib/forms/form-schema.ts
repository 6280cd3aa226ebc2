import { z } from "zod";

// zod pieces for calculator forms. Conform turns the text of each input into a number (an empty box into
// undefined) before these run; the messages name the field the way its label does.

type Bound = { min?: number; minInclusive?: boolean; max?: number; maxInclusive?: boolean };

/**
 * No figure a calculator takes is larger than a million or, unless zero, smaller than a millionth in the unit it is
 * typed in: beyond that it is a slip (1e308, 5e-324) that would overflow or underflow the arithmetic.
 */
export const LARGEST_FIGURE = 1e6;
export const SMALLEST_FIGURE = 1e-6;

/**
 * What a shop can measure and what a carburetor job can need, per unit the forms offer: a non-zero figure under
 * `least` is below measuring resolution, one over `most` a unit mistake (a length of 40 in, a boost of 150 psi).
 * Our own limits, no published source; generous on both sides.
 */
export const PLAUSIBLE_RANGE: Readonly<Record<string, { least: number; most: number }>> = {
  in: { least: 0.0001, most: 40 },
  mm: { least: 0.001, most: 1000 },
  "in²": { least: 1e-7, most: 50 },
  "mm²": { least: 1e-4, most: 32000 },
  psi: { least: 0.01, most: 150 },
  kPa: { least: 0.1, most: 1000 },
  bar: { least: 0.001, most: 10 },
  inHg: { least: 0.01, most: 30 },
};

/** A number typed into a form box, with the field's own words in every message. */
export function formNumber(label: string, bound: Bound = {}) {
  const { min, minInclusive = false, max, maxInclusive = true } = bound;
  let schema = z
    .number({
      error: (issue) => (issue.input === undefined ? `Enter the ${label}.` : `The ${label} must be a number.`),
    })
    .refine((v) => Math.abs(v) <= LARGEST_FIGURE, { error: `The ${label} is far larger than any carburetor job needs: check the number.` })
    .refine((v) => v === 0 || Math.abs(v) >= SMALLEST_FIGURE, { error: `The ${label} is too small to be a measured figure: check the number.` });
  if (min !== undefined) {
    schema = minInclusive
      ? schema.min(min, { error: `The ${label} must be ${min} or more.` })
      : schema.gt(min, { error: `The ${label} must be more than ${min}.` });
  }
  if (max !== undefined) {
    schema = maxInclusive
      ? schema.max(max, { error: `The ${label} must be at most ${max}.` })
      : schema.lt(max, { error: `The ${label} must be less than ${max}.` });
  }
  return schema;
}

/** A whole number typed into a form box. */
export function formWholeNumber(label: string, min: number, max: number) {
  return formNumber(label, { min, minInclusive: true, max }).int({ error: `The ${label} must be a whole number.` });
}

/** Refuses a figure outside what a shop can measure or a job can need in its unit (PLAUSIBLE_RANGE), on `value`. */
function withinPlausibleRange(label: string) {
  return (q: { value?: number; unit: string }, ctx: z.RefinementCtx) => {
    const range = PLAUSIBLE_RANGE[q.unit];
    if (range === undefined || q.value === undefined) return;
    const size = Math.abs(q.value);
    if (size > range.most) {
      ctx.addIssue({ code: "custom", path: ["value"], message: `The ${label} is larger than any carburetor job needs (at most ${range.most} ${q.unit}): check the unit.` });
    } else if (size !== 0 && size < range.least) {
      ctx.addIssue({ code: "custom", path: ["value"], message: `The ${label} is finer than a shop measures (${range.least} ${q.unit}): check the number and the unit.` });
    }
  };
}

/** A value with the unit chosen beside it: fields `name.value` and `name.unit`. */
export function formQuantity<const U extends readonly [string, ...string[]]>(label: string, units: U, bound: Bound = { min: 0 }) {
  return z
    .object({
      value: formNumber(label, bound),
      unit: z.enum(units, { error: `Choose a unit for the ${label}: ${units.join(", ")}.` }),
    })
    .superRefine(withinPlausibleRange(label));
}

/** The same, but the box may stay empty: then the whole quantity is absent. */
export function optionalFormQuantity<const U extends readonly [string, ...string[]]>(label: string, units: U, bound: Bound = { min: 0 }) {
  return z
    .object({
      value: formNumber(label, bound).optional(),
      unit: z.enum(units, { error: `Choose a unit for the ${label}: ${units.join(", ")}.` }),
    })
    .superRefine(withinPlausibleRange(label))
    .optional()
    .transform((q) => (q?.value === undefined ? undefined : { value: q.value, unit: q.unit }));
}

const CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;

/**
 * Text typed into a form or sent as JSON: trimmed, within its length, and without control characters
 * (PostgreSQL refuses NUL; the others hide text). Line breaks and tabs are kept only in `multiline` fields.
 */
export function formText(label: string, bound: { min?: number; max: number; multiline?: boolean }) {
  const { min = 0, max, multiline = false } = bound;
  let schema = z.string({ error: `Enter the ${label}.` }).refine((v) => !CONTROL.test(v) && (multiline || !/[\t\n\r]/.test(v)), {
    error: `The ${label} must not contain control characters${multiline ? "" : " or line breaks"}.`,
  });
  if (min > 0) schema = schema.refine((v) => v.trim().length >= min, { error: min === 1 ? `Enter the ${label}.` : `The ${label} must be at least ${min} characters.` });
  return schema.refine((v) => v.trim().length <= max, { error: `Keep the ${label} under ${max} characters.` }).transform((v) => v.trim());
}
