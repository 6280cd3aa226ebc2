import { z } from "zod";
import { invalidInput, readJson, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { changeAccount } from "@/lib/auth/accounts";

const patchSchema = z
  .object({
    role: z.enum(["admin", "tuner", "machinist"], { error: "role must be admin, tuner or machinist" }).optional(),
    active: z.boolean({ error: "active must be true or false" }).optional(),
  })
  .strict()
  .refine((v) => v.role !== undefined || v.active !== undefined, { error: "give role or active", path: ["role"] });

export async function PATCH(request: Request, { params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const idCheck = z.uuid({ error: "id must be a user's id" }).safeParse(id);
  if (!idCheck.success) return invalidInput(new z.ZodError(idCheck.error.issues.map((i) => ({ ...i, path: ["id"] }))));
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = patchSchema.safeParse(body.value);
  if (!parsed.success) return invalidInput(parsed.error);
  const access = await authorize(["admin"]);
  if (!access.ok) return access.response;
  try {
    return Response.json({ user: await changeAccount(access.user.id, { userId: id, ...parsed.data }) });
  } catch (error) {
    return refusalResponse(error);
  }
}
