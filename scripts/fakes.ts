// Local stand-ins for the hosted services, started by `npm start` and the end-to-end tests:
// an SMTP server that keeps every message as an .eml file in the outbox folder, and an
// S3-compatible server with the app's bucket. Both listen on loopback only.
import { mkdirSync, writeFileSync } from "node:fs";
import path from "node:path";
import { SMTPServer } from "smtp-server";
import S3rver from "s3rver";

const host = "127.0.0.1";
const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const s3Port = Number(process.env.S3_PORT ?? 4569);
const outbox = path.resolve(process.env.MAIL_OUTBOX_DIR ?? ".data/outbox");
const s3Dir = path.resolve(process.env.S3_DATA_DIR ?? ".data/s3");
const bucket = process.env.S3_BUCKET ?? "blockwright";

mkdirSync(outbox, { recursive: true });
mkdirSync(s3Dir, { recursive: true });

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  logger: false,
  onData(stream, session, callback) {
    const chunks: Buffer[] = [];
    stream.on("data", (chunk: Buffer) => chunks.push(chunk));
    stream.on("end", () => {
      // Time first, so a sorted listing is the order of arrival.
      const name = `${new Date().toISOString().replace(/[:.]/g, "-")}-${session.id}.eml`;
      writeFileSync(path.join(outbox, name), Buffer.concat(chunks));
      callback();
    });
  },
});
smtp.listen(smtpPort, host, () => console.log(`[fakes] SMTP on ${host}:${smtpPort}, outbox ${outbox}`));

const s3 = new S3rver({
  address: host,
  port: s3Port,
  directory: s3Dir,
  silent: true,
  configureBuckets: [{ name: bucket, configs: [] }],
});
s3.run().then(() => console.log(`[fakes] S3 on http://${host}:${s3Port}, bucket ${bucket}`));

function stop() {
  smtp.close(() => undefined);
  void s3.close().finally(() => process.exit(0));
}
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
