import "server-only";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Client, Pool, type ClientConfig } from "pg";
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

/** A connection not made in this long fails (503 for the request) instead of making the request wait. */
const CONNECT_TIMEOUT_MS = 3000;

/**
 * The connect timeout set on each connection rather than on the pool: the pool's own would also end a request
 * that only waits its turn for a busy connection, turning a burst of load into 503s.
 */
class TimedClient extends Client {
  constructor(config?: string | ClientConfig) {
    super({ ...(typeof config === "string" ? { connectionString: config } : config), connectionTimeoutMillis: CONNECT_TIMEOUT_MS });
  }
}
/** No statement of the app's runs near this long; one that does holds a connection others are waiting for. */
const STATEMENT_TIMEOUT_MS = 30_000;

/**
 * The pool opens connections as needed, so after a database restart the next query connects again by itself.
 * Connections that die meanwhile (the server's shutdown ends them) report an error event: unheard, Node would end
 * the whole process, so the pool and each connection get a listener; the pool drops the dead connection.
 */
function openPool(): Pool {
  const opened = new Pool({
    connectionString: databaseUrl(),
    max: 10,
    Client: TimedClient,
    statement_timeout: STATEMENT_TIMEOUT_MS,
  });
  // Every connection reports its own loss (below); the pool repeats it for idle ones, heard here so it cannot crash.
  opened.on("error", () => undefined);
  // A connection checked out (a transaction between two statements) has no pool listener of its own.
  opened.on("connect", (client) => client.on("error", (error) => reportLostConnection(error)));
  return opened;
}

function reportLostConnection(error: Error): void {
  // The data layer has no logger of its own (lib/server/log sits above it): one line on stderr, no query or values.
  console.warn(`database connection lost: ${"code" in error ? `${String(error.code)} ` : ""}${error.message}`);
}

export function getDb(): Database {
  if (!database) {
    pool = openPool();
    database = drizzle(pool, { schema });
  }
  return database;
}

export async function closeDb(): Promise<void> {
  await pool?.end();
  pool = undefined;
  database = undefined;
}
