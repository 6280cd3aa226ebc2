import "server-only";
import { randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { getUserCredentials } from "@/db/users";
import type { UserRole } from "@/db/schema";
import { recordSignInAttempt, signInWaitSeconds } from "./throttle";

export const THROTTLED_MESSAGE = "Too many failed sign-ins.";
export const INVALID_MESSAGE = "Wrong e-mail or password, or the account is deactivated.";
const BCRYPT_COST = 10;

export class SignInRefused extends Error {}

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

// Compared against when no account has the e-mail, so an unknown address costs the same bcrypt work as a
// known one and the answer's timing does not tell which e-mails have accounts.
let dummyHash: Promise<string> | undefined;
function hashForUnknownAccount(): Promise<string> {
  dummyHash ??= bcrypt.hash(randomBytes(18).toString("base64"), BCRYPT_COST);
  return dummyHash;
}

/**
 * Checks a sign-in: throttled first (so a slowed account gives nothing away), then the password (always one
 * bcrypt comparison), then whether the account is active. Every try that gets that far is recorded.
 */
export async function verifyCredentials(input: { email: string; password: string; address: string }): Promise<{
  id: string;
  email: string;
  name: string;
  role: UserRole;
  sessionVersion: number;
}> {
  const { email, password, address } = input;
  const wait = await signInWaitSeconds(email, address);
  if (wait > 0) throw new SignInRefused(`${THROTTLED_MESSAGE} Wait ${wait} seconds and try again.`);
  const user = await getUserCredentials(email);
  const passwordOk = await bcrypt.compare(password, user?.passwordHash ?? (await hashForUnknownAccount()));
  const ok = Boolean(user && passwordOk && user.active);
  await recordSignInAttempt({ email, address, succeeded: ok });
  if (!ok || !user) throw new SignInRefused(INVALID_MESSAGE);
  return { id: user.id, email: user.email, name: user.name, role: user.role, sessionVersion: user.sessionVersion };
}
