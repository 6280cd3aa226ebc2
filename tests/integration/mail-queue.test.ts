// Outgoing mail waits in a queue in PostgreSQL: an action succeeds while the SMTP server is down, the message is
// tried again with a growing wait, and it is delivered once the server answers. The admin sees each message's state.
import { eq, sql } from "drizzle-orm";
import { renderToStaticMarkup } from "react-dom/server";
import type { ParsedMail } from "mailparser";
import type { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { POST as sendResetRoute } from "@/app/api/users/[id]/password-reset/route";
import { POST as changePasswordRoute } from "@/app/api/account/password/route";
import MailQueuePage from "@/app/(office)/shop/outbox/queue/page";
import { listMailQueue, type MailQueueEntry } from "@/lib/server/mail-queue";
import * as schema from "@/db/schema";
import { closedPort, listenForMail } from "./support/fakes";
import { actAs, jsonRequest, resetDatabase, testDb } from "./support/database";
import { startMailWorker } from "./support/mail-queue";

// Before the configuration is first read: SMTP points at a port where nothing answers, and a message gets three
// tries (two retries) after which it fails.
const smtpPort = await closedPort();
process.env.SMTP_HOST = "127.0.0.1";
process.env.SMTP_PORT = String(smtpPort);
process.env.MAIL_RETRY_LIMIT = "2";
// next.config.ts turns authInterrupts on, and the build inlines it as this variable; here there is no build.
process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = "true";

const received: ParsedMail[] = [];
let smtp: SMTPServer | undefined;

async function smtpUp(): Promise<void> {
  smtp = await listenForMail(smtpPort, received);
}

async function smtpDown(): Promise<void> {
  if (smtp) await new Promise<void>((resolve) => smtp!.close(() => resolve()));
  smtp = undefined;
}

async function waitFor(subject: string, done: (m: MailQueueEntry) => boolean, timeoutMs = 20_000): Promise<MailQueueEntry> {
  const until = Date.now() + timeoutMs;
  let last: MailQueueEntry | undefined;
  while (Date.now() < until) {
    last = (await listMailQueue()).find((m) => m.subject === subject);
    if (last && done(last)) return last;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`"${subject}" did not get there; last seen: ${JSON.stringify(last)}`);
}

async function tunerId(): Promise<string> {
  const [tuner] = await testDb.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, "tuner@blockwright.test"));
  return tuner!.id;
}

const sendReset = async (userId: string) =>
  sendResetRoute(new Request(`http://127.0.0.1/api/users/${userId}/password-reset`, { method: "POST" }), { params: Promise.resolve({ id: userId }) });

beforeAll(async () => {
  await startMailWorker();
});
afterAll(smtpDown);
beforeEach(async () => {
  await resetDatabase();
  received.length = 0;
});

describe("mail while the SMTP server is down", () => {
  it("the action succeeds at once, the message waits with the error, and it is delivered after the server comes up", async () => {
    const tuner = await tunerId();
    await actAs("admin");
    const started = Date.now();
    const response = await sendReset(tuner);
    expect(response.status).toBe(202);
    // Queued, not sent: the answer does not wait for SMTP (a direct send would have failed here).
    expect(Date.now() - started).toBeLessThan(5_000);

    const retrying = await waitFor("Set a new Blockwright password", (m) => m.state === "retrying");
    expect(retrying).toMatchObject({ to: "tuner@blockwright.test", tries: 1, maxTries: 3 });
    expect(retrying.lastError).toMatch(/ECONNREFUSED/);
    expect(received).toHaveLength(0);
    // The link is in the queue's table only sealed: a copy of the database does not hand out a reset link.
    const stored = await testDb.execute<{ data: string }>(sql`SELECT data::text AS data FROM pgboss.job WHERE id = ${retrying.id}::uuid`);
    expect(stored.rows[0]!.data).toContain("tuner@blockwright.test");
    expect(stored.rows[0]!.data).not.toContain("reset-password");

    await smtpUp();
    const sent = await waitFor("Set a new Blockwright password", (m) => m.state === "sent");
    expect(sent.tries).toBeGreaterThanOrEqual(2);
    expect(sent.lastError).toBeNull();
    expect(received).toHaveLength(1);
    expect(received[0]!.subject).toBe("Set a new Blockwright password");
    expect(received[0]!.text).toContain("/reset-password?token=");
  });

  it("gives up after the configured tries and keeps the last error", async () => {
    await smtpDown();
    await actAs("tuner");
    const response = await changePasswordRoute(jsonRequest("/api/account/password", "POST", { currentPassword: "blockwright-demo", newPassword: "copper lathe quiet harbor" }));
    expect(response.status).toBe(204);
    // Tries 1, 2 and 3: waits of 1-2 s and 2-4 s between them (MAIL_RETRY_DELAY_SECONDS=1, doubling, with jitter).
    const failed = await waitFor("Your Blockwright password was changed", (m) => m.state === "failed");
    expect(failed).toMatchObject({ tries: 3, maxTries: 3 });
    expect(failed.lastError).toMatch(/ECONNREFUSED/);
    expect(received).toHaveLength(0);
  });
});

describe("the mail queue page", () => {
  it("is for admins only, and shows recipient, subject, state and the last error", async () => {
    await smtpDown();
    await actAs("admin");
    await sendReset(await tunerId());
    await waitFor("Set a new Blockwright password", (m) => m.state === "retrying");

    await actAs("tuner");
    await expect(MailQueuePage()).rejects.toMatchObject({ digest: expect.stringContaining("403") });
    await actAs("anonymous");
    await expect(MailQueuePage()).rejects.toMatchObject({ digest: expect.stringContaining("/sign-in") });

    await actAs("admin");
    const html = renderToStaticMarkup(await MailQueuePage());
    expect(html).toContain("tuner@blockwright.test");
    expect(html).toContain("Set a new Blockwright password");
    expect(html).toContain("retrying");
    expect(html).toContain("ECONNREFUSED");
    // The sealed text (the reset link) is not on the page.
    expect(html).not.toContain("reset-password?token=");
  });
});
