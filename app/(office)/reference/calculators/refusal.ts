import "server-only";
import { RequestRefusal } from "@/lib/errors";

/**
 * Runs a computation and turns its RangeError (an input the trade functions refuse) into a 400 the form
 * shows: on the field named, or above the form. Anything else is a bug and goes up unchanged.
 */
export function refuseOutOfRange<T>(compute: () => T, field?: string): T {
  try {
    return compute();
  } catch (error) {
    if (error instanceof RangeError) throw new RequestRefusal(400, `Cannot compute this: ${error.message}.`, field);
    throw error;
  }
}
