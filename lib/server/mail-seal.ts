import "server-only";
import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from "node:crypto";
import { getEnv } from "./env";

// A queued message's text and attachments are kept sealed (AES-256-GCM) in the queue's table: a password-reset
// link must not be readable by whoever reads the database or a backup of it. The key is derived from
// NEXTAUTH_SECRET; recipient and subject stay readable for the admin's queue page.

export interface Sealed {
  iv: string;
  tag: string;
  data: string;
}

function key(): Buffer {
  return Buffer.from(hkdfSync("sha256", getEnv().NEXTAUTH_SECRET, "blockwright", "mail queue", 32));
}

export function seal(value: unknown): Sealed {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", key(), iv);
  const data = Buffer.concat([cipher.update(JSON.stringify(value), "utf8"), cipher.final()]);
  return { iv: iv.toString("base64"), tag: cipher.getAuthTag().toString("base64"), data: data.toString("base64") };
}

/** Throws when the seal was made with another secret or the stored bytes were changed. */
export function unseal<T>(sealed: Sealed): T {
  const decipher = createDecipheriv("aes-256-gcm", key(), Buffer.from(sealed.iv, "base64"));
  decipher.setAuthTag(Buffer.from(sealed.tag, "base64"));
  try {
    const text = Buffer.concat([decipher.update(Buffer.from(sealed.data, "base64")), decipher.final()]).toString("utf8");
    return JSON.parse(text) as T;
  } catch {
    throw new Error("the queued message cannot be opened: it was sealed with another NEXTAUTH_SECRET or changed");
  }
}
