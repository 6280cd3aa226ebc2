// Who may do what: every route handler and server action that touches shop data, called as each actor.
// Expected statuses: 401 anonymous, 403 wrong role, 2xx for the roles that may. Grows with every route.
import { beforeEach, describe, expect, it } from "vitest";
import { GET as listUsersRoute, POST as createUserRoute } from "@/app/api/users/route";
import { PATCH as patchUserRoute } from "@/app/api/users/[id]/route";
import { createUserAction, updateUserAction } from "@/app/(office)/shop/users/actions";
import { GET as listJobsRoute, POST as createJobRoute } from "@/app/api/jobs/route";
import { GET as readJobRoute, PATCH as patchJobRoute } from "@/app/api/jobs/[id]/route";
import { POST as jobStateRoute } from "@/app/api/jobs/[id]/state/route";
import { jobBody, makeJob } from "./support/jobs";
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
  /** Builds what the call needs (as whoever it likes) before the actor signs in; its result goes to call. */
  setup?: () => Promise<string>;
  call: (fixture: string) => Promise<number>;
}

const OFFICE_ONLY = (ok: number): Record<Actor, number> => ({ anonymous: 401, machinist: 403, tuner: ok, admin: ok });
const EVERYONE = (ok: number): Record<Actor, number> => ({ anonymous: 401, machinist: ok, tuner: ok, admin: ok });
const jobParams = (id: string) => ({ params: Promise.resolve({ id }) });

const ADMIN_ONLY = (ok: number): Record<Actor, number> => ({ anonymous: 401, machinist: 403, tuner: 403, admin: ok });

const CASES: AccessCase[] = [
  {
    name: "GET /api/jobs",
    expected: EVERYONE(200),
    call: async () => (await listJobsRoute(new Request("http://127.0.0.1/api/jobs"))).status,
  },
  {
    name: "POST /api/jobs",
    expected: OFFICE_ONLY(201),
    call: async () => (await createJobRoute(jsonRequest("/api/jobs", "POST", jobBody()))).status,
  },
  {
    name: "GET /api/jobs/{id} (released)",
    expected: EVERYONE(200),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => (await readJobRoute(new Request(`http://127.0.0.1/api/jobs/${id}`), jobParams(id))).status,
  },
  {
    name: "GET /api/jobs/{id} (draft: not on the shop floor)",
    expected: { anonymous: 401, machinist: 404, tuner: 200, admin: 200 },
    setup: async () => (await makeJob("draft")).id,
    call: async (id) => (await readJobRoute(new Request(`http://127.0.0.1/api/jobs/${id}`), jobParams(id))).status,
  },
  {
    name: "PATCH /api/jobs/{id}",
    expected: OFFICE_ONLY(200),
    setup: async () => (await makeJob("released")).id,
    call: async (id) => (await patchJobRoute(jsonRequest(`/api/jobs/${id}`, "PATCH", { notes: "checked" }), jobParams(id))).status,
  },
  {
    name: "POST /api/jobs/{id}/state",
    expected: OFFICE_ONLY(200),
    setup: async () => (await makeJob("planned")).id,
    call: async (id) => (await jobStateRoute(jsonRequest(`/api/jobs/${id}/state`, "POST", { to: "released" }), jobParams(id))).status,
  },
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
        const fixture = testCase.setup ? await testCase.setup() : "";
        await actAs(actor);
        expect(await testCase.call(fixture)).toBe(testCase.expected[actor]);
      });
    }
  }
});
