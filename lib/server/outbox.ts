import "server-only";
import { readdir, readFile, stat } from "node:fs/promises";
import path from "node:path";
import { simpleParser, type AddressObject, type ParsedMail } from "mailparser";
import { getEnv } from "./env";

// The local mail fake keeps every message it receives as an .eml file in MAIL_OUTBOX_DIR. The outbox page
// reads that folder: only names the folder itself lists are opened, so a crafted name cannot leave it.

/** What an outbox file may be called: no separators, no leading dot. */
export const OUTBOX_NAME = /^[A-Za-z0-9][A-Za-z0-9._-]{0,200}\.eml$/;

/** Newest messages listed at most; the fake's folder grows without bound in a long session. */
const LIST_LIMIT = 200;

export interface OutboxAttachment {
  index: number;
  filename: string;
  contentType: string;
  size: number;
}

export interface OutboxEntry {
  name: string;
  date: string | null;
  from: string;
  to: string;
  subject: string;
  attachments: OutboxAttachment[];
}

export interface OutboxMessage extends OutboxEntry {
  text: string;
}

export function outboxDir(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.cwd(), getEnv().MAIL_OUTBOX_DIR);
}

function addresses(value: AddressObject | AddressObject[] | undefined): string {
  if (!value) return "";
  return (Array.isArray(value) ? value : [value]).map((a) => a.text).join(", ");
}

function entryOf(name: string, mail: ParsedMail, fallbackDate: Date): OutboxEntry {
  return {
    name,
    date: (mail.date ?? fallbackDate).toISOString(),
    from: addresses(mail.from),
    to: addresses(mail.to),
    subject: mail.subject ?? "(no subject)",
    attachments: mail.attachments.map((a, index) => ({
      index,
      filename: a.filename ?? `attachment-${index + 1}`,
      contentType: a.contentType,
      size: a.size ?? a.content.length,
    })),
  };
}

/** The .eml names in the folder, or null when there is no folder. */
async function emlNames(dir: string): Promise<string[] | null> {
  try {
    return (await readdir(/*turbopackIgnore: true*/ dir)).filter((name) => OUTBOX_NAME.test(name));
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT" || (error as NodeJS.ErrnoException).code === "ENOTDIR") return null;
    throw error;
  }
}

async function parse(dir: string, name: string): Promise<{ mail: ParsedMail; modified: Date }> {
  const file = path.join(dir, name);
  const [bytes, info] = await Promise.all([readFile(/*turbopackIgnore: true*/ file), stat(/*turbopackIgnore: true*/ file)]);
  return { mail: await simpleParser(bytes), modified: info.mtime };
}

/** The outbox, newest first; `folderExists` false when the mail fake has not made its folder yet. */
export async function listOutbox(dir = outboxDir()): Promise<{ folderExists: boolean; messages: OutboxEntry[] }> {
  const names = await emlNames(dir);
  if (names === null) return { folderExists: false, messages: [] };
  const dated = await Promise.all(names.map(async (name) => ({ name, modified: (await stat(/*turbopackIgnore: true*/ path.join(dir, name))).mtime })));
  dated.sort((a, b) => b.modified.getTime() - a.modified.getTime() || b.name.localeCompare(a.name));
  const messages = await Promise.all(
    dated.slice(0, LIST_LIMIT).map(async ({ name }) => {
      const { mail, modified } = await parse(dir, name);
      return entryOf(name, mail, modified);
    }),
  );
  // The message's own Date header decides; the file's time breaks ties and stands in when it is missing.
  messages.sort((a, b) => (b.date ?? "").localeCompare(a.date ?? "") || b.name.localeCompare(a.name));
  return { folderExists: true, messages };
}

/** One message with its text, when `name` is a file the folder lists. */
export async function getOutboxMessage(name: string, dir = outboxDir()): Promise<OutboxMessage | undefined> {
  const names = await emlNames(dir);
  if (!names?.includes(name)) return undefined;
  const { mail, modified } = await parse(dir, name);
  return { ...entryOf(name, mail, modified), text: mail.text ?? "" };
}

/** One attachment's bytes, by its place in the message. */
export async function getOutboxAttachment(
  name: string,
  index: number,
  dir = outboxDir(),
): Promise<{ filename: string; contentType: string; content: Buffer } | undefined> {
  const names = await emlNames(dir);
  if (!names?.includes(name)) return undefined;
  const { mail } = await parse(dir, name);
  const attachment = mail.attachments[index];
  if (!attachment) return undefined;
  return { filename: attachment.filename ?? `attachment-${index + 1}`, contentType: attachment.contentType, content: attachment.content };
}
