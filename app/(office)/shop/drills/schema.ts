import { z } from "zod";
import { ALL_DRILLS } from "@/lib/engineering/drills";

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
