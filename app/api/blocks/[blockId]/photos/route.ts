import { z } from "zod";
import { getVisibleBlock } from "@/db/attachments";
import { apiError, apiRoute, invalidInput } from "@/lib/http/api-route";
import { ALL_ROLES } from "@/lib/auth/session";
import { storeBlockPhoto } from "@/lib/bench/photo-upload";
import { MAX_PHOTO_BYTES } from "@/lib/server/images";
import { idParams } from "@/lib/http/route-params";

const fieldsSchema = z.object({
  operationId: z.uuid({ error: "operationId must be an operation's id" }).optional(),
});

// Multipart framing and the operationId field add a little to the photo itself; a bigger body is cut off
// while it streams (413), and checkPhoto refuses a photo over MAX_PHOTO_BYTES.
const MAX_UPLOAD_BYTES = MAX_PHOTO_BYTES + 64 * 1024;

/** Uploads one photo of a block (multipart field `photo`, optional `operationId`). Images only, checked by content. */
export const POST = apiRoute(
  { roles: ALL_ROLES, params: idParams("blockId"), multipart: { maxBytes: MAX_UPLOAD_BYTES, field: "photo" } },
  async ({ user, params, form }) => {
    const file = form!.get("photo");
    if (!(file instanceof File)) return apiError(400, "invalid_input", "photo: choose a photo to upload", { field: "photo" });
    const operationId = form!.get("operationId");
    const fields = fieldsSchema.safeParse({ operationId: typeof operationId === "string" && operationId ? operationId : undefined });
    if (!fields.success) return invalidInput(fields.error);
    if (!(await getVisibleBlock(user, params.blockId))) return apiError(404, "not_found", "No such block.");
    const photo = await storeBlockPhoto(user, {
      blockId: params.blockId,
      operationId: fields.data.operationId,
      bytes: Buffer.from(await file.arrayBuffer()),
    });
    return Response.json({ photo: { id: photo.id, url: `/api/photos/${photo.id}`, thumbnailUrl: `/api/photos/${photo.id}?size=thumb` } }, { status: 201 });
  },
);
