// Passwords a person can change, an admin can reset by mail (once, for an hour, stored hashed), and weak ones
// refused; every change ends the sessions issued before it.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { POST as createUserRoute } from "@/app/api/users/route";
import { POST as changePasswordRoute } from "@/app/api/account/password/route";
import { DELETE as endSessionsRoute } from "@/app/api/account/sessions/route";
import { POST as sendResetRoute } from "@/app/api/users/[id]/password-reset/route";
import { GET as listJobsRoute } from "@/app/api/jobs/route";
import { resetPasswordAction } from "@/app/(auth)/reset-password/actions";
import { changePasswordAction } from "@/app/(office)/account/actions";
import { verifyCredentials } from "@/lib/auth/credentials";
import { resetPassword } from "@/lib/auth/passwords";
import * as schema from "@/db/schema";
import { actAs, formData, jsonRequest, resetDatabase, testDb } from "./support/database";
import { mailSettled, startMailWorker } from "./support/mail-queue";
import { startMailFake, type MailFake } from "./support/fakes";
import { settle } from "./support/redirect";
import { setSessionUserId } from "./support/session-double";

let mail: MailFake;
beforeAll(async () => {
  mail = await startMailFake();
  // Mail goes through the queue: the worker the server would start sends it.
  await startMailWorker();
});
afterAll(async () => mail.stop());
beforeEach(async () => {
  await resetDatabase();
  // Whatever an earlier test queued is delivered before the count starts again.
  await mailSettled();
  mail.messages.length = 0;
});

const DEMO = "blockwright-demo";
const NEW = "copper lathe quiet harbor";
const listJobs = () => listJobsRoute(new Request("http://127.0.0.1/api/jobs"));
const signIn = (password: string, address = "10.0.7.1") => verifyCredentials({ email: "tuner@blockwright.test", password, address });

/** The first message with this subject, waited for (the queue's worker sends it a moment after the answer). */
async function messageTitled(subject: string) {
  for (let i = 0; i < 100 && !mail.messages.some((m) => m.subject === subject); i++) await new Promise((r) => setTimeout(r, 50));
  const found = mail.messages.find((m) => m.subject === subject);
  expect(found, `a message "${subject}"`).toBeTruthy();
  return found!;
}

describe("weak passwords are refused when an account is made", () => {
  it.each([
    ["ten spaces", " ".repeat(10)],
    ["the e-mail", "odile.marsh@blockwright.test"],
    ["the name", "OdileMarsh2026"],
    ["more than 72 bytes (bcrypt would ignore the rest)", "quiet-lathe-harbor-".repeat(4)],
  ])("%s: 400 on password", async (_what, password) => {
    await actAs("admin");
    const response = await createUserRoute(jsonRequest("/api/users", "POST", { name: "Odile Marsh", email: "odile.marsh@blockwright.test", role: "tuner", password }));
    expect(response.status).toBe(400);
    expect((await response.json()).error.field).toBe("password");
  });
});

describe("changing your own password", () => {
  it("needs the current one, ends the old session, and the new one signs in", async () => {
    await actAs("tuner");
    const wrong = await changePasswordRoute(jsonRequest("/api/account/password", "POST", { currentPassword: "not-it-at-all", newPassword: NEW }));
    expect(wrong.status).toBe(400);
    expect((await wrong.json()).error.field).toBe("currentPassword");
    const weak = await changePasswordRoute(jsonRequest("/api/account/password", "POST", { currentPassword: DEMO, newPassword: "tuner@blockwright.test" }));
    expect(weak.status).toBe(400);
    expect((await weak.json()).error.field).toBe("newPassword");
    expect((await changePasswordRoute(jsonRequest("/api/account/password", "POST", { currentPassword: DEMO, newPassword: NEW }))).status).toBe(204);
    expect((await listJobs()).status).toBe(401);
    await expect(signIn(DEMO)).rejects.toThrow();
    await expect(signIn(NEW, "10.0.7.2")).resolves.toMatchObject({ role: "tuner" });
    await messageTitled("Your Blockwright password was changed");
    // One notice, however the queue's worker is timed (a message of an earlier test may still arrive beside it).
    expect(mail.messages.filter((m) => m.subject === "Your Blockwright password was changed")).toHaveLength(1);
  });

  it("through the account page's form, then to sign-in", async () => {
    await actAs("machinist");
    const outcome = await settle(changePasswordAction(undefined, formData({ currentPassword: DEMO, newPassword: NEW, confirmPassword: NEW })));
    expect(outcome.redirectTo).toBe("/sign-in?notice=password-changed");
  });

  it("refuses two new passwords that differ, naming the second", async () => {
    await actAs("machinist");
    const result = await changePasswordAction(undefined, formData({ currentPassword: DEMO, newPassword: NEW, confirmPassword: `${NEW}!` }));
    expect(result.httpStatus).toBe(400);
    expect(result.error?.confirmPassword).toBeTruthy();
  });
});

describe("signing out everywhere", () => {
  it("every cookie issued before gets 401", async () => {
    await actAs("tuner");
    expect((await endSessionsRoute(new Request("http://127.0.0.1/api/account/sessions", { method: "DELETE" }))).status).toBe(204);
    expect((await listJobs()).status).toBe(401);
  });
});

describe("a reset link an admin sends", () => {
  async function sendReset(): Promise<{ token: string; tunerId: string; tunerVersion: number }> {
    const [tuner] = await testDb.select().from(schema.users).where(eq(schema.users.email, "tuner@blockwright.test"));
    await actAs("admin");
    const response = await sendResetRoute(new Request(`http://127.0.0.1/api/users/${tuner!.id}/password-reset`, { method: "POST" }), {
      params: Promise.resolve({ id: tuner!.id }),
    });
    expect(response.status).toBe(202);
    const message = await messageTitled("Set a new Blockwright password");
    expect(message.to && "text" in message.to ? message.to.text : "").toContain("tuner@blockwright.test");
    const link = /http\S+\/reset-password\?token=([A-Za-z0-9_-]{43})/.exec(message.text ?? "");
    expect(link).toBeTruthy();
    // The link's end, in the shop's zone (UTC here, the default): the stored expiry to the minute.
    const [stored] = await testDb.select().from(schema.passwordResetTokens);
    expect(message.text).toContain(`(until ${stored!.expiresAt.toISOString().slice(0, 16).replace("T", " ")} UTC)`);
    return { token: link![1]!, tunerId: tuner!.id, tunerVersion: tuner!.sessionVersion };
  }

  it("is stored only as a hash, works once, and ends the old sessions", async () => {
    const { token, tunerId, tunerVersion } = await sendReset();
    const stored = await testDb.select().from(schema.passwordResetTokens);
    expect(stored).toHaveLength(1);
    expect(stored[0]!.tokenHash).not.toContain(token);
    expect(JSON.stringify(stored)).not.toContain(token);
    await actAs("anonymous");
    const done = await settle(resetPasswordAction(undefined, formData({ token, newPassword: NEW, confirmPassword: NEW })));
    expect(done.redirectTo).toBe("/sign-in?notice=password-changed");
    await expect(signIn(NEW)).resolves.toMatchObject({ role: "tuner" });
    setSessionUserId(tunerId, tunerVersion);
    expect((await listJobs()).status).toBe(401);
    const again = await resetPasswordAction(undefined, formData({ token, newPassword: "another quiet harbor lathe", confirmPassword: "another quiet harbor lathe" }));
    expect(again.httpStatus).toBe(400);
    expect(again.error?.token).toBeTruthy();
  });

  it("stops working after an hour", async () => {
    const { token } = await sendReset();
    await expect(resetPassword({ token, newPassword: NEW }, new Date(Date.now() + 61 * 60_000))).rejects.toMatchObject({ status: 400, field: "token" });
  });

  it("is for admins only", async () => {
    const [tuner] = await testDb.select().from(schema.users).where(eq(schema.users.email, "tuner@blockwright.test"));
    await actAs("tuner");
    const response = await sendResetRoute(new Request(`http://127.0.0.1/api/users/${tuner!.id}/password-reset`, { method: "POST" }), {
      params: Promise.resolve({ id: tuner!.id }),
    });
    expect(response.status).toBe(403);
    expect(mail.messages).toHaveLength(0);
  });
});
