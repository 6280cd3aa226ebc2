import "server-only";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import { getEnv } from "@/lib/server/env";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;
/** A transaction handle or the database itself: data-access functions accept either. */
export type Executor = Parameters<Parameters<Database["transaction"]>[0]>[0] | Database;

let pool: Pool | undefined;
let database: Database | undefined;

export function getDb(): Database {
  if (!database) {
    pool = new Pool({ connectionString: getEnv().DATABASE_URL, max: 10 });
    database = drizzle(pool, { schema });
  }
  return database;
}

export async function closeDb(): Promise<void> {
  await pool?.end();
  pool = undefined;
  database = undefined;
}
