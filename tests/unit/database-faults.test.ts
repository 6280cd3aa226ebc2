// Which errors mean "the database is not answering" (503, try again) and which are the request's or the code's own.
import { DrizzleQueryError } from "drizzle-orm/errors";
import { DatabaseError } from "pg";
import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable } from "@/db/faults";

/** PostgreSQL's error as node-postgres builds it from the server's message. */
function serverError(code: string, message: string): DatabaseError {
  const error = new DatabaseError(message, message.length, "error");
  error.code = code;
  error.severity = "FATAL";
  return error;
}

/** Node's socket error, e.g. from `connect` when nothing listens. */
function socketError(code: string): Error {
  return Object.assign(new Error(`connect ${code} 127.0.0.1:5432`), { code, errno: -111, syscall: "connect" });
}

describe("isDatabaseUnavailable", () => {
  // SQLSTATEs from PostgreSQL 15 documentation, Appendix A (classes 57 operator intervention, 08 connection exception).
  it.each([
    ["57P01", "terminating connection due to administrator command"],
    ["57P02", "terminating connection due to crash of another server process"],
    ["57P03", "the database system is starting up"],
    ["08000", "connection exception"],
    ["08001", "could not connect to server"],
    ["08003", "connection does not exist"],
    ["08004", "server rejected the connection"],
    ["08006", "connection failure"],
  ])("SQLSTATE %s (%s) is the database not answering", (code, message) => {
    expect(isDatabaseUnavailable(serverError(code, message))).toBe(true);
  });

  it.each(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT"])("the socket error %s is the database not answering", (code) => {
    expect(isDatabaseUnavailable(socketError(code))).toBe(true);
  });

  it.each([
    "Connection terminated unexpectedly",
    "Connection terminated due to connection timeout",
    "timeout exceeded when trying to connect",
    "timeout expired",
  ])("node-postgres's \"%s\" is the database not answering", (message) => {
    expect(isDatabaseUnavailable(new Error(message))).toBe(true);
  });

  it("looks inside Drizzle's query error and a connection's AggregateError", () => {
    expect(isDatabaseUnavailable(new DrizzleQueryError("select 1", [], serverError("57P01", "terminating connection")))).toBe(true);
    expect(isDatabaseUnavailable(new AggregateError([socketError("ECONNREFUSED"), socketError("ECONNREFUSED")], "connect failed"))).toBe(true);
  });

  it("leaves the request's and the code's own errors alone (they stay 4xx or 500)", () => {
    // 23505 unique_violation and 42P01 undefined_table (PostgreSQL 15, Appendix A): the server answered.
    expect(isDatabaseUnavailable(new DrizzleQueryError("insert", [], serverError("23505", "duplicate key value")))).toBe(false);
    expect(isDatabaseUnavailable(serverError("42P01", 'relation "jobs" does not exist'))).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("Cannot read properties of undefined"))).toBe(false);
    expect(isDatabaseUnavailable(socketError("ENOENT"))).toBe(false);
    expect(isDatabaseUnavailable("ECONNREFUSED")).toBe(false);
    expect(isDatabaseUnavailable(null)).toBe(false);
  });

  it("does not loop on an error that is its own cause", () => {
    const error = new Error("odd");
    (error as Error & { cause: unknown }).cause = error;
    expect(isDatabaseUnavailable(error)).toBe(false);
  });
});
