import "server-only";
import type { SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import type { z } from "zod";
import type { UserRole } from "@/db/schema";
import { checkRole, type SessionUser } from "@/lib/auth/session";
import { unstable_rethrow } from "next/navigation";
import { RequestRefusal } from "@/db/refusal";
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "@/db/faults";
import { log } from "@/lib/server/log";
import { CONTROL_CHARACTER_MESSAGE, findControlCharacterInForm } from "@/lib/http/control-characters";

/**
 * What every form action returns: Conform's reply plus the HTTP-like status of the outcome, a message for
 * the person, and for calculators the typed result they show beside the form.
 */
export type FormResult<Data = never> = SubmissionResult<string[]> & { httpStatus: number; message?: string; data?: Data };

/** What the work may return: a message alone (the older form), or a message and a result payload. */
export type WorkOutcome<Data> = string | void | { message?: string; data?: Data };

/**
 * The one wrapper for server actions: load the session (401), check the role (403), then parse the form
 * with its zod schema (400 with field errors; control characters such as NUL are refused naming the field),
 * then do the work. The work runs its writes in one transaction inside the data layer.
 *
 * resetForm (default true) clears the form after success, right for forms that create something;
 * calculators pass false so the entered values stay beside their result. A list intent (Conform's
 * add or remove row, submitted without JavaScript) is answered with the changed form and no work.
 */
export async function runFormAction<Schema extends z.ZodType, Data = never, Roles extends readonly UserRole[] | "public" = readonly UserRole[]>(
  formData: FormData,
  options: {
    schema: Schema;
    /** Who may submit; "public" only for the forms anyone must reach (setting a password from a reset link). */
    roles: Roles;
    resetForm?: boolean;
    work: (value: z.output<Schema>, user: Roles extends "public" ? null : SessionUser) => Promise<WorkOutcome<Data>>;
  },
): Promise<FormResult<Data>> {
  // Who is asking comes first: an anonymous or wrong-role caller learns nothing about the fields.
  let user: SessionUser | null = null;
  if (options.roles !== "public") {
    let access: Awaited<ReturnType<typeof checkRole>>;
    try {
      access = await checkRole(options.roles);
    } catch (error) {
      // The role is read from the database: while it is not answering, nobody's role can be checked.
      if (isDatabaseUnavailable(error)) return databaseUnavailable(error);
      throw error;
    }
    if (!access.ok) return { status: "error", error: { "": [access.message] }, httpStatus: access.status };
    user = access.user;
  }
  const submission = parseWithZod(formData, { schema: options.schema });
  const controlField = findControlCharacterInForm(formData);
  if (controlField) {
    const message = `${controlField} ${CONTROL_CHARACTER_MESSAGE}.`;
    return { ...submission.reply({ formErrors: [message], fieldErrors: { [controlField]: [message] } }), httpStatus: 400 };
  }
  if (submission.status === "error") return { ...submission.reply(), httpStatus: 400 };
  if (submission.status !== "success") return { ...submission.reply(), httpStatus: 200 };
  try {
    const outcome = await options.work(submission.value, user as Roles extends "public" ? null : SessionUser);
    const { message, data } = typeof outcome === "object" ? outcome : { message: outcome ?? undefined, data: undefined };
    return {
      ...submission.reply({ resetForm: options.resetForm ?? true }),
      httpStatus: 200,
      message: message ?? undefined,
      ...(data === undefined ? {} : { data }),
    };
  } catch (error) {
    if (error instanceof RequestRefusal) {
      const fieldErrors = error.field ? { [error.field]: [error.message] } : {};
      return { ...submission.reply({ formErrors: [error.message], fieldErrors }), httpStatus: error.status };
    }
    // redirect() and notFound() are Next's own signals, not failures.
    unstable_rethrow(error);
    // The entered values come back with the message: nothing was saved, and the same submission may be sent again.
    if (isDatabaseUnavailable(error)) return { ...submission.reply({ formErrors: [DATABASE_UNAVAILABLE_MESSAGE] }), ...databaseUnavailable(error) };
    // Logged here, redacted, rather than by Next, which would print the query's parameters.
    log.error({ err: error }, "form action failed");
    return { ...submission.reply({ formErrors: ["Something went wrong on the server."] }), httpStatus: 500 };
  }
}

/** The answer while the database is not answering (503): logged as a warning, not as a fault of the code. */
function databaseUnavailable(error: unknown): { status: "error"; error: Record<string, string[]>; httpStatus: 503 } {
  log.warn({ err: error }, "form action: database not answering");
  return { status: "error", error: { "": [DATABASE_UNAVAILABLE_MESSAGE] }, httpStatus: 503 };
}
