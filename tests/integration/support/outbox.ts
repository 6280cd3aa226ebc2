// Messages as the SMTP fake stores them: one raw RFC 5322 file per message in the outbox folder.
import { mkdirSync, rmSync, utimesSync, writeFileSync } from "node:fs";
import path from "node:path";

export interface RawMessage {
  name: string;
  date: string;
  to: string;
  subject: string;
  text: string;
  attachment?: { filename: string; contentType: string; content: Buffer };
}

/** Writes a multipart message by hand (no mail library), so the parser is tested against the format itself. */
export function writeEml(dir: string, message: RawMessage, fileTime = new Date()): string {
  mkdirSync(dir, { recursive: true });
  const boundary = "bw-test-boundary-7f3a";
  const lines = [
    "From: Blockwright <no-reply@blockwright.test>",
    `To: ${message.to}`,
    `Subject: ${message.subject}`,
    `Date: ${message.date}`,
    "MIME-Version: 1.0",
  ];
  if (message.attachment) {
    const a = message.attachment;
    lines.push(
      `Content-Type: multipart/mixed; boundary="${boundary}"`,
      "",
      `--${boundary}`,
      "Content-Type: text/plain; charset=utf-8",
      "Content-Transfer-Encoding: 7bit",
      "",
      message.text,
      `--${boundary}`,
      `Content-Type: ${a.contentType}; name="${a.filename}"`,
      `Content-Disposition: attachment; filename="${a.filename}"`,
      "Content-Transfer-Encoding: base64",
      "",
      ...(a.content.toString("base64").match(/.{1,76}/g) ?? []),
      `--${boundary}--`,
      "",
    );
  } else {
    lines.push("Content-Type: text/plain; charset=utf-8", "Content-Transfer-Encoding: 7bit", "", message.text, "");
  }
  const file = path.join(dir, message.name);
  writeFileSync(file, lines.join("\r\n"));
  utimesSync(file, fileTime, fileTime);
  return file;
}

export function emptyFolder(dir: string): void {
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
}
