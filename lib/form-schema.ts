import { z } from "zod";

// zod pieces for calculator forms. Conform turns the text of each input into a number (an empty box into
// undefined) before these run; the messages name the field the way its label does.

type Bound = { min?: number; minInclusive?: boolean; max?: number; maxInclusive?: boolean };

/** A number typed into a form box, with the field's own words in every message. */
export function formNumber(label: string, bound: Bound = {}) {
  const { min, minInclusive = false, max, maxInclusive = true } = bound;
  let schema = z.number({
    error: (issue) => (issue.input === undefined ? `Enter the ${label}.` : `The ${label} must be a number.`),
  });
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

/** A value with the unit chosen beside it: fields `name.value` and `name.unit`. */
export function formQuantity<const U extends readonly [string, ...string[]]>(label: string, units: U, bound: Bound = { min: 0 }) {
  return z.object({
    value: formNumber(label, bound),
    unit: z.enum(units, { error: `Choose a unit for the ${label}: ${units.join(", ")}.` }),
  });
}

/** The same, but the box may stay empty: then the whole quantity is absent. */
export function optionalFormQuantity<const U extends readonly [string, ...string[]]>(label: string, units: U, bound: Bound = { min: 0 }) {
  return z
    .object({
      value: formNumber(label, bound).optional(),
      unit: z.enum(units, { error: `Choose a unit for the ${label}: ${units.join(", ")}.` }),
    })
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
