import "server-only";
import { databaseAnswers } from "@/db/health";
import { DATABASE_RETRY_AFTER_S } from "@/db/faults";

export interface HealthReport {
  ok: boolean;
  database: "up" | "down";
}

/**
 * The health answer: 200 when the database answers, 503 with Retry-After when it does not. The check is
 * a parameter so a test can point it at a database that is not there.
 */
export async function healthResponse(check: () => Promise<boolean> = () => databaseAnswers()): Promise<Response> {
  if (await check()) return Response.json({ ok: true, database: "up" } satisfies HealthReport, { headers: { "cache-control": "no-store" } });
  return Response.json({ ok: false, database: "down" } satisfies HealthReport, {
    status: 503,
    headers: { "cache-control": "no-store", "retry-after": String(DATABASE_RETRY_AFTER_S) },
  });
}
