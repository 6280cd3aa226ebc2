import { z } from "zod";
import { MAX_TAP_ENGAGEMENT_PCT, parseThread } from "@/lib/engineering/threads";
import { formNumber } from "@/lib/forms/quantity/figures";
import { quantity, optionalQuantity } from "@/lib/forms/quantity/quantity";
import { FORM_LENGTH_UNITS } from "@/lib/forms/quantity/units";

/** Up to the basic minor diameter's 83.3 %: a smaller drill leaves metal under the thread's root (ASME B1.1). */
export const engagementSchema = formNumber("thread engagement", { min: 0 }).max(MAX_TAP_ENGAGEMENT_PCT + 1e-9, {
  error: `The thread engagement must be at most ${MAX_TAP_ENGAGEMENT_PCT.toFixed(1)} %: a drill under the thread's basic minor diameter leaves metal the tap cannot cut.`,
});

/** Tap drill for a thread at a chosen engagement. */
export const tapDrillSchema = z.object({
  thread: z
    .string({ error: "Enter a thread, such as 4-40 or M3x0.5." })
    .trim()
    .max(40, { error: "Enter a thread, such as 4-40 or M3x0.5." })
    .refine((text) => parseThread(text) !== undefined, {
      error: "Not a thread in the chart: use a Unified size from #0 to 1/2 in (4-40, 1/4-20) or ISO M1.6 to M12 (M3x0.5).",
    }),
  engagement: engagementSchema,
});

export const PLUG_THREAD_SYSTEMS = ["unified", "metric", "both"] as const;

/** The plug for a measured passage. */
export const passagePlugSchema = z.object({
  threadSystem: z.enum(PLUG_THREAD_SYSTEMS, { error: "Choose the threads the shop taps." }),
  passage: quantity("passage diameter", FORM_LENGTH_UNITS),
  wall: quantity("wall thickness", FORM_LENGTH_UNITS, { min: 0, minInclusive: true }),
  depth: quantity("depth available", FORM_LENGTH_UNITS),
  engagement: engagementSchema,
  minWall: optionalQuantity("least wall to keep", FORM_LENGTH_UNITS, { min: 0, minInclusive: true }),
});

export type TapDrillInput = z.output<typeof tapDrillSchema>;
export type PassagePlugFormInput = z.output<typeof passagePlugSchema>;
