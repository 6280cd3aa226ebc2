import { beforeEach, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { POST as createUserRoute } from "@/app/api/users/route";
import { PATCH as patchUserRoute } from "@/app/api/users/[id]/route";
import { createUserAction, updateUserAction } from "@/app/(office)/shop/users/actions";
import { verifyCredentials, INVALID_MESSAGE, THROTTLED_MESSAGE } from "@/lib/auth/credentials";
import { getSessionUser } from "@/lib/auth/session";
import { ACCOUNT_RULE, ADDRESS_RULE, PAIR_RULE, signInWaitSeconds } from "@/lib/auth/throttle";
import { UNKNOWN_ADDRESS } from "@/lib/auth/client-address";
import * as schema from "@/db/schema";
import { actAs, formData, jsonRequest, resetDatabase, testDb } from "./support/database";

const DEMO_PASSWORD = "blockwright-demo";

beforeEach(resetDatabase);

async function userByEmail(email: string) {
  const [row] = await testDb.select().from(schema.users).where(eq(schema.users.email, email));
  return row;
}

describe("signing in", () => {
  it("accepts a demo account with the right password", async () => {
    const user = await verifyCredentials({ email: "Tuner@Blockwright.test ", password: DEMO_PASSWORD, address: "10.0.0.1" });
    expect(user.role).toBe("tuner");
  });

  it("refuses a deactivated user, even with the right password", async () => {
    await testDb.update(schema.users).set({ active: false }).where(eq(schema.users.email, "machinist@blockwright.test"));
    await expect(
      verifyCredentials({ email: "machinist@blockwright.test", password: DEMO_PASSWORD, address: "10.0.0.2" }),
    ).rejects.toThrow(INVALID_MESSAGE);
  });

  it("slows the address guessing an account, while the owner elsewhere signs in", async () => {
    for (let i = 0; i < PAIR_RULE.free; i++) {
      await expect(verifyCredentials({ email: "tuner@blockwright.test", password: `guess-${i}`, address: "10.0.1.7" })).rejects.toThrow(INVALID_MESSAGE);
    }
    // The guesser must now wait, even with the right password.
    await expect(verifyCredentials({ email: "tuner@blockwright.test", password: DEMO_PASSWORD, address: "10.0.1.7" })).rejects.toThrow(THROTTLED_MESSAGE);
    // The owner, from their own address, is not locked out.
    await expect(verifyCredentials({ email: "tuner@blockwright.test", password: DEMO_PASSWORD, address: "10.0.1.99" })).resolves.toMatchObject({ role: "tuner" });
  });

  it("guessing from many addresses keeps the owner waiting seconds, never locked out", async () => {
    for (let i = 0; i < ACCOUNT_RULE.free + 5; i++) {
      await testDb.insert(schema.signInAttempts).values({ email: "tuner@blockwright.test", address: `10.0.2.${i}`, succeeded: false });
    }
    await expect(verifyCredentials({ email: "tuner@blockwright.test", password: DEMO_PASSWORD, address: "10.0.3.1" })).rejects.toThrow(THROTTLED_MESSAGE);
    const wait = await signInWaitSeconds("tuner@blockwright.test", "10.0.3.1");
    expect(wait).toBeGreaterThan(0);
    expect(wait).toBeLessThanOrEqual(ACCOUNT_RULE.capSeconds);
    expect(await signInWaitSeconds("tuner@blockwright.test", "10.0.3.1", new Date(Date.now() + (ACCOUNT_RULE.capSeconds + 1) * 1000))).toBe(0);
  });

  it("slows an address that guesses across many accounts, not other addresses", async () => {
    for (let i = 0; i < ADDRESS_RULE.free; i++) {
      await expect(verifyCredentials({ email: `nobody-${i}@blockwright.test`, password: "x", address: "10.9.9.9" })).rejects.toThrow(INVALID_MESSAGE);
    }
    await expect(verifyCredentials({ email: "admin@blockwright.test", password: DEMO_PASSWORD, address: "10.9.9.9" })).rejects.toThrow(THROTTLED_MESSAGE);
    await expect(verifyCredentials({ email: "admin@blockwright.test", password: DEMO_PASSWORD, address: "10.9.9.10" })).resolves.toMatchObject({ role: "admin" });
  });

  it("without a trusted proxy every caller shares the unknown address, so only the account is slowed, and gently", async () => {
    for (let i = 0; i < PAIR_RULE.free + 2; i++) {
      await expect(verifyCredentials({ email: "tuner@blockwright.test", password: `guess-${i}`, address: UNKNOWN_ADDRESS })).rejects.toThrow(INVALID_MESSAGE);
    }
    await expect(verifyCredentials({ email: "tuner@blockwright.test", password: DEMO_PASSWORD, address: UNKNOWN_ADDRESS })).resolves.toMatchObject({ role: "tuner" });
  });

  it("an unknown e-mail costs the same time as a known one (medians of 20 within 25 %)", async () => {
    const time = async (email: string) => {
      await testDb.delete(schema.signInAttempts).where(sql`true`);
      const started = performance.now();
      await verifyCredentials({ email, password: "wrong-password-123", address: "10.0.4.1" }).catch(() => undefined);
      return performance.now() - started;
    };
    await time("tuner@blockwright.test"); // warm both paths: the unknown-account hash is made once
    await time("nobody@blockwright.test");
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 20; i++) {
      known.push(await time("tuner@blockwright.test"));
      unknown.push(await time(`nobody-${i}@blockwright.test`));
    }
    const median = (values: number[]) => [...values].sort((a, b) => a - b)[10]!;
    const [k, u] = [median(known), median(unknown)];
    expect(Math.abs(k - u) / Math.max(k, u)).toBeLessThan(0.25);
  });

  it("ends an active session once the user is deactivated", async () => {
    const id = await actAs("machinist");
    expect((await getSessionUser())?.id).toBe(id);
    await testDb.update(schema.users).set({ active: false }).where(eq(schema.users.id, id!));
    expect(await getSessionUser()).toBeNull();
  });
});

describe("managing users", () => {
  it("creates a user who can then sign in, and records it in the audit trail", async () => {
    await actAs("admin");
    const result = await createUserAction(
      undefined,
      formData({ name: "Kit Osei", email: "kit@blockwright.test", role: "machinist", password: "starting-password" }),
    );
    expect(result.httpStatus).toBe(200);
    const created = await userByEmail("kit@blockwright.test");
    expect(created?.role).toBe("machinist");
    expect(created?.passwordHash).not.toContain("starting-password");
    await expect(verifyCredentials({ email: "kit@blockwright.test", password: "starting-password", address: "10.0.2.1" })).resolves.toBeTruthy();
    const audit = await testDb.select().from(schema.auditEvents).where(eq(schema.auditEvents.subjectId, created!.id));
    expect(audit.map((event) => event.action)).toEqual(["user.create"]);
  });

  it("names the field that is wrong and saves nothing", async () => {
    await actAs("admin");
    const result = await createUserAction(undefined, formData({ name: "Kit Osei", email: "not-an-email", role: "welder", password: "short" }));
    expect(result.httpStatus).toBe(400);
    expect(Object.keys(result.error ?? {}).sort()).toEqual(["email", "password", "role"]);
    expect(await userByEmail("not-an-email")).toBeUndefined();
  });

  it("refuses a second account with the same e-mail (409 on the email field)", async () => {
    await actAs("admin");
    const response = await createUserRoute(
      jsonRequest("/api/users", "POST", { name: "Copy", email: "TUNER@blockwright.test", role: "tuner", password: "long-enough-pw" }),
    );
    expect(response.status).toBe(409);
    expect((await response.json()).error.field).toBe("email");
  });

  it("answers 400 naming the field for a malformed JSON body", async () => {
    await actAs("admin");
    const garbage = await createUserRoute(jsonRequest("/api/users", "POST", "{not json"));
    expect(garbage.status).toBe(400);
    const missing = await createUserRoute(jsonRequest("/api/users", "POST", { name: "No Mail", role: "tuner", password: "long-enough-pw" }));
    expect(missing.status).toBe(400);
    expect((await missing.json()).error.field).toBe("email");
  });

  it("keeps the last active admin: demoting or deactivating them is refused", async () => {
    const adminId = await actAs("admin");
    const demote = await updateUserAction(undefined, formData({ userId: adminId!, role: "tuner" }));
    expect(demote.httpStatus).toBe(409);
    const response = await patchUserRoute(jsonRequest(`/api/users/${adminId}`, "PATCH", { active: false }), {
      params: Promise.resolve({ id: adminId! }),
    });
    expect(response.status).toBe(409);
    expect((await userByEmail("admin@blockwright.test"))?.active).toBe(true);
  });

  it("changes a role, which applies to the next request", async () => {
    const machinist = await userByEmail("machinist@blockwright.test");
    await actAs("admin");
    expect((await updateUserAction(undefined, formData({ userId: machinist!.id, role: "tuner" }))).httpStatus).toBe(200);
    await actAs("machinist");
    expect((await getSessionUser())?.role).toBe("tuner");
  });

  it("answers 404 for an unknown user id and 400 for a malformed one", async () => {
    await actAs("admin");
    const unknown = "00000000-0000-4000-8000-000000000000";
    expect((await patchUserRoute(jsonRequest(`/api/users/${unknown}`, "PATCH", { role: "tuner" }), { params: Promise.resolve({ id: unknown }) })).status).toBe(404);
    const bad = await patchUserRoute(jsonRequest("/api/users/x", "PATCH", { role: "tuner" }), { params: Promise.resolve({ id: "x" }) });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.field).toBe("id");
  });
});
