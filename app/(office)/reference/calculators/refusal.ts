import "server-only";
import { RequestRefusal } from "@/db/refusal";

/**
 * Runs a computation and turns its RangeError (an input the trade functions refuse) into a 400 the form
 * shows: on the field named, or above the form. `field` is one form field for every refusal, or a map from the
 * trade function's parameter (the part of its message before the colon) to the form field. Anything else is a
 * bug and goes up unchanged.
 */
export function refuseOutOfRange<T>(compute: () => T, field?: string | Readonly<Record<string, string>>): T {
  try {
    return compute();
  } catch (error) {
    if (error instanceof RangeError) {
      const named = typeof field === "string" ? field : field?.[error.message.split(":")[0] ?? ""];
      throw new RequestRefusal(400, `Cannot compute this: ${error.message}.`, named);
    }
    throw error;
  }
}
