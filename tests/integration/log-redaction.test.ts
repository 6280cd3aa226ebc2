// When a write fails, the server log says what failed and where, never the values: no password hash, no
// e-mail address, no customer's details (the query's parameters stay out).
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { createUser } from "@/db/users";
import { refusalResponse } from "@/lib/http/api-route";
import { log } from "@/lib/server/log";
import { actAs, resetDatabase } from "./support/database";

beforeEach(resetDatabase);
afterEach(() => vi.restoreAllMocks());

const HASH = "$2b$10$abcdefghijklmnopqrstuuJq9Zx1yVw2Ut3Sr4Qp5On6Ml7Kk8Jj9";
const EMAIL = "leak.check@blockwright.test";

function captureStderr(): () => string {
  const lines: string[] = [];
  vi.spyOn(process.stderr, "write").mockImplementation((chunk: string | Uint8Array) => {
    lines.push(typeof chunk === "string" ? chunk : Buffer.from(chunk).toString());
    return true;
  });
  return () => lines.join("");
}

describe("a failed insert in the log", () => {
  it("names the statement and the database's error code, not the hash, the e-mail or the name", async () => {
    const actorId = (await actAs("admin"))!;
    // NUL is refused by PostgreSQL (22021): the insert fails with every parameter in drizzle's error message.
    const failure = await createUser({ actorId, email: EMAIL, name: "Odile\u0000Marsh", role: "tuner", passwordHash: HASH }).catch((e: unknown) => e);
    expect(String((failure as Error).message)).toContain(HASH); // the raw error does carry them
    const output = captureStderr();
    const response = refusalResponse(failure);
    expect(response.status).toBe(500);
    const text = output();
    expect(text).toContain("insert into");
    expect(text).toContain("22021");
    for (const secret of [HASH, EMAIL, "Odile", "leak.check"]) expect(text).not.toContain(secret);
    const answer = await response.text();
    expect(answer).not.toMatch(/insert|22021|Odile/i);
  });

  it("redacts fields named for secrets and masks e-mails inside messages", () => {
    const output = captureStderr();
    log.info({ password: "hunter2-but-longer", passwordHash: HASH, token: "t0k3n", user: { email: EMAIL } }, `signed in ${EMAIL}`);
    const text = output();
    for (const secret of ["hunter2", HASH, "t0k3n", EMAIL]) expect(text).not.toContain(secret);
    expect(JSON.parse(text).msg).toBe("signed in [e-mail]");
  });
});
