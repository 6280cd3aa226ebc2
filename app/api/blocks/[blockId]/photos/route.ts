import { z } from "zod";
import { getVisibleBlock } from "@/db/attachments";
import { apiError, invalidInput, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { ALL_ROLES } from "@/lib/auth/session";
import { storeBlockPhoto } from "@/lib/photo-upload";
import { MAX_PHOTO_BYTES } from "@/lib/photos";
import { parseIdParam } from "@/lib/route-params";

const fieldsSchema = z.object({
  operationId: z.uuid({ error: "operationId must be an operation's id" }).optional(),
});

/** Uploads one photo of a block (multipart field `photo`, optional `operationId`). Images only, checked by content. */
export async function POST(request: Request, { params }: { params: Promise<{ blockId: string }> }) {
  const id = parseIdParam((await params).blockId, "blockId");
  if (!id.ok) return invalidInput(id.error);
  const access = await authorize(ALL_ROLES);
  if (!access.ok) return access.response;
  const declared = Number(request.headers.get("content-length") ?? 0);
  // Multipart framing adds a little; anything far beyond the limit is refused before it is read.
  if (declared > MAX_PHOTO_BYTES + 64 * 1024) {
    return apiError(413, "invalid_input", `photo: photos may be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB`, { field: "photo" });
  }
  let form: FormData;
  try {
    form = await request.formData();
  } catch {
    return apiError(400, "invalid_input", "photo: send the photo as multipart form data", { field: "photo" });
  }
  const file = form.get("photo");
  if (!(file instanceof File)) return apiError(400, "invalid_input", "photo: choose a photo to upload", { field: "photo" });
  const fields = fieldsSchema.safeParse({ operationId: form.get("operationId") || undefined });
  if (!fields.success) return invalidInput(fields.error);
  if (!(await getVisibleBlock(access.user, id.id))) return apiError(404, "not_found", "No such block.");
  try {
    const photo = await storeBlockPhoto(access.user, {
      blockId: id.id,
      operationId: fields.data.operationId,
      bytes: Buffer.from(await file.arrayBuffer()),
    });
    return Response.json({ photo: { id: photo.id, url: `/api/photos/${photo.id}`, thumbnailUrl: `/api/photos/${photo.id}?size=thumb` } }, { status: 201 });
  } catch (error) {
    return refusalResponse(error);
  }
}
