import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import type Mail from "nodemailer/lib/mailer";
import { getEnv } from "./env";
import { log } from "./log";

// Outgoing mail through nodemailer: the local SMTP fake in development and tests, any SMTP server in
// production (SMTP_HOST, SMTP_PORT, SMTP_USER, SMTP_PASSWORD).

let transporter: Transporter | undefined;

function transport(): Transporter {
  if (!transporter) {
    const env = getEnv();
    transporter = nodemailer.createTransport({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: false,
      ignoreTLS: env.SMTP_HOST === "127.0.0.1" || env.SMTP_HOST === "localhost",
      auth: env.SMTP_USER ? { user: env.SMTP_USER, pass: env.SMTP_PASSWORD ?? "" } : undefined,
    });
  }
  return transporter;
}

export interface Message {
  to: string[];
  subject: string;
  text: string;
  attachments?: Mail.Attachment[];
}

export async function sendMail(message: Message): Promise<void> {
  if (message.to.length === 0) return;
  await transport().sendMail({ from: getEnv().MAIL_FROM, ...message });
}

/** Sends without letting a mail failure undo work already saved; the failure is logged. */
export async function sendMailSafely(message: Message): Promise<boolean> {
  try {
    await sendMail(message);
    return true;
  } catch (error) {
    log.error({ err: error, subject: message.subject }, "mail not sent");
    return false;
  }
}
