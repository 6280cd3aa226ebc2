// The jobs table pages, sorts and filters on the server: more jobs than a page, read through GET /api/jobs
// exactly as the table asks for them.
import { beforeEach, describe, expect, it } from "vitest";
import { inArray } from "drizzle-orm";
import { GET as listRoute } from "@/app/api/jobs/route";
import { createCustomer } from "@/db/customers";
import { createJob, type JobFields, type JobListRow } from "@/db/jobs";
import { jobColumns } from "@/lib/jobs/input";
import { createJobSchema } from "@/lib/jobs/schema";
import * as schema from "@/db/schema";
import { actAs, resetDatabase, testDb } from "./support/database";
import { jobBody } from "./support/jobs";

const CUSTOMERS = ["Odalys Penhallow", "Bram Tesselaar", "Ines Korvath"] as const;
const JOB_COUNT = 45;
const RELEASED = 7;
const MACHINING = 3;

interface Fixture {
  /** Job numbers by customer name, and every job's number and id. */
  byCustomer: Record<string, string[]>;
  customerIds: Record<string, string>;
  jobs: { id: string; number: string; customer: string }[];
  released: string[];
  machining: string[];
}

let fixture: Fixture;

async function list(query: string): Promise<{ jobs: JobListRow[]; total: number }> {
  const response = await listRoute(new Request(`http://127.0.0.1/api/jobs?${query}`));
  expect(response.status, query).toBe(200);
  return response.json();
}

beforeEach(async () => {
  await resetDatabase();
  const tunerId = (await actAs("tuner"))!;
  const tuner = { id: tunerId, role: "tuner" as const };
  const customerIds: Record<string, string> = {};
  for (const name of CUSTOMERS) customerIds[name] = (await createCustomer(tunerId, { name })).id;
  const { customerId: _c, newCustomerName: _n, tunerId: _t, ...parsed } = createJobSchema.parse(jobBody());
  const fields = jobColumns(parsed) as JobFields;
  const jobs: Fixture["jobs"] = [];
  for (let i = 0; i < JOB_COUNT; i++) {
    const customer = CUSTOMERS[i % CUSTOMERS.length]!;
    // The carburetor text never contains a customer's name, so a name search matches by customer only.
    const job = await createJob(tuner, { fields: { ...fields, carburetor: `Four-barrel no. ${i}` }, customerId: customerIds[customer] });
    jobs.push({ ...job, customer });
  }
  const released = jobs.slice(0, RELEASED).map((j) => j.id);
  const machining = jobs.slice(RELEASED, RELEASED + MACHINING).map((j) => j.id);
  await testDb.update(schema.jobs).set({ state: "released" }).where(inArray(schema.jobs.id, released));
  await testDb.update(schema.jobs).set({ state: "machining" }).where(inArray(schema.jobs.id, machining));
  const byCustomer: Record<string, string[]> = {};
  for (const job of jobs) (byCustomer[job.customer] ??= []).push(job.number);
  fixture = { byCustomer, customerIds, jobs, released, machining };
});

describe("GET /api/jobs as the jobs table reads it", () => {
  it("pages on the server: page 3 of 20 holds the last 5 of 45", async () => {
    const numbers = fixture.jobs.map((j) => j.number).sort();
    const page1 = await list("sort=number&dir=asc&page=1&pageSize=20");
    const page3 = await list("sort=number&dir=asc&page=3&pageSize=20");
    expect(page1.total).toBe(JOB_COUNT);
    expect(page1.jobs.map((j) => j.number)).toEqual(numbers.slice(0, 20));
    expect(page3.total).toBe(JOB_COUNT);
    expect(page3.jobs).toHaveLength(5);
    expect(page3.jobs.map((j) => j.number)).toEqual(numbers.slice(40, 45));
    const page4 = await list("sort=number&dir=asc&page=4&pageSize=20");
    expect(page4).toEqual({ jobs: [], total: JOB_COUNT });
  });

  it("sorts by job number both ways, across pages", async () => {
    const numbers = fixture.jobs.map((j) => j.number).sort();
    const ascending = await list("sort=number&dir=asc&page=1&pageSize=20");
    const descending = await list("sort=number&dir=desc&page=1&pageSize=20");
    expect(ascending.jobs[0]!.number).toBe("BW-0001");
    expect(descending.jobs[0]!.number).toBe("BW-0045");
    expect(descending.jobs.map((j) => j.number)).toEqual([...numbers].reverse().slice(0, 20));
  });

  it("sorts by customer name", async () => {
    const page = await list("sort=customer&dir=asc&page=1&pageSize=20");
    const names = page.jobs.map((j) => j.customer.name);
    // 15 jobs each; alphabetically Bram, Ines, Odalys: the first page is Bram's 15, then 5 of Ines's.
    expect(names).toEqual([...Array(15).fill("Bram Tesselaar"), ...Array(5).fill("Ines Korvath")]);
  });

  it("filters by state and by customer, and combines them", async () => {
    const released = await list("state=released&page=1&pageSize=20");
    expect(released.total).toBe(RELEASED);
    expect(new Set(released.jobs.map((j) => j.id))).toEqual(new Set(fixture.released));
    const odalys = fixture.customerIds["Odalys Penhallow"]!;
    const forCustomer = await list(`customer=${odalys}&sort=number&dir=asc&page=1&pageSize=20`);
    expect(forCustomer.total).toBe(15);
    expect(forCustomer.jobs.map((j) => j.number)).toEqual(fixture.byCustomer["Odalys Penhallow"]);
    // Jobs 0..6 are released; customer Odalys holds jobs 0, 3 and 6 of them.
    const both = await list(`customer=${odalys}&state=released&page=1&pageSize=20`);
    expect(both.total).toBe(3);
  });

  it("searches by a customer's name, case aside", async () => {
    const found = await list("q=PENHALL&page=1&pageSize=20");
    expect(found.total).toBe(15);
    expect(new Set(found.jobs.map((j) => j.customer.name))).toEqual(new Set(["Odalys Penhallow"]));
    expect((await list("q=nobody-by-this-name&page=1&pageSize=20")).total).toBe(0);
  });

  it("shows a machinist released work only: none of the drafts", async () => {
    await actAs("machinist");
    const all = await list("page=1&pageSize=20");
    expect(all.total).toBe(RELEASED + MACHINING);
    expect(all.jobs.every((j) => j.state === "released" || j.state === "machining")).toBe(true);
    expect((await list("state=draft&page=1&pageSize=20")).total).toBe(0);
  });
});
