// Writes one dated archive holding the database and every object of the bucket, with a manifest and checksums.
import { mkdir, mkdtemp, rename, rm, stat, writeFile } from "node:fs/promises";
import { existsSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { GetObjectCommand, ListObjectsV2Command, type S3Client } from "@aws-sdk/client-s3";
import { CHECKSUMS, DATABASE_DUMP, FORMAT, MANIFEST, checksumLines, filesUnder, packFolder, run, sha256, type Manifest, type ManifestObject } from "./archive";
import { databaseName, pgProgram, s3Client, type BackupTarget } from "./config";

/** blockwright-2026-12-02T2300Z.tar.gz: the time in UTC to the minute, seconds added only when that name is taken. */
export function archiveName(now: Date, dir: string): string {
  const iso = now.toISOString();
  const minute = `blockwright-${iso.slice(0, 10)}T${iso.slice(11, 13)}${iso.slice(14, 16)}Z.tar.gz`;
  if (!existsSync(path.join(dir, minute))) return minute;
  return `blockwright-${iso.slice(0, 10)}T${iso.slice(11, 13)}${iso.slice(14, 16)}${iso.slice(17, 19)}Z.tar.gz`;
}

async function* objectKeys(s3: S3Client, bucket: string): AsyncGenerator<string> {
  let token: string | undefined;
  do {
    const page = await s3.send(new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token }));
    for (const item of page.Contents ?? []) if (item.Key) yield item.Key;
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
}

export async function createBackup(options: { target: BackupTarget; outDir: string; now?: Date }): Promise<{ archive: string; manifest: Manifest }> {
  const { target, outDir } = options;
  const now = options.now ?? new Date();
  const staging = await mkdtemp(path.join(tmpdir(), "blockwright-backup-"));
  try {
    const dump = path.join(staging, DATABASE_DUMP);
    try {
      await run(pgProgram("pg_dump"), ["--format=custom", "--no-owner", "--no-privileges", `--file=${dump}`, `--dbname=${target.databaseUrl}`]);
    } catch (error) {
      throw new Error(`pg_dump of ${databaseName(target.databaseUrl)} failed: ${(error as { stderr?: string }).stderr?.trim() || (error as Error).message}`);
    }

    const s3 = s3Client(target.storage);
    const objects: ManifestObject[] = [];
    await mkdir(path.join(staging, "objects"));
    for await (const key of objectKeys(s3, target.storage.bucket)) {
      const result = await s3.send(new GetObjectCommand({ Bucket: target.storage.bucket, Key: key }));
      const bytes = Buffer.from((await result.Body?.transformToByteArray()) ?? new Uint8Array());
      const file = `objects/${String(objects.length + 1).padStart(6, "0")}`;
      await writeFile(path.join(staging, file), bytes);
      objects.push({ key, file, bytes: bytes.length, contentType: result.ContentType ?? "application/octet-stream" });
    }
    s3.destroy();

    const manifest: Manifest = {
      format: FORMAT,
      version: 1,
      createdAt: now.toISOString(),
      database: { name: databaseName(target.databaseUrl), file: DATABASE_DUMP, bytes: (await stat(dump)).size },
      bucket: target.storage.bucket,
      objects,
    };
    await writeFile(path.join(staging, MANIFEST), `${JSON.stringify(manifest, null, 2)}\n`);

    const sums = new Map<string, string>();
    for (const file of await filesUnder(staging)) sums.set(file, await sha256(path.join(staging, file)));
    await writeFile(path.join(staging, CHECKSUMS), checksumLines(sums));

    await mkdir(outDir, { recursive: true });
    const archive = path.join(outDir, archiveName(now, outDir));
    // Written beside its final name and renamed, so a half-written archive never carries a backup's name.
    const partial = `${archive}.partial`;
    await packFolder(staging, partial);
    await rename(partial, archive);
    return { archive, manifest };
  } finally {
    await rm(staging, { recursive: true, force: true });
  }
}
