import "server-only";
import { asc, count, eq, ilike, or } from "drizzle-orm";
import { recordAudit } from "./audit";
import { getDb, type Executor } from "./client";
import { customers, jobs } from "./schema";

export interface CustomerSummary {
  id: string;
  name: string;
  email: string | null;
  phone: string | null;
  notes: string;
}

const columns = { id: customers.id, name: customers.name, email: customers.email, phone: customers.phone, notes: customers.notes };

export async function listCustomers(): Promise<CustomerSummary[]> {
  return getDb().select(columns).from(customers).orderBy(asc(customers.name));
}

export interface CustomerWithJobs extends CustomerSummary {
  jobCount: number;
}

/** Customers by name with how many jobs each has; `q` matches name, e-mail or phone. */
export async function listCustomersWithJobCounts(q?: string): Promise<CustomerWithJobs[]> {
  const pattern = q ? `%${q.replace(/[%_\\]/g, (c) => `\\${c}`)}%` : undefined;
  return getDb()
    .select({ ...columns, jobCount: count(jobs.id) })
    .from(customers)
    .leftJoin(jobs, eq(jobs.customerId, customers.id))
    .where(pattern ? or(ilike(customers.name, pattern), ilike(customers.email, pattern), ilike(customers.phone, pattern)) : undefined)
    .groupBy(customers.id)
    .orderBy(asc(customers.name));
}

export async function getCustomer(id: string): Promise<CustomerSummary | undefined> {
  const [row] = await getDb().select(columns).from(customers).where(eq(customers.id, id));
  return row;
}

export async function insertCustomer(
  db: Executor,
  actorId: string,
  input: { name: string; email?: string | null; phone?: string | null; notes?: string },
): Promise<CustomerSummary> {
  const [row] = await db
    .insert(customers)
    .values({ name: input.name.trim(), email: input.email || null, phone: input.phone || null, notes: input.notes ?? "" })
    .returning(columns);
  if (!row) throw new Error("insert returned no row");
  await recordAudit(db, actorId, "customer.create", row.id, { name: row.name });
  return row;
}

export async function createCustomer(actorId: string, input: { name: string; email?: string | null; phone?: string | null; notes?: string }) {
  return getDb().transaction((tx) => insertCustomer(tx, actorId, input));
}

export async function updateCustomer(
  actorId: string,
  id: string,
  input: { name: string; email?: string | null; phone?: string | null; notes?: string },
): Promise<CustomerSummary | undefined> {
  return getDb().transaction(async (tx) => {
    const [row] = await tx
      .update(customers)
      .set({ name: input.name.trim(), email: input.email || null, phone: input.phone || null, notes: input.notes ?? "" })
      .where(eq(customers.id, id))
      .returning(columns);
    if (row) await recordAudit(tx, actorId, "customer.update", id, { name: row.name });
    return row;
  });
}
