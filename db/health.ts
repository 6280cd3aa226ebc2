import "server-only";
import { sql } from "drizzle-orm";
import { getDb, type Database } from "./client";

/** How long the database may take to answer before it counts as down. */
export const DATABASE_ANSWER_MS = 2000;

/**
 * Asks the database for `SELECT 1` and says whether it answered in time. A refused connection counts
 * as down at once; a server that accepts but never answers counts as down after `timeoutMs`.
 */
export async function databaseAnswers(database: Database = getDb(), timeoutMs = DATABASE_ANSWER_MS): Promise<boolean> {
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<false>((resolve) => {
    timer = setTimeout(() => resolve(false), timeoutMs);
  });
  const answered = database.execute(sql`SELECT 1`).then(
    () => true,
    () => false,
  );
  try {
    return await Promise.race([answered, late]);
  } finally {
    clearTimeout(timer);
  }
}
