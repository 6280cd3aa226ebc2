import "server-only";
import { signOffOperation, type SignOffOutcome } from "@/db/bench";
import type { Viewer } from "@/db/visibility";
import { toSI } from "@/lib/engineering/units";
import type { SignOffInput } from "@/lib/bench/sign-off-schema";
import { sendSignOffNotices } from "./notices";
import { RequestRefusal } from "@/db/refusal";

const PRESSURE_UNITS = new Set(["psi", "kPa", "bar"]);

/** Converts the readings to SI, signs the operation off, then tells the tuner what needs telling. */
export async function signOffFromBench(viewer: Viewer, input: SignOffInput): Promise<SignOffOutcome> {
  const measurements: Record<string, number> = {};
  const quantities: Record<string, "length" | "pressure"> = {};
  for (const [index, reading] of input.readings.entries()) {
    if (reading.value < 0) throw new RequestRefusal(400, "A measured value cannot be negative.", `readings.${index}.value`);
    const pressure = PRESSURE_UNITS.has(reading.unit);
    quantities[reading.key] = pressure ? "pressure" : "length";
    measurements[reading.key] = pressure
      ? toSI("pressure", reading.value, reading.unit as "psi" | "kPa" | "bar")
      : toSI("length", reading.value, reading.unit as "in" | "mm");
  }
  const outcome = await signOffOperation(viewer, { operationId: input.operationId, measurements, quantities, note: input.note });
  await sendSignOffNotices(outcome);
  return outcome;
}
