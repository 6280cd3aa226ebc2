// The shop's record survives losing its server: one archive holds the database and every stored object, and
// restores into an empty database and bucket; a damaged archive or a target already in use is refused first.
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync, mkdirSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import type { AddressInfo } from "node:net";
import { GetObjectCommand, ListObjectsV2Command, PutObjectCommand } from "@aws-sdk/client-s3";
import { createHash } from "node:crypto";
import { Client } from "pg";
import S3rver from "s3rver";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import * as schema from "@/db/schema";
import { s3Client, type BackupTarget, type StorageTarget } from "@/scripts/backup/config";
import { createBackup } from "@/scripts/backup/create";
import { restoreBackup } from "@/scripts/backup/restore";
import { seedDemoShop } from "@/lib/demo/shop";
import { resetDatabase, testDb } from "./support/database";

const scratch = mkdtempSync(path.join(tmpdir(), "blockwright-backup-test-"));
const servers: S3rver[] = [];

async function startBucket(bucket: string): Promise<StorageTarget> {
  const directory = mkdtempSync(path.join(scratch, "s3-"));
  const server = new S3rver({ address: "127.0.0.1", port: 0, directory, silent: true, configureBuckets: [{ name: bucket, configs: [] }] });
  servers.push(server);
  const address = (await server.run()) as AddressInfo;
  return { endpoint: `http://127.0.0.1:${address.port}`, region: "us-east-1", bucket, accessKeyId: "S3RVER", secretAccessKey: "S3RVER" };
}

const sourceUrl = process.env.DATABASE_URL!;
const freshName = `${decodeURIComponent(new URL(sourceUrl).pathname.slice(1))}_restored`;
const freshUrl = (() => {
  const url = new URL(sourceUrl);
  url.pathname = `/${freshName}`;
  return url.toString();
})();

async function onDatabase<T>(url: string, work: (client: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

async function freshDatabase(): Promise<void> {
  await onDatabase(sourceUrl, async (client) => {
    await client.query(`DROP DATABASE IF EXISTS "${freshName}" WITH (FORCE)`);
    await client.query(`CREATE DATABASE "${freshName}"`);
  });
}

/** Every row of every table of the shop's schema, each table's rows in a stable order (by their text). */
const rowsOf = (url: string) =>
  onDatabase(url, async (client) => {
    const tables = (await client.query("SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename")).rows.map((r) => r.tablename as string);
    const all: Record<string, string[]> = {};
    for (const table of tables) {
      const rows = (await client.query(`SELECT to_jsonb(t)::text AS row FROM "${table}" t`)).rows.map((r) => r.row as string);
      all[table] = rows.sort();
    }
    return all;
  });

/** SHA-256 of every object in a bucket, by key. */
async function checksumsOf(storage: StorageTarget): Promise<Record<string, string>> {
  const s3 = s3Client(storage);
  const sums: Record<string, string> = {};
  const listed = await s3.send(new ListObjectsV2Command({ Bucket: storage.bucket }));
  for (const { Key } of listed.Contents ?? []) {
    const body = await (await s3.send(new GetObjectCommand({ Bucket: storage.bucket, Key: Key! }))).Body!.transformToByteArray();
    sums[Key!] = createHash("sha256").update(body).digest("hex");
  }
  s3.destroy();
  return sums;
}

// A few bytes that are not text, so a transfer that re-encodes them would show.
const photo = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 0x01, 0x00, 0x0d, 0x0a, 0x1a, 0x0a, 0xff, 0xd9]);
const logCsv = Buffer.from("time_s,afr\n0.0,12.1\n0.1,11.9\n");

let source: StorageTarget;
let archive: string;

beforeAll(async () => {
  await resetDatabase();
  // The demo shop: customers, jobs with blocks and stages, approved revisions, operations, sign-offs, the rack.
  await seedDemoShop();
  await testDb.insert(schema.customers).values([
    { name: "Ines Calloway", email: "ines@example.test", notes: "Blow-through on a street car" },
    { name: "Tobin Rusk", phone: "555-0142" },
  ]);
  source = await startBucket("bw-backup-source");
  const s3 = s3Client(source);
  await s3.send(new PutObjectCommand({ Bucket: source.bucket, Key: "photos/block-1/first.jpg", Body: photo, ContentType: "image/jpeg" }));
  await s3.send(new PutObjectCommand({ Bucket: source.bucket, Key: "logs/run 1.csv", Body: logCsv, ContentType: "text/csv" }));
  s3.destroy();
  const made = await createBackup({ target: { databaseUrl: sourceUrl, storage: source }, outDir: path.join(scratch, "backups"), now: new Date("2026-12-02T23:00:41Z") });
  archive = made.archive;
});

afterAll(async () => {
  for (const server of servers) await server.close();
  await onDatabase(sourceUrl, (client) => client.query(`DROP DATABASE IF EXISTS "${freshName}" WITH (FORCE)`));
  rmSync(scratch, { recursive: true, force: true });
});

beforeEach(freshDatabase);

/** Unpacks the archive, lets `change` alter the files, and packs them again as a new archive. */
function tampered(name: string, change: (dir: string) => void): string {
  const dir = path.join(scratch, `tamper-${name}`);
  mkdirSync(dir, { recursive: true });
  execFileSync("tar", ["-xzf", archive, "-C", dir]);
  change(dir);
  const out = path.join(scratch, `${name}.tar.gz`);
  execFileSync("tar", ["-czf", out, "-C", dir, "."]);
  return out;
}

async function tablesIn(url: string): Promise<number> {
  return onDatabase(url, async (client) => Number((await client.query("SELECT count(*) FROM pg_tables WHERE schemaname NOT IN ('pg_catalog', 'information_schema')")).rows[0].count));
}

describe("npm run backup", () => {
  it("writes one dated archive with a manifest of the database and every object, and checksums of every file", () => {
    expect(path.basename(archive)).toBe("blockwright-2026-12-02T2300Z.tar.gz");
    const listing = execFileSync("tar", ["-tzf", archive], { encoding: "utf8" });
    expect(listing).toContain("manifest.json");
    expect(listing).toContain("SHA256SUMS");
    expect(listing).toContain("database.dump");
    const manifest = JSON.parse(execFileSync("tar", ["-xzOf", archive, "./manifest.json"], { encoding: "utf8" }));
    expect(manifest.createdAt).toBe("2026-12-02T23:00:41.000Z");
    expect(manifest.database.name).toBe(decodeURIComponent(new URL(sourceUrl).pathname.slice(1)));
    expect(manifest.database.bytes).toBeGreaterThan(0);
    expect(manifest.objects.map((o: { key: string; bytes: number }) => [o.key, o.bytes]).sort()).toEqual([
      ["logs/run 1.csv", 29], // 11 + 9 + 9 characters, counted by hand
      ["photos/block-1/first.jpg", 19],
    ]);
    const sums = execFileSync("tar", ["-xzOf", archive, "./SHA256SUMS"], { encoding: "utf8" });
    for (const file of ["manifest.json", "database.dump", ...manifest.objects.map((o: { file: string }) => o.file)]) expect(sums).toMatch(new RegExp(`^[0-9a-f]{64}  ${file}$`, "m"));
  });
});

describe("npm run restore", () => {
  it("restores the rows and the objects' bytes into an empty database and a fresh bucket", async () => {
    const target: BackupTarget = { databaseUrl: freshUrl, storage: await startBucket("bw-backup-restored") };
    await restoreBackup({ archive, target });
    const [before, after] = [await rowsOf(sourceUrl), await rowsOf(freshUrl)];
    expect(after.customers!.some((row) => row.includes("Ines Calloway"))).toBe(true);
    expect(after.plan_revisions!.length).toBeGreaterThan(0);
    expect(after.sign_offs!.length).toBeGreaterThan(0);
    expect(after).toEqual(before);
    expect(await checksumsOf(target.storage)).toEqual(await checksumsOf(source));
    const s3 = s3Client(target.storage);
    const read = async (key: string) => Buffer.from(await (await s3.send(new GetObjectCommand({ Bucket: target.storage.bucket, Key: key }))).Body!.transformToByteArray());
    expect((await read("photos/block-1/first.jpg")).equals(photo)).toBe(true);
    expect((await read("logs/run 1.csv")).equals(logCsv)).toBe(true);
    s3.destroy();
  });

  it("refuses a database that is not empty, naming it, and leaves the bucket alone", async () => {
    const storage = await startBucket("bw-backup-untouched");
    await expect(restoreBackup({ archive, target: { databaseUrl: sourceUrl, storage } })).rejects.toThrow(/database blockwright_it\w* is not empty/);
    const s3 = s3Client(storage);
    await expect(s3.send(new GetObjectCommand({ Bucket: storage.bucket, Key: "logs/run 1.csv" }))).rejects.toMatchObject({ name: "NoSuchKey" });
    s3.destroy();
  });

  it("refuses a bucket that is not empty, naming it, before writing the database", async () => {
    const storage = await startBucket("bw-backup-in-use");
    const s3 = s3Client(storage);
    await s3.send(new PutObjectCommand({ Bucket: storage.bucket, Key: "already-here.txt", Body: "x" }));
    s3.destroy();
    await expect(restoreBackup({ archive, target: { databaseUrl: freshUrl, storage } })).rejects.toThrow(/bucket bw-backup-in-use is not empty/);
    expect(await tablesIn(freshUrl)).toBe(0);
  });

  it("refuses an archive with one byte changed before touching anything", async () => {
    const bytes = readFileSync(archive);
    const middle = Math.floor(bytes.length / 2);
    bytes[middle] = bytes[middle]! ^ 0xff;
    const damaged = path.join(scratch, "one-byte.tar.gz");
    writeFileSync(damaged, bytes);
    const storage = await startBucket("bw-backup-after-damage");
    await expect(restoreBackup({ archive: damaged, target: { databaseUrl: freshUrl, storage } })).rejects.toThrow(/one-byte\.tar\.gz is damaged/);
    expect(await tablesIn(freshUrl)).toBe(0);
  });

  it("refuses a file whose bytes do not match its checksum, and an archive without its manifest", async () => {
    const storage = await startBucket("bw-backup-after-tamper");
    const changedObject = tampered("changed-object", (dir) => {
      const file = path.join(dir, "objects", "000001");
      const bytes = readFileSync(file);
      bytes[0] = bytes[0]! ^ 0x01;
      writeFileSync(file, bytes);
    });
    await expect(restoreBackup({ archive: changedObject, target: { databaseUrl: freshUrl, storage } })).rejects.toThrow(/objects\/000001 does not match its SHA-256 checksum/);
    const noManifest = tampered("no-manifest", (dir) => rmSync(path.join(dir, "manifest.json")));
    await expect(restoreBackup({ archive: noManifest, target: { databaseUrl: freshUrl, storage } })).rejects.toThrow(/manifest\.json is missing/);
    expect(await tablesIn(freshUrl)).toBe(0);
  });
});
