import "server-only";
import { and, asc, count, desc, eq, ilike, inArray, or, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { JobState } from "@/db/job-states";
import { visibleJobsWhere, type Viewer } from "./visibility";
import { RequestRefusal } from "@/db/refusal";
import { recordAudit } from "./audit";
import { getDb, type Executor } from "./client";
import { insertCustomer } from "./customers";
import { revisionNameColumns } from "./revision-names";
import { customers, enrichmentStages, jobs, meteringBlocks, operations, planRevisions, users, type Job } from "./schema";

export interface JobListRow {
  id: string;
  number: string;
  state: JobState;
  customer: { id: string; name: string };
  tuner: { id: string; name: string };
  updatedAt: string;
}

const tuners = alias(users, "tuner");

export async function listJobs(
  viewer: Viewer,
  query: {
    state?: JobState;
    customer?: string;
    tuner?: string;
    q?: string;
    page: number;
    pageSize: number;
    sort: "number" | "state" | "customer" | "tuner" | "updatedAt";
    dir: "asc" | "desc";
  },
): Promise<{ jobs: JobListRow[]; total: number }> {
  const db = getDb();
  const pattern = query.q ? `%${query.q.replace(/[%_\\]/g, (c) => `\\${c}`)}%` : undefined;
  const where = and(
    visibleJobsWhere(viewer),
    query.state ? eq(jobs.state, query.state) : undefined,
    query.customer ? eq(jobs.customerId, query.customer) : undefined,
    query.tuner ? eq(jobs.tunerId, query.tuner) : undefined,
    pattern ? or(ilike(jobs.number, pattern), ilike(customers.name, pattern), ilike(jobs.carburetor, pattern), ilike(jobs.notes, pattern)) : undefined,
  );
  const sortColumn = {
    number: jobs.number,
    state: jobs.state,
    customer: customers.name,
    tuner: tuners.name,
    updatedAt: jobs.updatedAt,
  }[query.sort];
  const order = query.dir === "asc" ? asc(sortColumn) : desc(sortColumn);
  const rows = await db
    .select({
      id: jobs.id,
      number: jobs.number,
      state: jobs.state,
      customerId: customers.id,
      customerName: customers.name,
      tunerId: tuners.id,
      tunerName: tuners.name,
      updatedAt: jobs.updatedAt,
    })
    .from(jobs)
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .innerJoin(tuners, eq(tuners.id, jobs.tunerId))
    .where(where)
    .orderBy(order, desc(jobs.number))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const [totalRow] = await db
    .select({ n: count() })
    .from(jobs)
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .innerJoin(tuners, eq(tuners.id, jobs.tunerId))
    .where(where);
  return {
    total: totalRow?.n ?? 0,
    jobs: rows.map((r) => ({
      id: r.id,
      number: r.number,
      state: r.state,
      customer: { id: r.customerId, name: r.customerName },
      tuner: { id: r.tunerId, name: r.tunerName },
      updatedAt: r.updatedAt.toISOString(),
    })),
  };
}

export type StageRow = typeof enrichmentStages.$inferSelect;
export type BlockRow = typeof meteringBlocks.$inferSelect & { stages: StageRow[] };

export interface JobRecord {
  job: Job;
  customer: { id: string; name: string; email: string | null; phone: string | null };
  tuner: { id: string; name: string };
  blocks: BlockRow[];
  revisions: { id: string; number: number; status: "current" | "superseded"; approvedAt: string; releasedAt: string | null; approvedBy: string }[];
}

/** The whole job as its pages show it; undefined when it doesn't exist or the viewer may not see it. */
export async function getJob(viewer: Viewer, id: string): Promise<JobRecord | undefined> {
  const db = getDb();
  const [row] = await db
    .select({ job: jobs, customer: { id: customers.id, name: customers.name, email: customers.email, phone: customers.phone }, tuner: { id: tuners.id, name: tuners.name } })
    .from(jobs)
    .innerJoin(customers, eq(customers.id, jobs.customerId))
    .innerJoin(tuners, eq(tuners.id, jobs.tunerId))
    .where(and(eq(jobs.id, id), visibleJobsWhere(viewer)));
  if (!row) return undefined;
  const blockRows = await db.select().from(meteringBlocks).where(eq(meteringBlocks.jobId, id)).orderBy(asc(meteringBlocks.side));
  const stageRows = blockRows.length
    ? await db
        .select()
        .from(enrichmentStages)
        .where(inArray(enrichmentStages.blockId, blockRows.map((b) => b.id)))
        .orderBy(asc(enrichmentStages.position))
    : [];
  const revisionRows = await db
    .select({
      id: planRevisions.id,
      number: planRevisions.number,
      status: planRevisions.status,
      approvedAt: planRevisions.approvedAt,
      releasedAt: planRevisions.releasedAt,
      // The approver's name as the revision keeps it: a later rename leaves the record of the approval alone.
      approvedBy: revisionNameColumns.approvedBy,
    })
    .from(planRevisions)
    .where(eq(planRevisions.jobId, id))
    .orderBy(desc(planRevisions.number));
  return {
    job: row.job,
    customer: row.customer,
    tuner: row.tuner,
    blocks: blockRows.map((b) => ({ ...b, stages: stageRows.filter((s) => s.blockId === b.id) })),
    revisions: revisionRows.map((r) => ({
      ...r,
      approvedAt: r.approvedAt.toISOString(),
      releasedAt: r.releasedAt?.toISOString() ?? null,
    })),
  };
}

export type JobFields = Omit<
  typeof jobs.$inferInsert,
  "id" | "number" | "state" | "currentRevision" | "createdAt" | "updatedAt" | "customerId" | "tunerId"
>;

export async function createJob(
  actor: Viewer,
  input: { fields: JobFields; customerId?: string; newCustomerName?: string; tunerId?: string },
): Promise<{ id: string; number: string }> {
  return getDb().transaction(async (tx) => {
    const customerId = input.customerId ?? (await insertCustomer(tx, actor.id, { name: input.newCustomerName! })).id;
    const [customer] = await tx.select({ id: customers.id }).from(customers).where(eq(customers.id, customerId));
    if (!customer) throw new RequestRefusal(400, "No such customer.", "customerId");
    const tunerId = await resolveTuner(tx, actor, input.tunerId);
    const [job] = await tx
      .insert(jobs)
      .values({
        ...input.fields,
        customerId,
        tunerId,
        number: sql`'BW-' || lpad(nextval('job_number_seq')::text, 4, '0')`,
      })
      .returning({ id: jobs.id, number: jobs.number });
    if (!job) throw new Error("insert returned no row");
    await recordAudit(tx, actor.id, "job.create", job.id, { number: job.number });
    return job;
  });
}

async function resolveTuner(db: Executor, actor: Viewer, requested: string | undefined): Promise<string> {
  // Whoever the request names, only an admin puts a job in another person's name.
  if (requested && requested !== actor.id && actor.role !== "admin") {
    throw new RequestRefusal(403, "A tuner opens jobs in their own name; an admin assigns them to others.", "tunerId");
  }
  if (!requested || requested === actor.id) {
    if (actor.role === "tuner" || actor.role === "admin") return actor.id;
  }
  const [tuner] = await db
    .select({ id: users.id })
    .from(users)
    .where(and(eq(users.id, requested ?? ""), eq(users.active, true), inArray(users.role, ["tuner", "admin"])));
  if (!tuner) throw new RequestRefusal(400, "Choose an active tuner.", "tunerId");
  return tuner.id;
}

/** Locks the job row for the rest of the transaction, so concurrent changes queue up. */
export async function lockJob(db: Executor, id: string): Promise<Job> {
  const [job] = await db.select().from(jobs).where(eq(jobs.id, id)).for("update");
  if (!job) throw new RequestRefusal(404, "No such job.");
  return job;
}

/** How an edit treats a job the bench is machining: refused, or the job put on hold (confirmed by the editor). */
export interface EditOptions {
  confirmHold?: boolean | undefined;
}

/**
 * Editing the inputs of a job that already has an approved revision sends it back to draft: the approved
 * revision stays as it is until the next approval supersedes it. A job in machining is put on hold instead,
 * and only when the editor confirmed it: the bench keeps its record and shows the revision on hold.
 */
export async function touchForEdit(db: Executor, job: Job, options: EditOptions = {}): Promise<void> {
  let state: Job["state"] = "draft";
  if (job.state === "machining" || job.state === "held") {
    if (job.state === "machining" && !options.confirmHold) {
      throw new RequestRefusal(409, `The bench is machining revision ${job.currentRevision}: confirm putting the job on hold to edit it.`, "confirmHold");
    }
    state = "held";
  }
  await db.update(jobs).set({ updatedAt: new Date(), state }).where(eq(jobs.id, job.id));
}

export async function updateJob(actor: Viewer, id: string, input: { fields: Partial<JobFields>; tunerId?: string; customerId?: string }, options: EditOptions = {}): Promise<void> {
  await getDb().transaction(async (tx) => {
    const job = await lockJob(tx, id);
    const tunerId = input.tunerId ? await resolveTuner(tx, actor, input.tunerId) : job.tunerId;
    if (input.customerId) {
      const [customer] = await tx.select({ id: customers.id }).from(customers).where(eq(customers.id, input.customerId));
      if (!customer) throw new RequestRefusal(400, "No such customer.", "customerId");
    }
    await tx
      .update(jobs)
      .set({ ...input.fields, tunerId, customerId: input.customerId ?? job.customerId })
      .where(eq(jobs.id, id));
    await touchForEdit(tx, job, options);
    await recordAudit(tx, actor.id, "job.update", id, { from: job.state });
  });
}

export type BlockFields = Omit<typeof meteringBlocks.$inferInsert, "id" | "jobId" | "createdAt">;
export type StageFields = Omit<typeof enrichmentStages.$inferInsert, "id" | "blockId" | "position" | "chosenCount" | "chosenDrillLabel">;

/**
 * Replaces the job's blocks and stages with the ones given, in one transaction. A block keeps its id (its
 * travelers and bench record hang on it) as long as its side stays; a side that already has operations in a
 * revision cannot be removed. A stage keeps the tuner's pick when its valve and target are unchanged.
 */
export async function saveJobBlocks(actor: Viewer, jobId: string, blocks: (BlockFields & { stages: StageFields[] })[], options: EditOptions = {}): Promise<void> {
  await getDb().transaction(async (tx) => {
    const job = await lockJob(tx, jobId);
    if (job.state === "machining" && !options.confirmHold) await touchForEdit(tx, job, options);
    const existing = await tx.select().from(meteringBlocks).where(eq(meteringBlocks.jobId, jobId));
    for (const old of existing) {
      if (blocks.some((b) => b.side === old.side)) continue;
      const [used] = await tx.select({ n: count() }).from(operations).where(eq(operations.blockId, old.id));
      if ((used?.n ?? 0) > 0) throw new RequestRefusal(409, `The ${old.side} block has operations in an approved revision and cannot be removed.`, "blocks");
      await tx.delete(meteringBlocks).where(eq(meteringBlocks.id, old.id));
    }
    for (const { stages, ...fields } of blocks) {
      const old = existing.find((b) => b.side === fields.side);
      let blockId: string;
      let previousStages: StageRow[] = [];
      if (old) {
        blockId = old.id;
        await tx.update(meteringBlocks).set(fields).where(eq(meteringBlocks.id, old.id));
        previousStages = await tx.select().from(enrichmentStages).where(eq(enrichmentStages.blockId, old.id)).orderBy(asc(enrichmentStages.position));
        await tx.delete(enrichmentStages).where(eq(enrichmentStages.blockId, old.id));
      } else {
        const [created] = await tx.insert(meteringBlocks).values({ ...fields, jobId }).returning({ id: meteringBlocks.id });
        blockId = created!.id;
      }
      if (stages.length) {
        await tx.insert(enrichmentStages).values(
          stages.map((stage, position) => {
            const before = previousStages[position];
            const same =
              before &&
              before.valveKind === stage.valveKind &&
              before.targetKind === stage.targetKind &&
              before.targetTo === stage.targetTo &&
              (before.targetFrom ?? null) === (stage.targetFrom ?? null);
            return {
              ...stage,
              blockId,
              position,
              chosenCount: same ? before.chosenCount : null,
              chosenDrillLabel: same ? before.chosenDrillLabel : null,
            };
          }),
        );
      }
    }
    await touchForEdit(tx, job, options);
    await recordAudit(tx, actor.id, "job.blocks", jobId, { sides: blocks.map((b) => b.side), from: job.state });
  });
}

/** Records the tuner's pick among the solver's candidates for one stage. */
export async function chooseStageLayout(actor: Viewer, input: { jobId: string; stageId: string; count: number; drillLabel: string }): Promise<void> {
  await getDb().transaction(async (tx) => {
    const job = await lockJob(tx, input.jobId);
    const [stage] = await tx
      .select({ id: enrichmentStages.id })
      .from(enrichmentStages)
      .innerJoin(meteringBlocks, eq(meteringBlocks.id, enrichmentStages.blockId))
      .where(and(eq(enrichmentStages.id, input.stageId), eq(meteringBlocks.jobId, input.jobId)));
    if (!stage) throw new RequestRefusal(404, "No such stage in this job.", "stageId");
    await tx
      .update(enrichmentStages)
      .set({ chosenCount: input.count, chosenDrillLabel: input.drillLabel })
      .where(eq(enrichmentStages.id, input.stageId));
    await touchForEdit(tx, job);
    await recordAudit(tx, actor.id, "job.choose", input.jobId, { stageId: input.stageId, count: input.count, drill: input.drillLabel });
  });
}

/** The job's number and its tuner's address, for messages about the job (no visibility: the system writes them). */
export async function getJobTuner(jobId: string): Promise<{ number: string; email: string; name: string } | undefined> {
  const [row] = await getDb()
    .select({ email: users.email, name: users.name, number: jobs.number })
    .from(jobs)
    .innerJoin(users, eq(users.id, jobs.tunerId))
    .where(eq(jobs.id, jobId));
  return row;
}

/** The ids of the job's metering blocks, primary before secondary. */
export async function listJobBlockIds(jobId: string): Promise<string[]> {
  const rows = await getDb().select({ id: meteringBlocks.id }).from(meteringBlocks).where(eq(meteringBlocks.jobId, jobId)).orderBy(asc(meteringBlocks.side));
  return rows.map((r) => r.id);
}
