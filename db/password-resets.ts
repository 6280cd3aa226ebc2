import "server-only";
import { and, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "./client";
import { recordAudit } from "./audit";
import { passwordResetTokens, users } from "./schema";
import { setPasswordHash } from "./users";

/** Keeps a reset an admin sent: only the token's hash; earlier unused resets of the user stop working. */
export async function createPasswordReset(input: { userId: string; tokenHash: string; createdBy: string; expiresAt: Date }): Promise<{ email: string; name: string } | undefined> {
  return getDb().transaction(async (tx) => {
    const [user] = await tx.select({ email: users.email, name: users.name }).from(users).where(and(eq(users.id, input.userId), eq(users.active, true)));
    if (!user) return undefined;
    await tx
      .update(passwordResetTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(passwordResetTokens.userId, input.userId), isNull(passwordResetTokens.usedAt)));
    await tx.insert(passwordResetTokens).values(input);
    await recordAudit(tx, input.createdBy, "user.password-reset-sent", input.userId, {});
    return user;
  });
}

/**
 * Uses a reset once: the token must be unused, unexpired and its user active. The row is locked, so two
 * submissions of the same link cannot both set a password. Returns false when the link is no good.
 */
export async function consumePasswordReset(input: { tokenHash: string; passwordHash: string; now: Date }): Promise<boolean> {
  return getDb().transaction(async (tx) => {
    const [reset] = await tx
      .select({ id: passwordResetTokens.id, userId: passwordResetTokens.userId })
      .from(passwordResetTokens)
      .innerJoin(users, eq(users.id, passwordResetTokens.userId))
      .where(
        and(
          eq(passwordResetTokens.tokenHash, input.tokenHash),
          isNull(passwordResetTokens.usedAt),
          gt(passwordResetTokens.expiresAt, input.now),
          eq(users.active, true),
        ),
      )
      .for("update", { of: passwordResetTokens });
    if (!reset) return false;
    await tx.update(passwordResetTokens).set({ usedAt: input.now }).where(eq(passwordResetTokens.id, reset.id));
    await setPasswordHash({ actorId: null, userId: reset.userId, passwordHash: input.passwordHash, reason: "reset link" }, tx);
    return true;
  });
}

/** The person a reset link is for, while it still works (for the page's greeting). */
export async function getPasswordResetHolder(tokenHash: string, now: Date): Promise<{ email: string; name: string } | undefined> {
  const [row] = await getDb()
    .select({ email: users.email, name: users.name })
    .from(passwordResetTokens)
    .innerJoin(users, eq(users.id, passwordResetTokens.userId))
    .where(and(eq(passwordResetTokens.tokenHash, tokenHash), isNull(passwordResetTokens.usedAt), gt(passwordResetTokens.expiresAt, now), eq(users.active, true)));
  return row;
}
