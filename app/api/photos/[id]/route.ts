import { z } from "zod";
import { getAttachment } from "@/db/attachments";
import { apiError, invalidInput } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { ALL_ROLES } from "@/lib/auth/session";
import { thumbnailKeyOf } from "@/lib/photo-upload";
import { getObject } from "@/lib/storage";
import { parseIdParam } from "@/lib/route-params";

const querySchema = z.object({ size: z.enum(["full", "thumb"], { error: "size must be full or thumb" }).default("full") });

/** A block photo (or its thumbnail) for whoever may see the block. */
export async function GET(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const id = parseIdParam((await params).id);
  if (!id.ok) return invalidInput(id.error);
  const query = querySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) return invalidInput(query.error);
  const access = await authorize(ALL_ROLES);
  if (!access.ok) return access.response;
  const attachment = await getAttachment(access.user, id.id);
  if (!attachment) return apiError(404, "not_found", "No such photo.");
  const object = await getObject(query.data.size === "thumb" ? thumbnailKeyOf(attachment.storageKey) : attachment.storageKey);
  if (!object) return apiError(404, "not_found", "The photo's file is missing from storage.");
  return new Response(Buffer.from(object.body), {
    headers: {
      "content-type": query.data.size === "thumb" ? "image/jpeg" : attachment.contentType,
      "cache-control": "private, max-age=86400",
      "x-content-type-options": "nosniff",
    },
  });
}
