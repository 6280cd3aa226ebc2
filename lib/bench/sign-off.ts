import "server-only";
import { amendSignOff, signOffOperation, type AmendOutcome, type SignOffOutcome } from "@/db/bench";
import type { Viewer } from "@/db/visibility";
import { toSI } from "@/lib/engineering/units";
import type { AmendSignOffInput, SignOffInput } from "@/lib/bench/sign-off-schema";
import { sendSignOffNotices } from "./notices";
import { RequestRefusal } from "@/db/refusal";

const PRESSURE_UNITS = new Set(["psi", "kPa", "bar"]);

/** The readings in SI by key, with what each unit measured (a length typed in psi is refused by the store). */
function readingsInSI(readings: SignOffInput["readings"]) {
  const measurements: Record<string, number> = {};
  const quantities: Record<string, "length" | "pressure"> = {};
  for (const [index, reading] of readings.entries()) {
    if (reading.value < 0) throw new RequestRefusal(400, "A measured value cannot be negative.", `readings.${index}.value`);
    const pressure = PRESSURE_UNITS.has(reading.unit);
    quantities[reading.key] = pressure ? "pressure" : "length";
    measurements[reading.key] = pressure
      ? toSI("pressure", reading.value, reading.unit as "psi" | "kPa" | "bar")
      : toSI("length", reading.value, reading.unit as "in" | "mm");
  }
  return { measurements, quantities };
}

/** Converts the readings to SI, signs the operation off, then tells the tuner what needs telling. */
export async function signOffFromBench(viewer: Viewer, input: SignOffInput): Promise<SignOffOutcome> {
  const { measurements, quantities } = readingsInSI(input.readings);
  const outcome = await signOffOperation(viewer, { operationId: input.operationId, measurements, quantities, note: input.note });
  await sendSignOffNotices(outcome);
  return outcome;
}

/**
 * Corrects a signed operation's readings (the signer or an admin, with a reason); tells the tuner when the
 * correction completes the job or leaves a reading outside plan.
 */
export async function amendFromBench(viewer: Viewer, input: AmendSignOffInput): Promise<AmendOutcome> {
  const { measurements, quantities } = readingsInSI(input.readings);
  const outcome = await amendSignOff(viewer, { operationId: input.operationId, measurements, quantities, reason: input.reason });
  await sendSignOffNotices({
    recorded: true,
    operationTitle: outcome.operationTitle,
    jobId: outcome.jobId,
    jobState: outcome.jobState,
    failed: outcome.amended.filter((a) => !a.passed).map(({ key, label }) => ({ key, label })),
    allSigned: outcome.verified,
    verified: outcome.verified,
  });
  return outcome;
}
