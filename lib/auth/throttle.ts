import "server-only";
import { countFailedSignIns, recordSignInAttempt } from "@/db/sign-in-attempts";

// Guessing is slowed per account and per address. Limits are common practice for small internal apps.
export const SIGN_IN_WINDOW_MINUTES = 15;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_ADDRESS = 20;

export async function isSignInThrottled(email: string, address: string, now = new Date()): Promise<boolean> {
  const since = new Date(now.getTime() - SIGN_IN_WINDOW_MINUTES * 60_000);
  const failures = await countFailedSignIns({ email, address, since });
  return failures.byEmail >= MAX_FAILURES_PER_ACCOUNT || failures.byAddress >= MAX_FAILURES_PER_ADDRESS;
}

export { recordSignInAttempt };
