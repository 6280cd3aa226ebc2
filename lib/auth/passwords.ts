import "server-only";
import { createHash, randomBytes } from "node:crypto";
import bcrypt from "bcryptjs";
import { consumePasswordReset, createPasswordReset, getPasswordResetHolder } from "@/db/password-resets";
import { endSessions, getPasswordHash, setPasswordHash } from "@/db/users";
import { formatDateTime } from "@/lib/format/dates";
import { getEnv, shopTimeZone } from "@/lib/server/env";
import { RequestRefusal } from "@/db/refusal";
import { sendMail, sendMailSafely } from "@/lib/server/mail";
import { passwordProblem } from "@/lib/auth/password-policy";
import { guessablePasswordProblem } from "./password-strength";
import type { SessionUser } from "./session";
import { hashPassword } from "./credentials";

/** How long a reset link works. */
export const RESET_LINK_MINUTES = 60;

function tokenHash(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

/** The form's rules, then how guessable the password is (server-side only: see password-strength.ts). */
export function refuseWeak(password: string, person: { email: string; name: string }, field: string): void {
  const problem = passwordProblem(password, person) ?? guessablePasswordProblem(password, [person.email, person.name]);
  if (problem) throw new RequestRefusal(400, problem, field);
}

/** A signed-in person sets a new password; every session, this one included, ends (they sign in again). */
export async function changeOwnPassword(user: SessionUser, input: { currentPassword: string; newPassword: string }): Promise<void> {
  const hash = await getPasswordHash(user.id);
  if (!hash || !(await bcrypt.compare(input.currentPassword, hash))) {
    throw new RequestRefusal(400, "That is not your current password.", "currentPassword");
  }
  refuseWeak(input.newPassword, user, "newPassword");
  if (input.newPassword === input.currentPassword) throw new RequestRefusal(400, "Choose a password you have not used here.", "newPassword");
  await setPasswordHash({ actorId: user.id, userId: user.id, passwordHash: await hashPassword(input.newPassword), reason: "changed by the user" });
  await notifyPasswordChanged(user);
}

// The person hears of every change, so one they did not make does not go unnoticed.
async function notifyPasswordChanged(person: { email: string; name: string }): Promise<void> {
  await sendMailSafely({
    to: [person.email],
    subject: "Your Blockwright password was changed",
    text: [
      `${person.name},`,
      "",
      "The password of your Blockwright account was just changed, and every session of yours was signed out.",
      "If you did not do this, tell the shop's admin at once: they can send you a link to set a new one.",
    ].join("\n"),
  });
}

/** Ends every session of the person, on every device, this one included. */
export async function signOutEverywhere(user: SessionUser): Promise<void> {
  await endSessions(user.id);
}

/** An admin mails a person a single-use link to set a new password; only the token's hash is kept. */
export async function sendPasswordReset(admin: SessionUser, userId: string, now = new Date()): Promise<void> {
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(now.getTime() + RESET_LINK_MINUTES * 60_000);
  const person = await createPasswordReset({ userId, tokenHash: tokenHash(token), createdBy: admin.id, expiresAt });
  if (!person) throw new RequestRefusal(404, "No such active user.", "userId");
  const link = new URL("/reset-password", getEnv().APP_BASE_URL);
  link.searchParams.set("token", token);
  await sendMail({
    to: [person.email],
    subject: "Set a new Blockwright password",
    text: [
      `${person.name},`,
      "",
      `${admin.name} sent you this link to set a new password. It works once, for ${RESET_LINK_MINUTES} minutes (until ${formatDateTime(expiresAt, shopTimeZone())}):`,
      "",
      link.toString(),
      "",
      "If you did not expect it, ignore this message and tell the shop's admin.",
    ].join("\n"),
  });
}

/** Who a reset link is for, or undefined once it is used, expired or the account deactivated. */
export async function resetLinkHolder(token: string, now = new Date()) {
  return getPasswordResetHolder(tokenHash(token), now);
}

/** Sets the password through a reset link, once. Every earlier session of the person ends. */
export async function resetPassword(input: { token: string; newPassword: string }, now = new Date()): Promise<void> {
  const holder = await getPasswordResetHolder(tokenHash(input.token), now);
  if (!holder) throw new RequestRefusal(400, "This link has expired or was already used: ask an admin for a new one.", "token");
  refuseWeak(input.newPassword, holder, "newPassword");
  const used = await consumePasswordReset({ tokenHash: tokenHash(input.token), passwordHash: await hashPassword(input.newPassword), now });
  if (!used) throw new RequestRefusal(400, "This link has expired or was already used: ask an admin for a new one.", "token");
  await notifyPasswordChanged(holder);
}
