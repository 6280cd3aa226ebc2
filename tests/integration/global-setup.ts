// Runs once per `vitest run`, before any worker starts. The integration files run in parallel, one
// PostgreSQL database per worker: the configured DATABASE_URL names the base (e.g. blockwright_it), a
// template `<base>_template` is migrated once, and each worker gets `<base>_<n>` copied from it (n is the
// worker's VITEST_POOL_ID, 1 to maxWorkers). Copying a migrated template takes a fraction of a second;
// migrating each worker's database would take seconds. Within a database every test still starts from
// resetDatabase.
import type { TestProject } from "vitest/node";
import { Client } from "pg";
import { migrateDatabase } from "@/db/migrate";

declare module "vitest" {
  export interface ProvidedContext {
    /** The connection URL of each worker's database, index = VITEST_POOL_ID - 1. */
    workerDatabaseUrls: string[];
  }
}

function withDatabase(url: string, name: string): string {
  const copy = new URL(url);
  copy.pathname = `/${name}`;
  return copy.toString();
}

export default async function setup(project: TestProject): Promise<void> {
  const baseUrl = process.env.DATABASE_URL;
  if (!baseUrl) {
    throw new Error("DATABASE_URL must point at a test database: run the integration tests through `npm test`.");
  }
  const base = decodeURIComponent(new URL(baseUrl).pathname.slice(1));
  const template = `${base}_template`;
  const workers = project.config.maxWorkers ?? project.vitest.config.maxWorkers ?? 1;
  const names = Array.from({ length: workers }, (_, i) => `${base}_${i + 1}`);

  // The base database only carries these statements: CREATE DATABASE cannot run inside the database it copies.
  const admin = new Client({ connectionString: baseUrl });
  await admin.connect();
  try {
    const quote = (name: string) => `"${name.replaceAll('"', '""')}"`;
    for (const name of [...names, template]) await admin.query(`DROP DATABASE IF EXISTS ${quote(name)} WITH (FORCE)`);
    await admin.query(`CREATE DATABASE ${quote(template)}`);
    await migrateDatabase(withDatabase(baseUrl, template));
    for (const name of names) await admin.query(`CREATE DATABASE ${quote(name)} TEMPLATE ${quote(template)}`);
  } finally {
    await admin.end();
  }
  project.provide(
    "workerDatabaseUrls",
    names.map((name) => withDatabase(baseUrl, name)),
  );
}
