import { z } from "zod";
import { formNumber, type Bound } from "./figures";

// The one way to declare a quantity field: a value with the unit chosen beside it, fields `name.value` and
// `name.unit`, checked in the unit it was typed in. The same schema serves Conform (FormData, coerced by
// Conform) and the JSON API (numbers). inSI (./si) turns it into SI where the caller wants SI.

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

type Units = readonly [string, ...string[]];

/**
 * Bounds on the typed figure (by default above zero; pass {} for a figure that may be negative, such as a
 * temperature), and decimalComma for boxes a phone keyboard may fill with "0,089".
 */
export type QuantityRules = Bound & { decimalComma?: boolean };

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

function typedValue(label: string, rules: QuantityRules) {
  const { decimalComma = false, ...bound } = rules;
  const value = formNumber(label, bound);
  if (!decimalComma) return value;
  // Some phone keyboards offer a decimal comma instead of the point; an empty box is a missing reading, not 0.
  // Typed as the plain figure: what the box holds is text either way.
  return z.preprocess((v) => {
    if (typeof v !== "string") return v;
    const text = v.trim().replace(",", ".");
    return text === "" ? undefined : Number(text);
  }, value) as unknown as typeof value;
}

/** A required quantity: { value, unit } with value within its bounds and the unit one of `units`. */
export function quantity<const U extends Units>(label: string, units: U, rules: QuantityRules = { min: 0 }) {
  return z
    .object(
      {
        value: typedValue(label, rules),
        unit: z.enum(units, { error: `Choose a unit for the ${label}: ${units.join(", ")}.` }),
      },
      { error: `Enter the ${label}.` },
    )
    .superRefine(withinPlausibleRange(label));
}

/** True when a quantity was left out: no object, or an empty value box (a unit select always sends its unit). */
function isLeftOut(raw: unknown): boolean {
  if (raw === undefined || raw === null || raw === "") return true;
  if (typeof raw !== "object" || Array.isArray(raw)) return false;
  const value = (raw as { value?: unknown }).value;
  return value === undefined || value === null || value === "";
}

/** The same field, optional: absent, or an empty value box, means "not given" (undefined). */
export function optionalQuantity<const U extends Units>(label: string, units: U, rules: QuantityRules = { min: 0 }) {
  const field = quantity(label, units, rules);
  // Typed by what the form holds (the quantity's own input), not the preprocess step's `unknown`.
  return z.preprocess((raw) => (isLeftOut(raw) ? undefined : raw), field.optional()) as unknown as z.ZodType<
    z.output<typeof field> | undefined,
    z.input<typeof field> | undefined
  >;
}
