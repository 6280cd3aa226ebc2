// Every state-changing route handler with a body the route would accept, for tests that attack them all.
import { eq, sql } from "drizzle-orm";
import * as schema from "@/db/schema";
import { POST as createUser } from "@/app/api/users/route";
import { PATCH as patchUser } from "@/app/api/users/[id]/route";
import { POST as createJob } from "@/app/api/jobs/route";
import { PATCH as patchJob } from "@/app/api/jobs/[id]/route";
import { POST as moveJob } from "@/app/api/jobs/[id]/state/route";
import { POST as signOff } from "@/app/api/operations/[id]/sign-off/route";
import { POST as uploadPhoto } from "@/app/api/blocks/[blockId]/photos/route";
import { POST as orifice } from "@/app/api/calc/orifice/route";
import { POST as restriction } from "@/app/api/calc/restriction/route";
import { POST as changePassword } from "@/app/api/account/password/route";
import { DELETE as endSessions } from "@/app/api/account/sessions/route";
import { POST as sendReset } from "@/app/api/users/[id]/password-reset/route";
import { testDb } from "./database";
import { blockIdOf, jobBody, makeJob } from "./jobs";

export type Handler = (request: Request, context?: { params: Promise<Record<string, string>> }) => Promise<Response>;

export interface StateChangingRoute {
  name: string;
  method: "POST" | "PATCH" | "DELETE";
  /** What the route reads: a JSON body, a multipart upload, or nothing but the caller. */
  reads: "json" | "multipart" | "nothing";
  handler: Handler;
  /** The path and params, built on fixtures made by the tuner (call before signing the attacker's victim in). */
  target: () => Promise<{ path: string; params: Record<string, string> }>;
  /** A body the route accepts, as JSON. */
  body: unknown;
}

async function releasedJob() {
  return makeJob("released");
}

async function finishOperation(jobId: string): Promise<string> {
  const blockId = await blockIdOf(jobId);
  const [op] = await testDb.select({ id: schema.operations.id }).from(schema.operations).where(eq(schema.operations.blockId, blockId));
  return op!.id;
}

async function machinistId(): Promise<string> {
  const [row] = await testDb.select({ id: schema.users.id }).from(schema.users).where(eq(schema.users.email, "machinist@blockwright.test"));
  return row!.id;
}

export const STATE_CHANGING_ROUTES: StateChangingRoute[] = [
  {
    name: "POST /api/users",
    method: "POST",
    reads: "json",
    handler: createUser,
    target: async () => ({ path: "/api/users", params: {} }),
    body: { name: "Mallory Vance", email: "mallory@blockwright.test", role: "admin", password: "a-long-enough-passphrase-77" },
  },
  {
    name: "PATCH /api/users/{id}",
    method: "PATCH",
    reads: "json",
    handler: patchUser,
    target: async () => {
      const id = await machinistId();
      return { path: `/api/users/${id}`, params: { id } };
    },
    body: { role: "admin" },
  },
  { name: "POST /api/jobs", method: "POST", reads: "json", handler: createJob, target: async () => ({ path: "/api/jobs", params: {} }), body: jobBody() },
  {
    name: "PATCH /api/jobs/{id}",
    method: "PATCH",
    reads: "json",
    handler: patchJob,
    target: async () => {
      const { id } = await releasedJob();
      return { path: `/api/jobs/${id}`, params: { id } };
    },
    body: { notes: "changed by someone else" },
  },
  {
    name: "POST /api/jobs/{id}/state",
    method: "POST",
    reads: "json",
    handler: moveJob,
    target: async () => {
      const { id } = await makeJob("planned");
      return { path: `/api/jobs/${id}/state`, params: { id } };
    },
    body: { to: "released" },
  },
  {
    name: "POST /api/operations/{id}/sign-off",
    method: "POST",
    reads: "json",
    handler: signOff,
    target: async () => {
      const id = await finishOperation((await releasedJob()).id);
      return { path: `/api/operations/${id}/sign-off`, params: { id } };
    },
    body: { readings: [] },
  },
  {
    name: "POST /api/blocks/{blockId}/photos",
    method: "POST",
    reads: "multipart",
    handler: uploadPhoto,
    target: async () => {
      const blockId = await blockIdOf((await releasedJob()).id);
      return { path: `/api/blocks/${blockId}/photos`, params: { blockId } };
    },
    body: { photo: "x" },
  },
  {
    name: "POST /api/calc/orifice",
    method: "POST",
    reads: "json",
    handler: orifice,
    target: async () => ({ path: "/api/calc/orifice", params: {} }),
    body: { flow: { value: 100, unit: "lb/h" }, dP: { value: 5, unit: "psi" }, cd: 0.7, fuel: "gasoline" },
  },
  {
    name: "POST /api/calc/restriction",
    method: "POST",
    reads: "json",
    handler: restriction,
    target: async () => ({ path: "/api/calc/restriction", params: {} }),
    body: { targetAreaIn2: 0.005, maxHoles: 2 },
  },
  {
    name: "POST /api/account/password",
    method: "POST",
    reads: "json",
    handler: changePassword,
    target: async () => ({ path: "/api/account/password", params: {} }),
    body: { currentPassword: "not-the-current-one", newPassword: "copper lathe quiet harbor" },
  },
  {
    name: "DELETE /api/account/sessions",
    method: "DELETE",
    reads: "nothing",
    handler: endSessions,
    target: async () => ({ path: "/api/account/sessions", params: {} }),
    body: {},
  },
  {
    name: "POST /api/users/{id}/password-reset",
    method: "POST",
    reads: "nothing",
    handler: sendReset,
    target: async () => {
      const id = await machinistId();
      return { path: `/api/users/${id}/password-reset`, params: { id } };
    },
    body: {},
  },
];

/** Row counts of every table: a refused request changes none of them. */
export async function tableCounts(): Promise<Record<string, number>> {
  const tables = await testDb.execute<{ tablename: string }>(
    sql`SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename`,
  );
  const counts: Record<string, number> = {};
  for (const { tablename } of tables.rows) {
    const result = await testDb.execute<{ n: string }>(sql.raw(`SELECT count(*) AS n FROM "${tablename}"`));
    counts[tablename] = Number(result.rows[0]!.n);
  }
  return counts;
}
