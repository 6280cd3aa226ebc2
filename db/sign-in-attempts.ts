import "server-only";
import { and, count, eq, gt } from "drizzle-orm";
import { getDb } from "./client";
import { signInAttempts } from "./schema";
import { normalizeEmail } from "./users";

export async function recordSignInAttempt(input: { email: string; address: string; succeeded: boolean }) {
  await getDb()
    .insert(signInAttempts)
    .values({ email: normalizeEmail(input.email), address: input.address, succeeded: input.succeeded });
}

/** Failed tries since `since`, for one account and for one address. */
export async function countFailedSignIns(input: { email: string; address: string; since: Date }) {
  const db = getDb();
  const [byEmail] = await db
    .select({ n: count() })
    .from(signInAttempts)
    .where(
      and(
        eq(signInAttempts.email, normalizeEmail(input.email)),
        eq(signInAttempts.succeeded, false),
        gt(signInAttempts.at, input.since),
      ),
    );
  const [byAddress] = await db
    .select({ n: count() })
    .from(signInAttempts)
    .where(
      and(eq(signInAttempts.address, input.address), eq(signInAttempts.succeeded, false), gt(signInAttempts.at, input.since)),
    );
  return { byEmail: byEmail?.n ?? 0, byAddress: byAddress?.n ?? 0 };
}

