import { Client } from "pg";

// Vitest numbers its workers (VITEST_POOL_ID), but a number can be handed to a new worker while the process
// that had it is still ending, and across project groups it has been seen twice at once. Two files on one
// database empty each other's tables, so each test process also holds a PostgreSQL advisory lock on its
// database's number for as long as it lives; the lock goes with the process's connection when it exits.

/** Advisory lock class for "integration test database n" (the second key is n). */
const LOCK_CLASS = 0x4257; // "BW"

const claimed = globalThis as { blockwrightWorkerDatabase?: string };

/**
 * Returns the URL of a worker database no other live test process holds, trying the preferred one
 * first and waiting while all are held.
 */
export async function claimWorkerDatabase(baseUrl: string, urls: readonly string[], preferred: number): Promise<string> {
  if (claimed.blockwrightWorkerDatabase) return claimed.blockwrightWorkerDatabase;
  const holder = new Client({ connectionString: baseUrl });
  await holder.connect();
  const order = urls.map((_, i) => (preferred + i) % urls.length);
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    for (const index of order) {
      const { rows } = await holder.query<{ won: boolean }>("SELECT pg_try_advisory_lock($1, $2) AS won", [LOCK_CLASS, index]);
      if (rows[0]?.won) {
        claimed.blockwrightWorkerDatabase = urls[index]!;
        return urls[index]!;
      }
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  await holder.end();
  throw new Error(`every integration test database stayed held for 60 s (${urls.length} of them)`);
}
