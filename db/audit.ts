import "server-only";
import type { Executor } from "./client";
import { auditEvents } from "./schema";

/** Appends one line to the audit trail, inside the caller's transaction. */
export async function recordAudit(
  db: Executor,
  actorId: string | null,
  action: string,
  subjectId: string,
  details: Record<string, unknown>,
  subjectType = action.split(".")[0] ?? "unknown",
) {
  await db.insert(auditEvents).values({ actorId, action, subjectType, subjectId, details });
}
