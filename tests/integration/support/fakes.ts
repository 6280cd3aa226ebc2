// In-process stand-ins for the mail and file services, on free loopback ports. Call before anything in the
// test file reads the configuration (it is read once, on first use).
import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createServer, type AddressInfo } from "node:net";
import { simpleParser, type ParsedMail } from "mailparser";
import { SMTPServer } from "smtp-server";
import S3rver from "s3rver";

export interface MailFake {
  messages: ParsedMail[];
  stop: () => Promise<void>;
}

export async function startMailFake(): Promise<MailFake> {
  const messages: ParsedMail[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => messages.push(mail))
        .finally(() => callback());
    },
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  process.env.SMTP_HOST = "127.0.0.1";
  process.env.SMTP_PORT = String((server.server.address() as AddressInfo).port);
  return { messages, stop: () => new Promise((resolve) => server.close(() => resolve())) };
}

export interface S3Fake {
  directory: string;
  /** Object files stored so far (s3rver keeps each object as files under the bucket folder). */
  storedObjects: () => string[];
  stop: () => Promise<void>;
}

export async function startS3Fake(): Promise<S3Fake> {
  const directory = mkdtempSync(path.join(tmpdir(), "blockwright-s3-"));
  const bucket = "blockwright-test";
  const server = new S3rver({ address: "127.0.0.1", port: 0, directory, silent: true, configureBuckets: [{ name: bucket, configs: [] }] });
  const address = (await server.run()) as AddressInfo;
  process.env.S3_ENDPOINT = `http://127.0.0.1:${address.port}`;
  process.env.S3_BUCKET = bucket;
  const storedObjects = () => {
    const root = path.join(directory, bucket);
    const walk = (dir: string): string[] =>
      readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
        entry.isDirectory() ? walk(path.join(dir, entry.name)) : entry.name.endsWith("._S3rver_object") ? [path.join(dir, entry.name)] : [],
      );
    try {
      return walk(root);
    } catch {
      return [];
    }
  };
  return {
    directory,
    storedObjects,
    stop: async () => {
      await server.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}

/** A loopback port nothing listens on (yet): taken from the system, then let go. */
export async function closedPort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((resolve) => probe.listen(0, "127.0.0.1", resolve));
  const { port } = probe.address() as AddressInfo;
  await new Promise((resolve) => probe.close(resolve));
  return port;
}

/** An SMTP server on a given port (one that was down until now), keeping what it receives in `received`. */
export async function listenForMail(port: number, received: ParsedMail[]): Promise<SMTPServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) => received.push(mail))
        .finally(() => callback());
    },
  });
  await new Promise<void>((resolve) => server.listen(port, "127.0.0.1", resolve));
  return server;
}
