import { z } from "zod";
import { apiError, apiRoute } from "@/lib/http/api-route";
import { getOutboxAttachment, OUTBOX_NAME } from "@/lib/server/outbox";

const paramsSchema = z.object({
  name: z.string().regex(OUTBOX_NAME, { error: "name must be an outbox file's name" }),
  index: z.coerce.number({ error: "index must be a number" }).int({ error: "index must be a whole number" }).min(0, { error: "index must be 0 or more" }),
});

// Types a browser would render inside our origin are sent as plain bytes instead.
const RENDERABLE = /^(text\/html|application\/xhtml|image\/svg|text\/xml|application\/xml)/i;

/** One attachment of a message in the mail fake's outbox, as a download. Admin only. */
export const GET = apiRoute({ roles: ["admin"], params: paramsSchema }, async ({ params }) => {
  const attachment = await getOutboxAttachment(params.name, params.index);
  if (!attachment) return apiError(404, "not_found", "No such message or attachment in the outbox.");
  const contentType = RENDERABLE.test(attachment.contentType) ? "application/octet-stream" : attachment.contentType;
  const fallbackName = attachment.filename.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return new Response(new Uint8Array(attachment.content), {
    headers: {
      "content-type": contentType,
      "content-length": String(attachment.content.length),
      "content-disposition": `attachment; filename="${fallbackName}"; filename*=UTF-8''${encodeURIComponent(attachment.filename)}`,
      "cache-control": "private, no-store",
    },
  });
});
