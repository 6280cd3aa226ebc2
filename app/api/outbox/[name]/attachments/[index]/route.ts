import { z } from "zod";
import { apiError, invalidInput } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { getOutboxAttachment, OUTBOX_NAME } from "@/lib/outbox";

const paramsSchema = z.object({
  name: z.string().regex(OUTBOX_NAME, { error: "name must be an outbox file's name" }),
  index: z.coerce.number({ error: "index must be a number" }).int({ error: "index must be a whole number" }).min(0, { error: "index must be 0 or more" }),
});

// Types a browser would render inside our origin are sent as plain bytes instead.
const RENDERABLE = /^(text\/html|application\/xhtml|image\/svg|text\/xml|application\/xml)/i;

/** One attachment of a message in the mail fake's outbox, as a download. Admin only. */
export async function GET(_request: Request, { params }: { params: Promise<{ name: string; index: string }> }) {
  const parsed = paramsSchema.safeParse(await params);
  if (!parsed.success) return invalidInput(parsed.error);
  const access = await authorize(["admin"]);
  if (!access.ok) return access.response;
  const attachment = await getOutboxAttachment(parsed.data.name, parsed.data.index);
  if (!attachment) return apiError(404, "not_found", "No such message or attachment in the outbox.");
  const contentType = RENDERABLE.test(attachment.contentType) ? "application/octet-stream" : attachment.contentType;
  const fallbackName = attachment.filename.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return new Response(new Uint8Array(attachment.content), {
    headers: {
      "content-type": contentType,
      "content-length": String(attachment.content.length),
      "content-disposition": `attachment; filename="${fallbackName}"; filename*=UTF-8''${encodeURIComponent(attachment.filename)}`,
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
    },
  });
}
