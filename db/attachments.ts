import "server-only";
import { and, eq } from "drizzle-orm";
import { RequestRefusal } from "@/db/refusal";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { maySeeJob, type Viewer } from "./visibility";
import { attachments, jobs, meteringBlocks, operations } from "./schema";

/** The job a block belongs to, if the viewer may see it. */
export async function getVisibleBlock(viewer: Viewer, blockId: string): Promise<{ blockId: string; jobId: string; jobNumber: string } | undefined> {
  const [row] = await getDb()
    .select({ blockId: meteringBlocks.id, jobId: jobs.id, jobNumber: jobs.number, state: jobs.state })
    .from(meteringBlocks)
    .innerJoin(jobs, eq(jobs.id, meteringBlocks.jobId))
    .where(eq(meteringBlocks.id, blockId));
  if (!row) return undefined;
  if (!maySeeJob(viewer, row.state)) return undefined;
  return { blockId: row.blockId, jobId: row.jobId, jobNumber: row.jobNumber };
}

export async function insertAttachment(
  viewer: Viewer,
  input: { blockId: string; operationId?: string; storageKey: string; contentType: string; byteSize: number },
): Promise<{ id: string }> {
  return getDb().transaction(async (tx) => {
    if (input.operationId) {
      const [op] = await tx
        .select({ id: operations.id })
        .from(operations)
        .where(and(eq(operations.id, input.operationId), eq(operations.blockId, input.blockId)));
      if (!op) throw new RequestRefusal(400, "That operation is not on this block.", "operationId");
    }
    const [row] = await tx
      .insert(attachments)
      .values({ ...input, operationId: input.operationId ?? null, uploadedById: viewer.id })
      .returning({ id: attachments.id });
    await recordAudit(tx, viewer.id, "attachment.create", row!.id, { blockId: input.blockId, bytes: input.byteSize });
    return row!;
  });
}

export async function getAttachment(viewer: Viewer, id: string) {
  const [row] = await getDb()
    .select({ id: attachments.id, blockId: attachments.blockId, storageKey: attachments.storageKey, contentType: attachments.contentType })
    .from(attachments)
    .where(eq(attachments.id, id));
  if (!row) return undefined;
  return (await getVisibleBlock(viewer, row.blockId)) ? row : undefined;
}

/** Photos of a job's blocks, newest first, for the job page. */
export async function listJobPhotos(jobId: string) {
  return getDb()
    .select({ id: attachments.id, blockId: attachments.blockId, side: meteringBlocks.side, operationId: attachments.operationId, createdAt: attachments.createdAt })
    .from(attachments)
    .innerJoin(meteringBlocks, eq(meteringBlocks.id, attachments.blockId))
    .where(eq(meteringBlocks.jobId, jobId));
}

