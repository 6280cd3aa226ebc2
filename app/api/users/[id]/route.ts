import { z } from "zod";
import { apiRoute } from "@/lib/http/api-route";
import { changeAccount } from "@/lib/auth/accounts";
import { idParams } from "@/lib/http/route-params";

const patchSchema = z
  .object({
    role: z.enum(["admin", "tuner", "machinist"], { error: "role must be admin, tuner or machinist" }).optional(),
    active: z.boolean({ error: "active must be true or false" }).optional(),
  })
  .strict()
  .refine((v) => v.role !== undefined || v.active !== undefined, { error: "give role or active", path: ["role"] });

export const PATCH = apiRoute({ roles: ["admin"], params: idParams("id"), body: patchSchema }, async ({ user, params, body }) =>
  Response.json({ user: await changeAccount(user.id, { userId: params.id, ...body }) }),
);
