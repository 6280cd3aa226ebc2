import { z } from "zod";

// One sign-off from the bench: the readings the operation asks for, each with its unit, and a note.

export const BENCH_LENGTH_UNITS = ["in", "mm"] as const;
export const BENCH_PRESSURE_UNITS = ["psi", "kPa", "bar"] as const;

const reading = z.object({
  key: z.string().min(1).max(40),
  // Some phone keyboards offer a decimal comma instead of the point; an empty box is a missing reading, not 0.
  value: z.preprocess(
    (v) => (typeof v === "string" ? v.trim().replace(",", ".") || undefined : v),
    z.coerce.number({ error: "Enter the measured value." }).refine(Number.isFinite, { error: "Enter the measured value." }),
  ),
  unit: z.enum([...BENCH_LENGTH_UNITS, ...BENCH_PRESSURE_UNITS], { error: "Choose the unit you measured in." }),
});

export const signOffSchema = z.object({
  operationId: z.uuid({ error: "operationId must be an operation's id." }),
  note: z.string().trim().max(2000, { error: "Keep the note under 2000 characters." }).default(""),
  readings: z.array(reading).max(8).default([]),
});
export type SignOffInput = z.output<typeof signOffSchema>;
