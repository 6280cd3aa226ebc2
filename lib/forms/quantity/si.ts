import { z } from "zod";
import { toSI, type QuantityKind, type UnitsByKind } from "@/lib/engineering/units";
import { optionalQuantity, quantity, type QuantityRules } from "./quantity";

// The quantity field of ./quantity, turned into SI on parse for callers that store or compute in SI. Kept apart
// from ./quantity so client forms that only validate do not load the unit-conversion library.

/** The rules of ./quantity plus limits in SI, for bounds that do not depend on the unit typed. */
export type SIRules = QuantityRules & { si?: { min?: number; max?: number } };

type KindUnits<K extends QuantityKind> = readonly [UnitsByKind[K], ...UnitsByKind[K][]];

function toCheckedSI<K extends QuantityKind>(kind: K, label: string, limits: SIRules["si"] = {}) {
  return (q: { value: number; unit: UnitsByKind[K] }, ctx: z.RefinementCtx): number => {
    const si = toSI(kind, q.value, q.unit);
    if (kind === "temperature" && si <= 0) {
      ctx.addIssue({ code: "custom", path: ["value"], message: `The ${label} is below absolute zero.` });
      return z.NEVER;
    }
    if (limits.min !== undefined && si < limits.min) {
      ctx.addIssue({ code: "custom", path: ["value"], message: `The ${label} is smaller than any carburetor job meets: check the unit.` });
      return z.NEVER;
    }
    if (limits.max !== undefined && si > limits.max) {
      ctx.addIssue({ code: "custom", path: ["value"], message: `The ${label} is larger than any carburetor job needs: check the unit.` });
      return z.NEVER;
    }
    return si;
  };
}

/** A required quantity of `kind`, parsed to its SI number. */
export function quantityInSI<K extends QuantityKind>(kind: K, label: string, units: KindUnits<K>, rules: SIRules = { min: 0 }) {
  const { si, ...typed } = rules;
  return quantity(label, units, typed).transform(toCheckedSI(kind, label, si));
}

/** The same, optional: absent or an empty value box gives undefined. */
export function optionalQuantityInSI<K extends QuantityKind>(kind: K, label: string, units: KindUnits<K>, rules: SIRules = { min: 0 }) {
  const { si, ...typed } = rules;
  const convert = toCheckedSI(kind, label, si);
  return optionalQuantity(label, units, typed).transform((q, ctx) => (q === undefined ? undefined : convert(q, ctx)));
}
