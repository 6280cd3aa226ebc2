// The backup archive: a gzipped tar holding manifest.json, database.dump (pg_dump, custom format), one file
// per stored object under objects/, and SHA256SUMS (in `sha256sum` format) covering every other file.
// Objects are stored by number, not by key, so that no key can name a path outside the folder it unpacks into.
import { createHash } from "node:crypto";
import { execFile } from "node:child_process";
import { createReadStream } from "node:fs";
import { readFile, readdir } from "node:fs/promises";
import path from "node:path";
import { promisify } from "node:util";

export const run = promisify(execFile);

export const MANIFEST = "manifest.json";
export const CHECKSUMS = "SHA256SUMS";
export const DATABASE_DUMP = "database.dump";
export const FORMAT = "blockwright-backup";

export interface ManifestObject {
  key: string;
  file: string;
  bytes: number;
  contentType: string;
}

export interface Manifest {
  format: typeof FORMAT;
  version: 1;
  createdAt: string;
  database: { name: string; file: string; bytes: number };
  bucket: string;
  objects: ManifestObject[];
}

export async function sha256(file: string): Promise<string> {
  const hash = createHash("sha256");
  for await (const chunk of createReadStream(file)) hash.update(chunk as Buffer);
  return hash.digest("hex");
}

/** Every file under `dir`, as paths relative to it with forward slashes. */
export async function filesUnder(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true });
  return entries
    .filter((entry) => entry.isFile())
    .map((entry) => path.relative(dir, path.join(entry.parentPath, entry.name)).split(path.sep).join("/"))
    .sort();
}

export function checksumLines(sums: Map<string, string>): string {
  return [...sums].map(([file, sum]) => `${sum}  ${file}\n`).join("");
}

/** Packs `dir` into a gzipped tar with the system's tar. */
export async function packFolder(dir: string, archive: string): Promise<void> {
  await run("tar", ["-czf", archive, "-C", dir, "."]);
}

/** Unpacks an archive into `dir`; a damaged gzip or tar stream is an error here. */
export async function unpackArchive(archive: string, dir: string): Promise<void> {
  try {
    await run("tar", ["-xzf", archive, "-C", dir, "--no-same-owner", "--no-same-permissions"]);
  } catch (error) {
    const detail = (error as { stderr?: string }).stderr?.trim() || (error as Error).message;
    throw new Error(`${archive} is damaged: it does not unpack (${detail})`);
  }
}

/** Checks every file against SHA256SUMS and reads the manifest; any mismatch, missing or extra file refuses. */
export async function verifyUnpacked(dir: string, archive: string): Promise<Manifest> {
  const damaged = (why: string) => new Error(`${archive} is damaged: ${why}. Nothing was restored.`);
  const files = await filesUnder(dir);
  if (!files.includes(CHECKSUMS)) throw damaged(`${CHECKSUMS} is missing`);
  if (!files.includes(MANIFEST)) throw damaged(`${MANIFEST} is missing`);
  const listed = new Map<string, string>();
  for (const line of (await readFile(path.join(dir, CHECKSUMS), "utf8")).split("\n")) {
    if (!line) continue;
    const match = /^([0-9a-f]{64}) {2}(.+)$/.exec(line);
    if (!match) throw damaged(`${CHECKSUMS} has an unreadable line`);
    listed.set(match[2]!, match[1]!);
  }
  for (const file of files) {
    if (file === CHECKSUMS) continue;
    const expected = listed.get(file);
    if (!expected) throw damaged(`${file} is not in ${CHECKSUMS}`);
    if ((await sha256(path.join(dir, file))) !== expected) throw damaged(`${file} does not match its SHA-256 checksum`);
  }
  for (const file of listed.keys()) if (!files.includes(file)) throw damaged(`${file} is listed in ${CHECKSUMS} but missing`);

  let manifest: Manifest;
  try {
    manifest = JSON.parse(await readFile(path.join(dir, MANIFEST), "utf8")) as Manifest;
  } catch {
    throw damaged(`${MANIFEST} is not JSON`);
  }
  if (manifest.format !== FORMAT || manifest.version !== 1) throw damaged(`${MANIFEST} is not a Blockwright backup manifest (version 1)`);
  if (!files.includes(manifest.database?.file)) throw damaged(`the database dump ${manifest.database?.file} is missing`);
  for (const object of manifest.objects ?? []) {
    if (!files.includes(object.file)) throw damaged(`the object ${object.key} (${object.file}) is missing`);
  }
  return manifest;
}
