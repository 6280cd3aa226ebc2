// A NUL (PostgreSQL refuses it in text) or another control character in any text field is a 400 naming the
// field, through the API and through the forms alike, and nothing is saved.
import { beforeEach, describe, expect, it } from "vitest";
import { POST as createJobRoute, GET as listJobsRoute } from "@/app/api/jobs/route";
import { POST as createUserRoute } from "@/app/api/users/route";
import { POST as signOffRoute } from "@/app/api/operations/[id]/sign-off/route";
import { createCustomerAction } from "@/app/(office)/shop/customers/actions";
import { createUserAction } from "@/app/(office)/shop/users/actions";
import { createUserSchema } from "@/app/(office)/shop/users/schema";
import { actAs, formData, jsonRequest, resetDatabase, testDb } from "./support/database";
import { blockIdOf, jobBody, makeJob } from "./support/jobs";
import { tableCounts } from "./support/state-changing-routes";
import * as schema from "@/db/schema";
import { eq } from "drizzle-orm";

beforeEach(resetDatabase);

const CONTROLS = ["\u0000", "\u0007", "\u001b[31m", "\u007f"];

async function fieldOf(response: Response) {
  return { status: response.status, field: ((await response.json()) as { error: { field?: string } }).error.field };
}

describe("the JSON API", () => {
  it.each(CONTROLS)("refuses %j in a job's carburetor and notes, naming the field", async (control) => {
    await actAs("tuner");
    const before = await tableCounts();
    expect(await fieldOf(await createJobRoute(jsonRequest("/api/jobs", "POST", jobBody({ carburetor: `Four-barrel${control}` }))))).toEqual({
      status: 400,
      field: "carburetor",
    });
    expect(await fieldOf(await createJobRoute(jsonRequest("/api/jobs", "POST", jobBody({ notes: `ok${control}` }))))).toEqual({ status: 400, field: "notes" });
    expect(await tableCounts()).toEqual(before);
  });

  it("refuses it in a nested field and in a key", async () => {
    const { id } = await makeJob("released");
    const blockId = await blockIdOf(id);
    const [op] = await testDb.select({ id: schema.operations.id }).from(schema.operations).where(eq(schema.operations.blockId, blockId));
    await actAs("machinist");
    const params = { params: Promise.resolve({ id: op!.id }) };
    const nested = await signOffRoute(jsonRequest(`/api/operations/${op!.id}/sign-off`, "POST", { readings: [{ key: "a\u0000", value: 1, unit: "in" }] }), params);
    expect(await fieldOf(nested)).toEqual({ status: 400, field: "readings.0.key" });
    const note = await signOffRoute(jsonRequest(`/api/operations/${op!.id}/sign-off`, "POST", { note: "done\u0000" }), params);
    expect(await fieldOf(note)).toEqual({ status: 400, field: "note" });
  });

  it("keeps line breaks and tabs in a note", async () => {
    await actAs("tuner");
    const response = await createJobRoute(jsonRequest("/api/jobs", "POST", jobBody({ notes: "line one\r\n\tline two" })));
    expect(response.status).toBe(201);
  });

  it("refuses it in the query string", async () => {
    await actAs("tuner");
    expect(await fieldOf(await listJobsRoute(new Request("http://127.0.0.1/api/jobs?q=Wren%00")))).toEqual({ status: 400, field: "q" });
  });

  it("refuses it in a new user's name", async () => {
    await actAs("admin");
    const body = { name: "Sol\u0000 Brandt", email: "sol@blockwright.test", role: "tuner", password: "quiet-lathe-harbor-91" };
    expect(await fieldOf(await createUserRoute(jsonRequest("/api/users", "POST", body)))).toEqual({ status: 400, field: "name" });
  });
});

describe("the forms", () => {
  it.each(CONTROLS)("a customer's name with %j is refused naming the field, and nothing is saved", async (control) => {
    await actAs("tuner");
    const before = await tableCounts();
    const result = await createCustomerAction(undefined, formData({ name: `Wren${control} Halloway` }));
    expect(result.httpStatus).toBe(400);
    expect(result.error?.name).toBeTruthy();
    expect(await tableCounts()).toEqual(before);
  });

  it("a new user's name with NUL is refused by the form", async () => {
    await actAs("admin");
    const result = await createUserAction(undefined, formData({ name: "Sol\u0000", email: "sol@blockwright.test", role: "tuner", password: "quiet-lathe-harbor-91" }));
    expect(result.httpStatus).toBe(400);
    expect(result.error?.name).toBeTruthy();
  });

  it("the zod kit's text refuses control characters and line breaks in a one-line field by itself", () => {
    const parsed = createUserSchema.safeParse({ name: "Sol\nBrandt", email: "sol@blockwright.test", role: "tuner", password: "quiet-lathe-harbor-91" });
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues[0]!.path).toEqual(["name"]);
  });
});

describe("the caller still comes first", () => {
  it("an anonymous form post gets 401 without field errors", async () => {
    await actAs("anonymous");
    const result = await createCustomerAction(undefined, formData({ name: "W\u0000" }));
    expect(result.httpStatus).toBe(401);
    expect(Object.keys(result.error ?? {})).toEqual([""]);
  });
});
