"use server";

import { revalidatePath } from "next/cache";
import type { JobState } from "@/db/job-states";
import { ALL_ROLES } from "@/lib/auth/session";
import { amendFromBench, signOffFromBench } from "@/lib/bench/sign-off";
import { RequestRefusal } from "@/db/refusal";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { amendSignOffSchema, signOffSchema, type SignOffInput } from "@/lib/bench/sign-off-schema";

export interface SignOffResult {
  /** False when the operation was already signed (another phone, a retry): nothing was recorded twice. */
  recorded: boolean;
  jobState: JobState;
  failed: { key: string; label: string }[];
  verified: boolean;
}

/**
 * A refusal about one measurement names it by key (`measurements.hole-1`) or by its place in the list the
 * server received; the form's inputs are named readings[i].value, so the error is moved there to sit
 * beside the box the machinist typed into.
 */
function besideTheInput(error: unknown, readings: SignOffInput["readings"]): unknown {
  if (!(error instanceof RequestRefusal) || !error.field) return error;
  const byKey = /^measurements\.(.+)$/.exec(error.field);
  if (byKey) {
    const index = readings.findIndex((r) => r.key === byKey[1]);
    return index >= 0 ? new RequestRefusal(error.status, error.message, `readings[${index}].value`) : error;
  }
  const byReading = /^readings\.(.+)$/.exec(error.field);
  if (byReading && !/^\d+\.value$/.test(byReading[1]!)) {
    const index = readings.findIndex((r) => r.key === byReading[1]);
    if (index >= 0) return new RequestRefusal(error.status, error.message, `readings[${index}].value`);
  }
  const byIndex = /^readings\.(\d+)\.value$/.exec(error.field);
  if (byIndex) return new RequestRefusal(error.status, error.message, `readings[${byIndex[1]}].value`);
  return error;
}

/**
 * Signs one operation off from the bench page: its readings in the units the machinist chose, and a note.
 * Every role may sign; the data layer keeps machinists to released work, refuses a superseded revision
 * (409) and records a repeat as nothing (recorded: false).
 */
export async function signOffAction(_previous: FormResult<SignOffResult> | undefined, formData: FormData): Promise<FormResult<SignOffResult>> {
  const result = await runFormAction<typeof signOffSchema, SignOffResult>(formData, {
    schema: signOffSchema,
    roles: ALL_ROLES,
    resetForm: false,
    async work(value, user) {
      try {
        const outcome = await signOffFromBench(user, value);
        const data = { recorded: outcome.recorded, jobState: outcome.jobState, failed: outcome.failed, verified: outcome.verified };
        if (!outcome.recorded) return { message: "Already signed: nothing was recorded twice.", data };
        if (outcome.failed.length) return { message: `Signed. Outside plan: ${outcome.failed.map((f) => f.label).join(", ")}. The tuner is told.`, data };
        return { message: outcome.verified ? "Signed. Every operation is signed and within plan: the job is verified." : "Signed.", data };
      } catch (error) {
        throw besideTheInput(error, value.readings);
      }
    },
  });
  // Whatever happened, the page shows the truth again: a sign-off from another phone, a new revision.
  if (result.httpStatus !== 401 && result.httpStatus !== 403) revalidatePath("/bench/[blockId]", "page");
  return result;
}

export interface AmendResult {
  jobState: JobState;
  verified: boolean;
}

/**
 * Corrects a signed operation's readings from the bench page, with a reason: the signer or an admin (the store
 * refuses anyone else, and a verified job until an admin reopens it).
 */
export async function amendAction(_previous: FormResult<AmendResult> | undefined, formData: FormData): Promise<FormResult<AmendResult>> {
  const result = await runFormAction<typeof amendSignOffSchema, AmendResult>(formData, {
    schema: amendSignOffSchema,
    roles: ALL_ROLES,
    resetForm: false,
    async work(value, user) {
      try {
        const outcome = await amendFromBench(user, value);
        const data = { jobState: outcome.jobState, verified: outcome.verified };
        const still = outcome.failed.length ? ` Still outside plan: ${outcome.failed.map((f) => f.label).join(", ")}.` : "";
        return { message: outcome.verified ? "Corrected. Every operation is signed and within plan: the job is verified." : `Corrected.${still}`, data };
      } catch (error) {
        throw besideTheInput(error, value.readings);
      }
    },
  });
  if (result.httpStatus !== 401 && result.httpStatus !== 403) revalidatePath("/bench/[blockId]", "page");
  return result;
}
