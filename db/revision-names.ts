import "server-only";
import { eq, inArray, sql, type SQL } from "drizzle-orm";
import type { Executor } from "./client";
import { customers, planRevisions, users } from "./schema";

// The names a revision prints (customer, tuner, who approved and who released it) are kept in its snapshot as
// they were at the time, so renaming a customer or a person never changes an approved revision's record.
// Revisions approved before the names were kept have none: for those alone the names are read from the rows
// the snapshot points at (the snapshot's own customer and tuner, the revision's approver and releaser).

/** The names an approved revision keeps; `releasedBy` joins them when the revision is released. */
export interface RevisionNames {
  customer: string;
  tuner: string;
  approvedBy: string;
  releasedBy?: string | undefined;
}

/** Names as they are now, to keep in a snapshot being approved (read inside the approval's transaction). */
export async function namesAtApproval(db: Executor, ids: { customerId: string; tunerId: string; approverId: string }): Promise<RevisionNames> {
  const [customer] = await db.select({ name: customers.name }).from(customers).where(eq(customers.id, ids.customerId));
  const people = await db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, [ids.tunerId, ids.approverId]));
  const nameOf = (id: string) => people.find((p) => p.id === id)?.name ?? "";
  return { customer: customer?.name ?? "", tuner: nameOf(ids.tunerId), approvedBy: nameOf(ids.approverId) };
}

/** Adds who released the revision to its kept names (the rest of the snapshot stays as approved). */
export function withReleasedBy(releaserId: string): SQL {
  return sql`jsonb_set(${planRevisions.snapshot}, '{names}', coalesce(${planRevisions.snapshot} -> 'names', '{}'::jsonb) || jsonb_build_object('releasedBy', (select ${users.name} from ${users} where ${users.id} = ${releaserId})))`;
}

const kept = (key: keyof RevisionNames) => sql`${planRevisions.snapshot} #>> ${sql.raw(`'{names,${key}}'`)}`;
const nameOfUser = (id: SQL) => sql`(select ${users.name} from ${users} where ${users.id}::text = ${id})`;

/**
 * Select columns for a query over plan_revisions: each name as the revision kept it, or for older revisions
 * as the rows it points at are named now. `releasedBy` is null while the revision is not released.
 */
export const revisionNameColumns = {
  customer: sql<string>`coalesce(${kept("customer")}, (select ${customers.name} from ${customers} where ${customers.id}::text = ${planRevisions.snapshot} #>> '{job,customerId}'), '')`,
  tuner: sql<string>`coalesce(${kept("tuner")}, ${nameOfUser(sql`${planRevisions.snapshot} #>> '{job,tunerId}'`)}, '')`,
  approvedBy: sql<string>`coalesce(${kept("approvedBy")}, ${nameOfUser(sql`${planRevisions.approvedById}::text`)}, '')`,
  releasedBy: sql<string | null>`case when ${planRevisions.releasedById} is null then null else coalesce(${kept("releasedBy")}, ${nameOfUser(sql`${planRevisions.releasedById}::text`)}, '') end`,
};
