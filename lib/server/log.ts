import "server-only";
import pino from "pino";

// Structured server log (pino): one JSON line per event on stderr. Secrets and personal data never reach it: keys
// naming passwords, hashes, tokens, cookies or e-mails are replaced, e-mail addresses inside text are masked,
// and a failed query is logged by its SQL text and error code only, never its parameters or the row values
// PostgreSQL repeats in its messages.

type Level = "info" | "warn" | "error";

const SECRET_KEY = /pass(word)?|hash|token|secret|cookie|authorization|session|e-?mail|params|parameters|detail/i;
const EMAIL = /[^\s@"'<>(),;:]+@[^\s@"'<>(),;:]+\.[a-z]{2,}/gi;
const REDACTED = "[redacted]";

function maskText(text: string): string {
  return text.replace(EMAIL, "[e-mail]");
}

/** What may be logged of an error. */
export function describeError(error: unknown, depth = 0): Record<string, unknown> {
  if (!(error instanceof Error) || depth > 3) return { value: typeof error };
  const e = error as Error & Record<string, unknown>;
  const cause = e.cause === undefined ? undefined : describeError(e.cause, depth + 1);
  if (typeof e.query === "string") {
    // drizzle's query error: its message repeats every parameter, so only the statement is kept.
    return { type: e.name, query: e.query.slice(0, 500), ...(cause ? { cause } : {}) };
  }
  if (typeof e.code === "string" && typeof e.severity === "string") {
    // PostgreSQL's own error: the message and detail may quote the refused values.
    return { type: e.name, code: e.code, constraint: e.constraint, table: e.table, column: e.column, routine: e.routine };
  }
  return { type: e.name, message: maskText(e.message), stack: e.stack ? maskText(e.stack) : undefined, ...(cause ? { cause } : {}) };
}

function redact(value: unknown, depth = 0): unknown {
  if (value instanceof Error) return describeError(value);
  if (typeof value === "string") return maskText(value);
  if (depth > 4 || value === null || typeof value !== "object") return value;
  if (Array.isArray(value)) return value.map((item) => redact(item, depth + 1));
  return Object.fromEntries(
    Object.entries(value).map(([key, item]) => [key, key === "err" ? describeError(item) : SECRET_KEY.test(key) ? REDACTED : redact(item, depth + 1)]),
  );
}

// pino writes the JSON lines (level names, ISO time); what it is given is already redacted above, since its own
// redaction takes fixed paths and a secret can sit under any key. Written through process.stderr so that the
// process (and a test) sees every line.
const logger = pino(
  { base: undefined, timestamp: pino.stdTimeFunctions.isoTime, formatters: { level: (label) => ({ level: label }) } },
  { write: (line: string) => process.stderr.write(line) },
);

function write(level: Level, fields: Record<string, unknown>, message: string): void {
  logger[level](redact(fields) as object, maskText(message));
}

export const log = {
  info: (fields: Record<string, unknown>, message: string) => write("info", fields, message),
  warn: (fields: Record<string, unknown>, message: string) => write("warn", fields, message),
  error: (fields: Record<string, unknown>, message: string) => write("error", fields, message),
};
