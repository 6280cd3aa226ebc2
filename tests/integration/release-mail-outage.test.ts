// A release while the SMTP server is down: the job is released all the same, its notice waits in the mail queue
// with the reason it was not sent, and once the server answers on that port the machinists get it, travelers
// attached.
import { eq } from "drizzle-orm";
import type { ParsedMail } from "mailparser";
import type { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import * as schema from "@/db/schema";
import { moveJob } from "@/lib/jobs/moves";
import { listMailQueue, type MailQueueEntry } from "@/lib/server/mail-queue";
import { closedPort, listenForMail } from "./support/fakes";
import { actAs, resetDatabase, testDb } from "./support/database";
import { makeJob } from "./support/jobs";
import { startMailWorker } from "./support/mail-queue";

// Before the configuration is first read: SMTP points at a port where nothing answers yet. Retries every 1, 2,
// 4, 8 s (MAIL_RETRY_DELAY_SECONDS=1 from setup.ts, doubling), so the message is still waiting when the server comes up.
const smtpPort = await closedPort();
process.env.SMTP_HOST = "127.0.0.1";
process.env.SMTP_PORT = String(smtpPort);
process.env.MAIL_RETRY_LIMIT = "6";

const received: ParsedMail[] = [];
let smtp: SMTPServer | undefined;

async function smtpUp(): Promise<void> {
  smtp = await listenForMail(smtpPort, received);
}

async function waitFor(subject: string, done: (m: MailQueueEntry) => boolean, timeoutMs = 30_000): Promise<MailQueueEntry> {
  const until = Date.now() + timeoutMs;
  let last: MailQueueEntry | undefined;
  while (Date.now() < until) {
    last = (await listMailQueue()).find((m) => m.subject === subject);
    if (last && done(last)) return last;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`"${subject}" did not get there; last seen: ${JSON.stringify(last)}`);
}

beforeAll(async () => {
  await startMailWorker();
});
afterAll(async () => {
  if (smtp) await new Promise<void>((resolve) => smtp!.close(() => resolve()));
});
beforeEach(async () => {
  await resetDatabase();
  received.length = 0;
});

describe("releasing a job while the SMTP server is down", () => {
  it("releases the job, queues the notice with its error, and delivers it with the travelers once SMTP is up", async () => {
    const job = await makeJob("planned");
    const tunerId = (await actAs("tuner"))!;

    const started = Date.now();
    const moved = await moveJob({ id: tunerId, role: "tuner" }, job.id, "released");
    expect(moved).toEqual({ state: "released", revision: 1, warnings: [] });
    // The release does not wait on SMTP.
    expect(Date.now() - started).toBeLessThan(10_000);
    const [row] = await testDb.select({ state: schema.jobs.state }).from(schema.jobs).where(eq(schema.jobs.id, job.id));
    expect(row!.state).toBe("released");

    const subject = `${job.number} released: revision 1 travelers`;
    const waiting = await waitFor(subject, (m) => m.state === "retrying");
    expect(waiting.to).toContain("machinist@blockwright.test");
    expect(waiting.tries).toBe(1);
    expect(waiting.lastError).toMatch(/ECONNREFUSED/);
    expect(received).toHaveLength(0);

    await smtpUp();
    const sent = await waitFor(subject, (m) => m.state === "sent");
    expect(sent.tries).toBeGreaterThanOrEqual(2);
    expect(sent.lastError).toBeNull();
    expect(received).toHaveLength(1);
    const notice = received[0]!;
    expect(notice.subject).toBe(subject);
    expect(JSON.stringify(notice.to)).toContain("machinist@blockwright.test");
    // One traveler per metering block, each a PDF (a PDF file starts with "%PDF-", ISO 32000-1 section 7.5.2).
    expect(notice.attachments.map((a) => a.filename).sort()).toEqual([`${job.number}-primary-rev1.pdf`, `${job.number}-secondary-rev1.pdf`]);
    for (const attachment of notice.attachments) {
      expect(attachment.contentType).toBe("application/pdf");
      expect(attachment.content.subarray(0, 5).toString()).toBe("%PDF-");
    }
    expect(notice.text).toContain("/bench/");
  }, 60_000);
});
