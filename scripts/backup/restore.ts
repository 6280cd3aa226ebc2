// Restores an archive into an empty database and an empty bucket. Everything that can refuse is checked
// before anything is written: the archive's checksums and manifest, then that both targets are empty.
import { mkdtemp, readFile, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import path from "node:path";
import { CreateBucketCommand, HeadBucketCommand, ListObjectsV2Command, PutObjectCommand, type S3Client } from "@aws-sdk/client-s3";
import { Client } from "pg";
import { run, unpackArchive, verifyUnpacked, type Manifest } from "./archive";
import { databaseName, pgProgram, s3Client, type BackupTarget } from "./config";

export class RestoreRefusal extends Error {}

/** The first table, view or sequence outside PostgreSQL's own schemas, or null when the database is empty. */
async function firstRelation(databaseUrl: string): Promise<string | null> {
  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const result = await client.query<{ name: string }>(
      `SELECT n.nspname || '.' || c.relname AS name FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
       WHERE n.nspname NOT IN ('pg_catalog', 'information_schema') AND n.nspname NOT LIKE 'pg\\_toast%' AND n.nspname NOT LIKE 'pg\\_temp%'
       ORDER BY 1 LIMIT 1`,
    );
    return result.rows[0]?.name ?? null;
  } finally {
    await client.end();
  }
}

/** Whether the bucket exists, and its first key when it holds anything. */
async function bucketState(s3: S3Client, bucket: string): Promise<{ exists: boolean; firstKey: string | null }> {
  try {
    await s3.send(new HeadBucketCommand({ Bucket: bucket }));
  } catch (error) {
    const status = (error as { $metadata?: { httpStatusCode?: number } }).$metadata?.httpStatusCode;
    if (status === 404) return { exists: false, firstKey: null };
    throw error;
  }
  const page = await s3.send(new ListObjectsV2Command({ Bucket: bucket, MaxKeys: 1 }));
  return { exists: true, firstKey: page.Contents?.[0]?.Key ?? null };
}

export async function restoreBackup(options: { archive: string; target: BackupTarget }): Promise<Manifest> {
  const { archive, target } = options;
  const { bucket } = target.storage;
  const unpacked = await mkdtemp(path.join(tmpdir(), "blockwright-restore-"));
  const s3 = s3Client(target.storage);
  try {
    await unpackArchive(archive, unpacked);
    const manifest = await verifyUnpacked(unpacked, archive);

    const name = databaseName(target.databaseUrl);
    const relation = await firstRelation(target.databaseUrl);
    if (relation) throw new RestoreRefusal(`The database ${name} is not empty (it holds ${relation}): restore only into an empty database. Nothing was restored.`);
    const state = await bucketState(s3, bucket);
    if (state.firstKey) throw new RestoreRefusal(`The bucket ${bucket} is not empty (it holds ${state.firstKey}): restore only into an empty bucket. Nothing was restored.`);

    try {
      // One transaction: a dump that fails part-way leaves the database as empty as it was.
      await run(pgProgram("pg_restore"), ["--no-owner", "--no-privileges", "--exit-on-error", "--single-transaction", `--dbname=${target.databaseUrl}`, path.join(unpacked, manifest.database.file)]);
    } catch (error) {
      throw new Error(`pg_restore into ${name} failed, the database is left empty: ${(error as { stderr?: string }).stderr?.trim() || (error as Error).message}`);
    }
    if (!state.exists) await s3.send(new CreateBucketCommand({ Bucket: bucket }));
    for (const object of manifest.objects) {
      const body = await readFile(path.join(unpacked, object.file));
      await s3.send(new PutObjectCommand({ Bucket: bucket, Key: object.key, Body: body, ContentType: object.contentType }));
    }
    return manifest;
  } finally {
    s3.destroy();
    await rm(unpacked, { recursive: true, force: true });
  }
}
