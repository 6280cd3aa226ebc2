import "server-only";
import { log } from "./log";
import { enqueueMail } from "./mail-queue";
import type { Message } from "./mail-transport";

// What the workflows call to send mail. Both put the message in the mail queue (mail-queue.ts) and return at
// once: an SMTP server that is down delays the message, it never fails the user's action or loses the message.

export type { MailAttachment, Message } from "./mail-transport";

/** Queues the message; throws only when the queue itself (the database) cannot take it. */
export async function sendMail(message: Message): Promise<void> {
  if (message.to.length === 0) return;
  await enqueueMail(message);
}

/** Queues without letting a failure undo work already saved; the failure is logged. */
export async function sendMailSafely(message: Message): Promise<boolean> {
  try {
    await sendMail(message);
    return true;
  } catch (error) {
    log.error({ err: error, subject: message.subject }, "mail not queued");
    return false;
  }
}
