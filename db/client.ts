import "server-only";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;
/** A transaction handle or the database itself: data-access functions accept either. */
export type Executor = Parameters<Parameters<Database["transaction"]>[0]>[0] | Database;

let pool: Pool | undefined;
let database: Database | undefined;

/** The store's one setting; lib/server/env.ts validates it with the rest at start-up. */
function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("Invalid configuration:\n  DATABASE_URL: set it to a postgres:// URL");
  return url;
}

export function getDb(): Database {
  if (!database) {
    pool = new Pool({ connectionString: databaseUrl(), max: 10 });
    database = drizzle(pool, { schema });
  }
  return database;
}

export async function closeDb(): Promise<void> {
  await pool?.end();
  pool = undefined;
  database = undefined;
}
