import { z } from "zod";
import { quantity } from "@/lib/forms/quantity/quantity";
import { BENCH_LENGTH_UNITS, BENCH_PRESSURE_UNITS } from "./reading-units";

// One sign-off from the bench: the readings the operation asks for, each with its unit, and a note.

export { BENCH_LENGTH_UNITS, BENCH_PRESSURE_UNITS };

const reading = z
  .object({ key: z.string().min(1).max(40) })
  .and(quantity("measured value", [...BENCH_LENGTH_UNITS, ...BENCH_PRESSURE_UNITS], { decimalComma: true }));

export const signOffSchema = z.object({
  operationId: z.uuid({ error: "operationId must be an operation's id." }),
  note: z.string().trim().max(2000, { error: "Keep the note under 2000 characters." }).default(""),
  readings: z.array(reading).max(8).default([]),
});
export type SignOffInput = z.output<typeof signOffSchema>;
/** The form's fields as typed (before the schema parses them). */
export type SignOffFields = z.input<typeof signOffSchema>;

/** A correction of a signed operation's readings: the readings as they should have been, and why. */
export const amendSignOffSchema = z.object({
  operationId: z.uuid({ error: "operationId must be an operation's id." }),
  reason: z
    .string({ error: "Say why the reading is corrected." })
    .trim()
    .min(3, { error: "Say why the reading is corrected." })
    .max(500, { error: "Keep the reason under 500 characters." }),
  readings: z.array(reading, { error: "readings must be a list of { key, value, unit }." }).min(1, { error: "Give the corrected reading." }).max(8),
});
export type AmendSignOffInput = z.output<typeof amendSignOffSchema>;
/** The correction form's fields as typed. */
export type AmendSignOffFields = z.input<typeof amendSignOffSchema>;
