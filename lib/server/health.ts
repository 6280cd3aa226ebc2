import "server-only";
import { databaseAnswers } from "@/db/health";

export interface HealthReport {
  ok: boolean;
  database: "up" | "down";
}

/** Seconds a load balancer or monitor should wait before asking again while the database is down. */
const RETRY_AFTER_S = 5;

/**
 * The health answer: 200 when the database answers, 503 with Retry-After when it does not. The check is
 * a parameter so a test can point it at a database that is not there.
 */
export async function healthResponse(check: () => Promise<boolean> = () => databaseAnswers()): Promise<Response> {
  if (await check()) return Response.json({ ok: true, database: "up" } satisfies HealthReport, { headers: { "cache-control": "no-store" } });
  return Response.json({ ok: false, database: "down" } satisfies HealthReport, {
    status: 503,
    headers: { "cache-control": "no-store", "retry-after": String(RETRY_AFTER_S) },
  });
}
