import { z } from "zod";
import { toSI, UNITS_BY_KIND, type QuantityKind, type UnitsByKind } from "@/lib/engineering/units";

// A form or API field that carries its own unit: { value, unit }, turned into SI on parse. The same schema
// serves Conform (strings from FormData, coerced) and the JSON API (numbers).

/** Limits in SI: values must be above zero (or at least zero with allowZero), at least min and at most max. */
type Limits = { min?: number; max?: number; allowZero?: boolean };

function unitSchema<K extends QuantityKind>(kind: K, label: string, units?: readonly UnitsByKind[K][]) {
  const allowed = (units ?? UNITS_BY_KIND[kind]) as readonly string[];
  return z
    .string({ error: `Choose a unit for ${label}.` })
    .refine((u) => allowed.includes(u), { error: `${label}: the unit must be one of ${allowed.join(", ")}.` }) as unknown as z.ZodType<
    UnitsByKind[K]
  >;
}

/** Builds a required { value, unit } field that parses to SI, with limits given in SI. */
export function quantity<K extends QuantityKind>(kind: K, label: string, limits: Limits = {}, units?: readonly UnitsByKind[K][]) {
  return z
    .object({
      value: z.coerce.number({ error: `Enter ${label}.` }).refine(Number.isFinite, { error: `Enter ${label} as a number.` }),
      unit: unitSchema(kind, label, units),
    }, { error: `Enter ${label}.` })
    .transform((q, ctx) => {
      const si = toSI(kind, q.value, q.unit);
      const tooSmall = kind === "temperature" ? si <= 0 : limits.allowZero ? si < 0 : si <= 0;
      if (tooSmall) {
        const message = kind === "temperature" ? `${label} is below absolute zero.` : `${label} must be ${limits.allowZero ? "0 or more" : "greater than 0"}.`;
        ctx.addIssue({ code: "custom", path: ["value"], message });
        return z.NEVER;
      }
      if (limits.min !== undefined && si < limits.min) {
        ctx.addIssue({ code: "custom", path: ["value"], message: `${label} is smaller than any carburetor job meets: check the unit.` });
        return z.NEVER;
      }
      if (limits.max !== undefined && si > limits.max) {
        ctx.addIssue({ code: "custom", path: ["value"], message: `${label} is larger than any carburetor job needs: check the unit.` });
        return z.NEVER;
      }
      return si;
    });
}

/** The same field, optional: absent or an empty value means "not measured". */
export function optionalQuantity<K extends QuantityKind>(kind: K, label: string, limits: Limits = {}, units?: readonly UnitsByKind[K][]) {
  return z.preprocess(
    (raw) => {
      if (raw === undefined || raw === null || raw === "") return undefined;
      if (typeof raw === "object" && raw !== null && "value" in raw) {
        const value = (raw as { value?: unknown }).value;
        if (value === undefined || value === null || value === "") return undefined;
      }
      return raw;
    },
    quantity(kind, label, limits, units).optional(),
  );
}
