// Who may do what: every route handler and server action that touches shop data, called as each actor.
// Expected statuses: 401 anonymous, 403 wrong role, 2xx for the roles that may. Grows with every route.
import { beforeEach, describe, expect, it } from "vitest";
import { GET as listUsersRoute, POST as createUserRoute } from "@/app/api/users/route";
import { PATCH as patchUserRoute } from "@/app/api/users/[id]/route";
import { createUserAction, updateUserAction } from "@/app/(office)/shop/users/actions";
import { ACTORS, actAs, formData, jsonRequest, resetDatabase, testDb, type Actor } from "./support/database";
import * as schema from "@/db/schema";
import { eq } from "drizzle-orm";

async function machinistId(): Promise<string> {
  const [row] = await testDb.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, "machinist@blockwright.test"));
  return row!.id;
}

interface AccessCase {
  name: string;
  expected: Record<Actor, number>;
  call: () => Promise<number>;
}

const ADMIN_ONLY = (ok: number): Record<Actor, number> => ({ anonymous: 401, machinist: 403, tuner: 403, admin: ok });

const CASES: AccessCase[] = [
  {
    name: "GET /api/users",
    expected: ADMIN_ONLY(200),
    call: async () => (await listUsersRoute()).status,
  },
  {
    name: "POST /api/users",
    expected: ADMIN_ONLY(201),
    call: async () =>
      (
        await createUserRoute(
          jsonRequest("/api/users", "POST", { name: "Sol Brandt", email: "sol@blockwright.test", role: "tuner", password: "long-enough-pw" }),
        )
      ).status,
  },
  {
    name: "PATCH /api/users/{id}",
    expected: ADMIN_ONLY(200),
    call: async () => {
      const id = await machinistId();
      return (await patchUserRoute(jsonRequest(`/api/users/${id}`, "PATCH", { role: "tuner" }), { params: Promise.resolve({ id }) })).status;
    },
  },
  {
    name: "action createUserAction",
    expected: ADMIN_ONLY(200),
    call: async () =>
      (await createUserAction(undefined, formData({ name: "Sol Brandt", email: "sol@blockwright.test", role: "tuner", password: "long-enough-pw" })))
        .httpStatus,
  },
  {
    name: "action updateUserAction",
    expected: ADMIN_ONLY(200),
    call: async () => (await updateUserAction(undefined, formData({ userId: await machinistId(), active: "false" }))).httpStatus,
  },
];

describe("access table: route or action x actor -> status", () => {
  beforeEach(resetDatabase);
  for (const testCase of CASES) {
    for (const actor of ACTORS) {
      it(`${testCase.name} as ${actor} -> ${testCase.expected[actor]}`, async () => {
        await actAs(actor);
        expect(await testCase.call()).toBe(testCase.expected[actor]);
      });
    }
  }
});
