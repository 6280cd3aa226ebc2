import { z } from "zod";
import { getAttachment } from "@/db/attachments";
import { apiError, apiRoute } from "@/lib/http/api-route";
import { ALL_ROLES } from "@/lib/auth/session";
import { photoDisposition, thumbnailKeyOf } from "@/lib/bench/photo-upload";
import { getObject } from "@/lib/server/storage";
import { idParams } from "@/lib/http/route-params";

const querySchema = z.object({ size: z.enum(["full", "thumb"], { error: "size must be full or thumb" }).default("full") });

/** A block photo (or its thumbnail) for whoever may see the block. */
export const GET = apiRoute({ roles: ALL_ROLES, params: idParams("id"), query: querySchema }, async ({ user, params, query }) => {
  const attachment = await getAttachment(user, params.id);
  if (!attachment) return apiError(404, "not_found", "No such photo.");
  const thumb = query.size === "thumb";
  const object = await getObject(thumb ? thumbnailKeyOf(attachment.storageKey) : attachment.storageKey);
  if (!object) return apiError(404, "not_found", "The photo's file is missing from storage.");
  const contentType = thumb ? "image/jpeg" : attachment.contentType;
  return new Response(Buffer.from(object.body), {
    headers: {
      "content-type": contentType,
      "content-disposition": photoDisposition(params.id, contentType, thumb),
      "cache-control": "private, max-age=86400",
    },
  });
});
