import "server-only";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { getDb, type Executor } from "./client";
import { recordAudit } from "./audit";
import { users, type UserRole } from "./schema";
import { RequestRefusal } from "@/db/refusal";

/** What the app may know about a user: never the password hash. */
export interface UserSummary {
  id: string;
  email: string;
  name: string;
  role: UserRole;
  active: boolean;
  lengthUnit: "in" | "mm";
}

const summaryColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  active: users.active,
  lengthUnit: users.lengthUnit,
};

export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

/** For the credentials check only: the one read that returns the hash. */
export async function getUserCredentials(email: string) {
  const [row] = await getDb()
    .select({ ...summaryColumns, passwordHash: users.passwordHash, sessionVersion: users.sessionVersion })
    .from(users)
    .where(eq(users.email, normalizeEmail(email)));
  return row;
}

/** The active user whose sessions of this version are still valid; undefined once the version was raised. */
export async function getSessionHolder(id: string, sessionVersion: number): Promise<UserSummary | undefined> {
  const [row] = await getDb()
    .select(summaryColumns)
    .from(users)
    .where(and(eq(users.id, id), eq(users.active, true), eq(users.sessionVersion, sessionVersion)));
  return row;
}

/** Ends every session of the user issued so far (sign out everywhere, new password, reset, deactivation). */
export async function endSessions(userId: string, db: Executor = getDb()): Promise<void> {
  await db
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1`, updatedAt: new Date() })
    .where(eq(users.id, userId));
}

export async function listUsers(): Promise<UserSummary[]> {
  return getDb().select(summaryColumns).from(users).orderBy(asc(users.name));
}

export async function listActiveUsersByRole(role: UserRole): Promise<UserSummary[]> {
  return getDb()
    .select(summaryColumns)
    .from(users)
    .where(and(eq(users.role, role), eq(users.active, true)))
    .orderBy(asc(users.name));
}

/** People who may hold a job as its tuner (tuners and admins); `activeOnly` for new assignments. */
export async function listTuners(options: { activeOnly: boolean }): Promise<{ id: string; name: string }[]> {
  return getDb()
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(and(inArray(users.role, ["tuner", "admin"]), options.activeOnly ? eq(users.active, true) : undefined))
    .orderBy(asc(users.name));
}

export class DuplicateEmailError extends Error {
  constructor(email: string) {
    super(`A user with the e-mail ${email} already exists`);
  }
}

export async function createUser(input: {
  actorId: string;
  email: string;
  name: string;
  role: UserRole;
  passwordHash: string;
}): Promise<UserSummary> {
  const email = normalizeEmail(input.email);
  return getDb().transaction(async (tx) => {
    const [existing] = await tx.select({ id: users.id }).from(users).where(eq(users.email, email));
    if (existing) throw new DuplicateEmailError(email);
    const [created] = await tx
      .insert(users)
      .values({ email, name: input.name.trim(), role: input.role, passwordHash: input.passwordHash })
      .returning(summaryColumns);
    if (!created) throw new Error("insert returned no row");
    await recordAudit(tx, input.actorId, "user.create", created.id, { email, role: input.role });
    return created;
  });
}

/**
 * Role changes and deactivation. The shop must always keep one active admin: the check and the change run in
 * one transaction holding the active admins' rows, so two admins demoted at once cannot both succeed.
 */
export async function updateUser(input: {
  actorId: string;
  userId: string;
  role?: UserRole;
  active?: boolean;
}): Promise<UserSummary | undefined> {
  return getDb().transaction(async (tx) => {
    const admins = await tx
      .select({ id: users.id })
      .from(users)
      .where(and(eq(users.role, "admin"), eq(users.active, true)))
      .orderBy(asc(users.id))
      .for("update");
    const isActiveAdmin = admins.some((admin) => admin.id === input.userId);
    const losesAdmin = isActiveAdmin && ((input.role !== undefined && input.role !== "admin") || input.active === false);
    if (losesAdmin && admins.length <= 1) {
      throw new RequestRefusal(409, "The shop needs at least one active admin.", input.role !== undefined && input.role !== "admin" ? "role" : "active");
    }
    const [updated] = await tx
      .update(users)
      .set({
        role: input.role,
        active: input.active,
        // Deactivation ends every session, so reactivating later does not bring old cookies back.
        ...(input.active === false ? { sessionVersion: sql`${users.sessionVersion} + 1` } : {}),
        updatedAt: new Date(),
      })
      .where(eq(users.id, input.userId))
      .returning(summaryColumns);
    if (updated) {
      await recordAudit(tx, input.actorId, "user.update", updated.id, { role: input.role, active: input.active });
    }
    return updated;
  });
}

export async function setLengthUnit(userId: string, lengthUnit: "in" | "mm"): Promise<void> {
  await getDb().update(users).set({ lengthUnit, updatedAt: new Date() }).where(eq(users.id, userId));
}

/** For checking the current password before a change: the one other read that returns the hash. */
export async function getPasswordHash(userId: string): Promise<string | undefined> {
  const [row] = await getDb().select({ passwordHash: users.passwordHash }).from(users).where(and(eq(users.id, userId), eq(users.active, true)));
  return row?.passwordHash;
}

/** Sets a new password hash and ends every session issued with the old one. */
export async function setPasswordHash(input: { actorId: string | null; userId: string; passwordHash: string; reason: string }, db: Executor = getDb()): Promise<void> {
  await db
    .update(users)
    .set({ passwordHash: input.passwordHash, sessionVersion: sql`${users.sessionVersion} + 1`, updatedAt: new Date() })
    .where(eq(users.id, input.userId));
  await recordAudit(db, input.actorId ?? input.userId, "user.password", input.userId, { reason: input.reason });
}

