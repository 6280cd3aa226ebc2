import { z } from "zod";
import { listTuningLogs } from "@/db/tuning-logs";
import { getJob } from "@/db/jobs";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { apiError, apiRoute, invalidInput } from "@/lib/http/api-route";
import { idParams } from "@/lib/http/route-params";
import { logMappingSchema, MAX_LOG_BYTES, uploadTuningLog } from "@/lib/tuning/logs";

/** The job's air-fuel logs, newest first. */
export const GET = apiRoute({ roles: OFFICE_ROLES, params: idParams("id") }, async ({ user, params }) => {
  if (!(await getJob(user, params.id))) return apiError(404, "not_found", "No such job.");
  const logs = await listTuningLogs(params.id);
  return Response.json({
    logs: logs.map((l) => ({
      id: l.id,
      fileName: l.fileName,
      revision: l.revisionNumber,
      rows: l.totalRows,
      used: l.usedRows,
      rejected: l.rejectedCount,
      uploadedAt: l.uploadedAt.toISOString(),
      uploadedBy: l.uploadedBy,
      acceptedAt: l.acceptedAt?.toISOString() ?? null,
      nextRevision: l.nextRevisionNumber,
      changes: l.acceptedChanges ?? [],
    })),
  });
});

/**
 * Reads a log (multipart: `file`, the CSV; `mapping`, JSON naming its columns) against the revision the
 * engine ran on; keeps the file and its analysis.
 */
export const POST = apiRoute(
  { roles: OFFICE_ROLES, params: idParams("id"), multipart: { maxBytes: MAX_LOG_BYTES + 64 * 1024, field: "file" } },
  async ({ user, params, form }) => {
    const file = form!.get("file");
    if (!(file instanceof File) || file.size === 0) return apiError(400, "invalid_input", "file: choose a log file (CSV)", { field: "file" });
    const rawMapping = form!.get("mapping");
    let mappingJson: unknown;
    try {
      mappingJson = typeof rawMapping === "string" ? JSON.parse(rawMapping) : undefined;
    } catch {
      return apiError(400, "invalid_input", "mapping: send the mapping as JSON", { field: "mapping" });
    }
    if (mappingJson === undefined) return apiError(400, "invalid_input", "mapping: map the file's columns first", { field: "mapping" });
    const mapping = logMappingSchema.safeParse(mappingJson);
    if (!mapping.success) return invalidInput(new z.ZodError(mapping.error.issues.map((i) => ({ ...i, path: ["mapping", ...i.path] }))));
    const log = await uploadTuningLog(user, {
      jobId: params.id,
      fileName: file.name || "log.csv",
      bytes: Buffer.from(await file.arrayBuffer()),
      mapping: mapping.data,
    });
    return Response.json({ log }, { status: 201 });
  },
);
