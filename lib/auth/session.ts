import "server-only";
import { getServerSession } from "next-auth";
import { forbidden, redirect } from "next/navigation";
import { cache } from "react";
import { getSessionHolder, type UserSummary } from "@/db/users";
import { isDatabaseUnavailable } from "@/db/faults";
import type { UserRole } from "@/db/schema";

// The roles as the layers above the data layer name them.
export type { UserRole };
import { authOptions } from "./options";

export type SessionUser = UserSummary;

/**
 * The signed-in, still active user, or null. Role comes from the database, not from the cookie; the cookie's
 * session version must still be the user's (sign-out everywhere, a password change and deactivation raise it).
 * Within one server render or action (a layout and its page both ask) the cookie is decoded and the user read
 * once: React's request cache; a route handler asks once through apiRoute.
 */
export const getSessionUser = cache(async function getSessionUser(): Promise<SessionUser | null> {
  const session = (await getServerSession(authOptions)) as { userId?: string; sessionVersion?: number } | null;
  const userId = session?.userId;
  // A token without a version predates session versions, or was forged without one: not a session.
  if (!userId || typeof session.sessionVersion !== "number") return null;
  return (await getSessionHolder(userId, session.sessionVersion)) ?? null;
});

/**
 * For layouts: the session user (or null), or "database-down" while the database is not answering, so the layout
 * can say so instead of failing into the error page, whose message production hides.
 */
export async function getSessionUserOrDatabaseDown(): Promise<SessionUser | null | "database-down"> {
  try {
    return await getSessionUser();
  } catch (error) {
    if (isDatabaseUnavailable(error)) return "database-down";
    throw error;
  }
}

export type AccessCheck =
  | { ok: true; user: SessionUser }
  | { ok: false; status: 401 | 403; message: string };

/** The one role check used by pages, route handlers and server actions. */
export async function checkRole(roles: readonly UserRole[]): Promise<AccessCheck> {
  const user = await getSessionUser();
  if (!user) return { ok: false, status: 401, message: "Sign in to continue." };
  if (!roles.includes(user.role)) {
    return { ok: false, status: 403, message: "Your role does not allow this." };
  }
  return { ok: true, user };
}

/** For pages: anonymous users go to sign-in, the wrong role sees the forbidden page. */
export async function requireRole(roles: readonly UserRole[], returnTo = "/"): Promise<SessionUser> {
  const check = await checkRole(roles);
  if (check.ok) return check.user;
  if (check.status === 401) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  forbidden();
}

export const ALL_ROLES: readonly UserRole[] = ["admin", "tuner", "machinist"];
export const OFFICE_ROLES: readonly UserRole[] = ["admin", "tuner"];
