// The customer list: adding and editing through the form actions, and each customer's job count.
import { beforeEach, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { createCustomerAction, updateCustomerAction } from "@/app/(office)/shop/customers/actions";
import { createCustomer, listCustomersWithJobCounts } from "@/db/customers";
import * as schema from "@/db/schema";
import { actAs, formData, resetDatabase, testDb } from "./support/database";
import { makeJob } from "./support/jobs";

beforeEach(resetDatabase);

const customerRows = () => testDb.select().from(schema.customers);

describe("createCustomerAction", () => {
  it("adds a customer for a tuner, with an audit line", async () => {
    const tunerId = await actAs("tuner");
    const result = await createCustomerAction(
      undefined,
      formData({ name: "  Leontyne Farrow ", email: "leontyne@example.test", phone: "+1 (555) 010-2233", notes: "Blue coupe, second visit." }),
    );
    expect(result.httpStatus).toBe(200);
    expect(result.message).toBe("Leontyne Farrow added.");
    const [row] = await customerRows();
    expect(row).toMatchObject({ name: "Leontyne Farrow", email: "leontyne@example.test", phone: "+1 (555) 010-2233", notes: "Blue coupe, second visit." });
    const audit = await testDb.select().from(schema.auditEvents).where(eq(schema.auditEvents.subjectId, row!.id));
    expect(audit.map((a) => [a.action, a.actorId])).toEqual([["customer.create", tunerId]]);
  });

  it("answers 400 naming each bad field and saves nothing", async () => {
    await actAs("admin");
    const result = await createCustomerAction(undefined, formData({ name: "L", email: "not-an-address", phone: "call me maybe" }));
    expect(result.httpStatus).toBe(400);
    expect(Object.keys(result.error ?? {}).sort()).toEqual(["email", "name", "phone"]);
    expect(result.error?.name).toEqual(["Enter the customer's name."]);
    expect(await customerRows()).toHaveLength(0);
  });

  it("refuses anonymous visitors (401) and machinists (403) without saving", async () => {
    await actAs("anonymous");
    expect((await createCustomerAction(undefined, formData({ name: "Leontyne Farrow" }))).httpStatus).toBe(401);
    await actAs("machinist");
    expect((await createCustomerAction(undefined, formData({ name: "Leontyne Farrow" }))).httpStatus).toBe(403);
    expect(await customerRows()).toHaveLength(0);
  });
});

describe("updateCustomerAction", () => {
  it("changes the details, and an emptied e-mail is cleared", async () => {
    const adminId = await actAs("admin");
    const customer = await createCustomer(adminId!, { name: "Pim Achterberg", email: "pim@example.test" });
    const result = await updateCustomerAction(
      undefined,
      formData({ customerId: customer.id, name: "Pim Achterberg-Vos", email: "", phone: "555 0199", notes: "" }),
    );
    expect(result.httpStatus).toBe(200);
    const [row] = await customerRows();
    expect(row).toMatchObject({ name: "Pim Achterberg-Vos", email: null, phone: "555 0199", notes: "" });
  });

  it("answers 400 on a bad field and 404 for a customer that does not exist, changing nothing", async () => {
    const tunerId = await actAs("tuner");
    const customer = await createCustomer(tunerId!, { name: "Pim Achterberg" });
    const bad = await updateCustomerAction(undefined, formData({ customerId: customer.id, name: "" }));
    expect(bad.httpStatus).toBe(400);
    expect(Object.keys(bad.error ?? {})).toEqual(["name"]);
    const missing = await updateCustomerAction(undefined, formData({ customerId: "00000000-0000-4000-8000-000000000000", name: "Nobody Here" }));
    expect(missing.httpStatus).toBe(404);
    expect(missing.error?.customerId).toEqual(["No such customer."]);
    expect((await customerRows()).map((c) => c.name)).toEqual(["Pim Achterberg"]);
  });

  it("refuses anonymous visitors (401) and machinists (403)", async () => {
    const adminId = await actAs("admin");
    const customer = await createCustomer(adminId!, { name: "Pim Achterberg" });
    for (const [actor, status] of [
      ["anonymous", 401],
      ["machinist", 403],
    ] as const) {
      await actAs(actor);
      expect((await updateCustomerAction(undefined, formData({ customerId: customer.id, name: "Changed" }))).httpStatus, actor).toBe(status);
    }
    expect((await customerRows()).map((c) => c.name)).toEqual(["Pim Achterberg"]);
  });
});

describe("listCustomersWithJobCounts", () => {
  it("counts each customer's jobs, none for a customer without work, and searches name, e-mail and phone", async () => {
    await makeJob("draft", { newCustomerName: "Wren Halloway" });
    const first = await testDb.select().from(schema.customers);
    await makeJob("draft", { newCustomerName: undefined, customerId: first[0]!.id });
    const tunerId = await actAs("tuner");
    await createCustomer(tunerId!, { name: "Anselm Drury", email: "anselm@example.test", phone: "555 0142" });
    const all = await listCustomersWithJobCounts();
    expect(all.map((c) => [c.name, c.jobCount])).toEqual([
      ["Anselm Drury", 0],
      ["Wren Halloway", 2],
    ]);
    expect((await listCustomersWithJobCounts("ANSELM@")).map((c) => c.name)).toEqual(["Anselm Drury"]);
    expect((await listCustomersWithJobCounts("0142")).map((c) => c.name)).toEqual(["Anselm Drury"]);
    expect((await listCustomersWithJobCounts("hallo")).map((c) => c.name)).toEqual(["Wren Halloway"]);
    expect(await listCustomersWithJobCounts("%")).toEqual([]);
  });
});
