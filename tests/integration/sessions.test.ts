// A session ends when its holder signs out, is deactivated (and stays ended after reactivation): the cookie
// issued before, replayed as it was, gets 401.
import { beforeEach, describe, expect, it } from "vitest";
import { GET as listJobsRoute } from "@/app/api/jobs/route";
import { PATCH as patchUserRoute } from "@/app/api/users/[id]/route";
import { authOptions } from "@/lib/auth/options";
import { verifyCredentials } from "@/lib/auth/credentials";
import { actAs, jsonRequest, resetDatabase } from "./support/database";
import { setSessionUserId } from "./support/session-double";

beforeEach(resetDatabase);

const listJobs = () => listJobsRoute(new Request("http://127.0.0.1/api/jobs"));

describe("revoking sessions", () => {
  it("a signed-out cookie gets 401", async () => {
    const id = await actAs("tuner");
    expect((await listJobs()).status).toBe(200);
    await authOptions.events!.signOut!({ token: { sub: id! }, session: null as never });
    // The browser (or whoever copied the cookie) sends the same token again.
    expect((await listJobs()).status).toBe(401);
  });

  it("a new sign-in after signing out gets a working session", async () => {
    const id = await actAs("tuner");
    await authOptions.events!.signOut!({ token: { sub: id! }, session: null as never });
    const again = await verifyCredentials({ email: "tuner@blockwright.test", password: "blockwright-demo", address: "10.0.5.1" });
    const token = await authOptions.callbacks!.jwt!({ token: {}, user: again as never, account: null, trigger: "signIn" });
    setSessionUserId(id, token.sv as number);
    expect((await listJobs()).status).toBe(200);
  });

  it("a deactivated and reactivated account's old cookies stay dead", async () => {
    const tunerId = await actAs("tuner");
    const tunerVersion = 1;
    await actAs("admin");
    const params = { params: Promise.resolve({ id: tunerId! }) };
    expect((await patchUserRoute(jsonRequest(`/api/users/${tunerId}`, "PATCH", { active: false }), params)).status).toBe(200);
    expect((await patchUserRoute(jsonRequest(`/api/users/${tunerId}`, "PATCH", { active: true }), params)).status).toBe(200);
    setSessionUserId(tunerId, tunerVersion);
    expect((await listJobs()).status).toBe(401);
  });

});
