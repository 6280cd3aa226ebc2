import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { getEnv } from "./env";

// The SMTP side of outgoing mail, used only by the mail queue's worker: the local SMTP fake in development and
// tests, any SMTP server in production (SMTP_HOST, SMTP_PORT, SMTP_USER, SMTP_PASSWORD).

export interface MailAttachment {
  filename: string;
  content: Buffer;
  contentType: string;
}

export interface Message {
  to: string[];
  subject: string;
  text: string;
  attachments?: MailAttachment[];
}

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

/** Hands the message to the SMTP server now; throws when it cannot. */
export async function deliverMail(message: Message): Promise<void> {
  await transport().sendMail({ from: getEnv().MAIL_FROM, ...message });
}
