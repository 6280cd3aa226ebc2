import { apiError, apiRoute } from "@/lib/http/api-route";
import { OFFICE_ROLES } from "@/lib/auth/session";
import { idParams } from "@/lib/http/route-params";
import { MAX_LOG_BYTES, previewTuningLog } from "@/lib/tuning/logs";

/** The mapping step: the file's columns and first rows (multipart `file`), and the mapping used last for the same header. */
export const POST = apiRoute(
  { roles: OFFICE_ROLES, params: idParams("id"), multipart: { maxBytes: MAX_LOG_BYTES + 64 * 1024, field: "file" } },
  async ({ user, params, form }) => {
    const file = form!.get("file");
    if (!(file instanceof File) || file.size === 0) return apiError(400, "invalid_input", "file: choose a log file (CSV)", { field: "file" });
    const head = Buffer.from(await file.slice(0, 64 * 1024).arrayBuffer());
    return Response.json({ preview: await previewTuningLog(user, params.id, head) });
  },
);
