import { z } from "zod";
import { drillLabelProblem, findDrill } from "@/lib/engineering/drills";
import type { FuelSpec } from "@/lib/engineering/fuels";
import { parseThread, type Thread } from "@/lib/engineering/threads";
import type { Drill } from "@/lib/engineering/types";
import { fuelDensity, positiveNumber } from "@/lib/forms/quantity/figures";

// JSON API fields that name trade items in words: a fuel, a list of drills, a list of threads.

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
