import "server-only";
import { and, eq, gt, or, sql } from "drizzle-orm";
import { getDb } from "./client";
import { signInAttempts } from "./schema";
import { normalizeEmail } from "./users";

export async function recordSignInAttempt(input: { email: string; address: string; succeeded: boolean }) {
  await getDb()
    .insert(signInAttempts)
    .values({ email: normalizeEmail(input.email), address: input.address, succeeded: input.succeeded });
}

export interface FailureTally {
  failures: number;
  last: Date | null;
}

/** Failed tries since `since` and the latest of them: for the account from this address, the account, and the address. */
export async function tallyFailedSignIns(input: { email: string; address: string; since: Date }): Promise<{
  pair: FailureTally;
  account: FailureTally;
  address: FailureTally;
}> {
  const email = normalizeEmail(input.email);
  const recent = and(eq(signInAttempts.succeeded, false), gt(signInAttempts.at, input.since));
  const isEmail = eq(signInAttempts.email, email);
  const isAddress = eq(signInAttempts.address, input.address);
  const both = and(isEmail, isAddress);
  const [row] = await getDb()
    .select({
      pairN: sql<number>`count(*) filter (where ${both})`.mapWith(Number),
      pairLast: sql<string | null>`max(${signInAttempts.at}) filter (where ${both})`,
      accountN: sql<number>`count(*) filter (where ${isEmail})`.mapWith(Number),
      accountLast: sql<string | null>`max(${signInAttempts.at}) filter (where ${isEmail})`,
      addressN: sql<number>`count(*) filter (where ${isAddress})`.mapWith(Number),
      addressLast: sql<string | null>`max(${signInAttempts.at}) filter (where ${isAddress})`,
    })
    .from(signInAttempts)
    .where(and(recent, or(isEmail, isAddress)));
  const asDate = (v: string | null | undefined) => (v ? new Date(v) : null);
  return {
    pair: { failures: row?.pairN ?? 0, last: asDate(row?.pairLast) },
    account: { failures: row?.accountN ?? 0, last: asDate(row?.accountLast) },
    address: { failures: row?.addressN ?? 0, last: asDate(row?.addressLast) },
  };
}
