import { z } from "zod";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL, DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL } from "@/lib/engineering/restriction-limits";
import { optionalQuantity } from "@/lib/forms/quantity/quantity";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";

// Changes to the drill rack: one drill by its label, or a whole series at once.

const LABELS: ReadonlySet<string> = new Set(ALL_DRILLS.map((d) => d.label));
export const RACK_SYSTEMS = ["number", "letter", "fraction", "metric"] as const;

const stocked = z
  .enum(["true", "false"], { error: "stocked must be true (on the rack) or false (off the rack)." })
  .transform((v) => v === "true");

export const drillStockSchema = z.object({
  label: z
    .string({ error: "Choose a drill." })
    .refine((label) => LABELS.has(label), { error: "label must be a standard drill as the chart writes it, such as #43, Q, 1/8 or 2.50 mm." }),
  stocked,
});

export const drillSystemStockSchema = z.object({
  system: z.enum(RACK_SYSTEMS, { error: `system must be one of ${RACK_SYSTEMS.join(", ")}.` }),
  stocked,
});

// The shop's restriction limits. An empty choice keeps the default; the least web is typed in the viewer's
// unit and converted on the server.
const DIAMETER_BY_LABEL: ReadonlyMap<string, number> = new Map(ALL_DRILLS.map((d) => [d.label, d.diameterM]));

const restrictionDrill = (name: string) =>
  z
    .string()
    .optional()
    .refine((label) => label === undefined || LABELS.has(label), {
      error: `${name} must be a standard drill as the chart writes it, such as #70, 1/8 or 0.75 mm.`,
    });

export const shopLimitsSchema = z
  .object({
    smallestRestrictionDrill: restrictionDrill("The smallest restriction drill"),
    largestRestrictionDrill: restrictionDrill("The largest restriction drill"),
    minWeb: optionalQuantity("least web", FORM_LENGTH_UNITS, { min: 0, minInclusive: true }),
  })
  .superRefine((v, ctx) => {
    const smallest = v.smallestRestrictionDrill ?? DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL;
    const largest = v.largestRestrictionDrill ?? DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL;
    const small = DIAMETER_BY_LABEL.get(smallest);
    const large = DIAMETER_BY_LABEL.get(largest);
    if (small !== undefined && large !== undefined && small > large) {
      ctx.addIssue({
        code: "custom",
        path: ["smallestRestrictionDrill"],
        message: `The smallest restriction drill (${smallest}) must not be larger than the largest (${largest}).`,
      });
    }
  });

export type ShopLimitsInput = z.output<typeof shopLimitsSchema>;

// How dyno logs are read: above which throttle opening a reading is full throttle, and the width of a
// manifold-pressure bin. Empty keeps the default.
export const logSettingsSchema = z.object({
  fullThrottleAbovePct: z
    .number({ error: "The full-throttle threshold must be a number." })
    .min(1, { error: "The full-throttle threshold must be between 1 and 99 %." })
    .max(99, { error: "The full-throttle threshold must be between 1 and 99 %." })
    .optional(),
  binWidth: optionalQuantity("bin width", ["psi", "kPa"] as const, { min: 0 }),
});
