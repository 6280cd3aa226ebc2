import "server-only";
import type { SubmissionResult } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import type { z } from "zod";
import type { UserRole } from "@/db/schema";
import { checkRole, type SessionUser } from "@/lib/auth/session";
import { RequestRefusal } from "@/lib/errors";

/** What every form action returns: Conform's reply plus the HTTP-like status of the outcome. */
export type FormResult = SubmissionResult<string[]> & { httpStatus: number; message?: string };


/**
 * The one wrapper for server actions: parse the form with its zod schema (400 with field errors),
 * load the session (401), check the role (403), then do the work. The work runs its writes in one
 * transaction inside the data layer.
 */
export async function runFormAction<Schema extends z.ZodType>(
  formData: FormData,
  options: {
    schema: Schema;
    roles: readonly UserRole[];
    work: (value: z.output<Schema>, user: SessionUser) => Promise<string | void>;
  },
): Promise<FormResult> {
  const submission = parseWithZod(formData, { schema: options.schema });
  if (submission.status !== "success") return { ...submission.reply(), httpStatus: 400 };
  const access = await checkRole(options.roles);
  if (!access.ok) return { ...submission.reply({ formErrors: [access.message] }), httpStatus: access.status };
  try {
    const message = await options.work(submission.value, access.user);
    return { ...submission.reply({ resetForm: true }), httpStatus: 200, message: message ?? undefined };
  } catch (error) {
    if (error instanceof RequestRefusal) {
      const fieldErrors = error.field ? { [error.field]: [error.message] } : {};
      return { ...submission.reply({ formErrors: [error.message], fieldErrors }), httpStatus: error.status };
    }
    throw error;
  }
}
