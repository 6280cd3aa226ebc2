// Whether an error means "the database is not answering" (restarting, shut down, unreachable) rather than a fault
// in the request or the code: such a request is answered 503, to be tried again, never 500.

/** SQLSTATEs of a server going away or refusing connections for now (PostgreSQL appendix A, classes 57 and 08). */
const UNAVAILABLE_SQLSTATES = new Set([
  "57P01", // admin_shutdown: the server was told to stop (a restart)
  "57P02", // crash_shutdown
  "57P03", // cannot_connect_now: starting up or shutting down
  "08000", // connection_exception
  "08001", // sqlclient_unable_to_establish_sqlconnection
  "08003", // connection_does_not_exist
  "08004", // sqlserver_rejected_establishment_of_sqlconnection
  "08006", // connection_failure
]);

/** Node's socket errors when nothing listens, the peer drops the connection, or it never answers. */
const UNAVAILABLE_SOCKET_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EPIPE", "EHOSTUNREACH", "ENETUNREACH"]);

/** node-postgres and its pool say so in words, without a code. */
const UNAVAILABLE_MESSAGES = [
  "Connection terminated",
  "timeout exceeded when trying to connect",
  "timeout expired", // a connection's own connect timeout (db/client.ts sets one)
  "Client has encountered a connection error and is not queryable",
];

function isUnavailableItself(error: unknown): boolean {
  if (typeof error !== "object" || error === null) return false;
  const { code, message } = error as { code?: unknown; message?: unknown };
  if (typeof code === "string" && (UNAVAILABLE_SQLSTATES.has(code) || UNAVAILABLE_SOCKET_CODES.has(code))) return true;
  return typeof message === "string" && UNAVAILABLE_MESSAGES.some((words) => message.startsWith(words));
}

/**
 * True when the error, or one it wraps (Drizzle puts the driver's error in `cause`; a connection to a name
 * with several addresses fails with an AggregateError), says the database is not answering.
 */
export function isDatabaseUnavailable(error: unknown): boolean {
  const seen = new Set<unknown>();
  const pending: unknown[] = [error];
  while (pending.length > 0) {
    const current = pending.pop();
    if (typeof current !== "object" || current === null || seen.has(current)) continue;
    seen.add(current);
    if (isUnavailableItself(current)) return true;
    pending.push((current as { cause?: unknown }).cause);
    if (current instanceof AggregateError) pending.push(...current.errors);
  }
  return false;
}

/** What a person is told while the database is not answering. */
export const DATABASE_UNAVAILABLE_MESSAGE = "The shop's database is not answering; try again shortly.";

/** Seconds a caller should wait before trying again (the Retry-After of a 503). */
export const DATABASE_RETRY_AFTER_S = 5;
