import { z } from "zod";
import { apiRoute } from "@/lib/http/api-route";
import { changeOwnPassword } from "@/lib/auth/passwords";
import { ALL_ROLES } from "@/lib/auth/session";
import { newPasswordField } from "@/lib/auth/password-policy";

const bodySchema = z
  .object({
    currentPassword: z.string({ error: "currentPassword is required" }).min(1, { error: "currentPassword is required" }).max(200),
    newPassword: newPasswordField,
  })
  .strict();

/** Changes the caller's own password; every session of theirs, this one included, ends (204). */
export const POST = apiRoute({ roles: ALL_ROLES, body: bodySchema }, async ({ user, body }) => {
  await changeOwnPassword(user, body);
  return new Response(null, { status: 204 });
});
