import "server-only";
import bcrypt from "bcryptjs";
import { getUserCredentials } from "@/db/users";
import type { UserRole } from "@/db/schema";
import { isSignInThrottled, recordSignInAttempt, SIGN_IN_WINDOW_MINUTES } from "./throttle";

export const THROTTLED_MESSAGE = `Too many failed sign-ins. Wait ${SIGN_IN_WINDOW_MINUTES} minutes and try again.`;
export const INVALID_MESSAGE = "Wrong e-mail or password, or the account is deactivated.";

export class SignInRefused extends Error {}

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, 10);
}

/**
 * Checks a sign-in: throttled first (so a locked account gives nothing away), then the password,
 * then whether the account is active. Every try is recorded.
 */
export async function verifyCredentials(input: { email: string; password: string; address: string }): Promise<{
  id: string;
  email: string;
  name: string;
  role: UserRole;
}> {
  const { email, password, address } = input;
  if (await isSignInThrottled(email, address)) throw new SignInRefused(THROTTLED_MESSAGE);
  const user = await getUserCredentials(email);
  const passwordOk = user ? await bcrypt.compare(password, user.passwordHash) : false;
  const ok = Boolean(user && passwordOk && user.active);
  await recordSignInAttempt({ email, address, succeeded: ok });
  if (!ok || !user) throw new SignInRefused(INVALID_MESSAGE);
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
