import { sql } from "drizzle-orm";
import { drizzle } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "@/db/schema";
import { DEMO_USERS, seedDemoUsers } from "@/lib/demo/seed";
import { setSessionUserId } from "./session-double";

const pool = new Pool({ connectionString: process.env.DATABASE_URL, max: 2 });
// A test that restarts its database ends this pool's idle connections too; the pool drops them and connects anew.
pool.on("error", () => undefined);
export const testDb = drizzle(pool, { schema });

/** Empties every table and puts the demo accounts back. */
export async function resetDatabase(): Promise<void> {
  const tables = await testDb.execute<{ tablename: string }>(
    sql`SELECT tablename FROM pg_tables WHERE schemaname = 'public'`,
  );
  const names = tables.rows.map((row) => `"${row.tablename}"`).join(", ");
  if (names) await testDb.execute(sql.raw(`TRUNCATE ${names} RESTART IDENTITY CASCADE`));
  await testDb.execute(sql`ALTER SEQUENCE job_number_seq RESTART WITH 1`);
  // Mail an earlier test queued (to an SMTP server long gone) must not reach the next test's server.
  const queue = await testDb.execute<{ job: string | null; archive: string | null }>(sql`SELECT to_regclass('pgboss.job')::text AS job, to_regclass('pgboss.archive')::text AS archive`);
  const queued = [queue.rows[0]?.job, queue.rows[0]?.archive].filter(Boolean);
  if (queued.length) await testDb.execute(sql.raw(`DELETE FROM ${queued.join("; DELETE FROM ")}`));
  await seedDemoUsers(testDb);
  setSessionUserId(null);
}

export type Actor = "anonymous" | (typeof DEMO_USERS)[number]["role"];
export const ACTORS: Actor[] = ["anonymous", "machinist", "tuner", "admin"];

/** Signs the given demo role in (or nobody). */
export async function actAs(actor: Actor): Promise<string | null> {
  if (actor === "anonymous") {
    setSessionUserId(null);
    return null;
  }
  const email = DEMO_USERS.find((user) => user.role === actor)!.email;
  const [row] = await testDb
    .select({ id: schema.users.id, sessionVersion: schema.users.sessionVersion })
    .from(schema.users)
    .where(sql`${schema.users.email} = ${email}`);
  setSessionUserId(row!.id, row!.sessionVersion);
  return row!.id;
}

export function formData(fields: Record<string, string>): FormData {
  const data = new FormData();
  for (const [name, value] of Object.entries(fields)) data.set(name, value);
  return data;
}

export function jsonRequest(url: string, method: string, body?: unknown): Request {
  return new Request(`http://127.0.0.1${url}`, {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : typeof body === "string" ? body : JSON.stringify(body),
  });
}
