import { apiRoute } from "@/lib/http/api-route";
import { sendPasswordReset } from "@/lib/auth/passwords";
import { idParams } from "@/lib/http/route-params";

/** Mails the user a single-use link to set a new password (202). Admin only. */
export const POST = apiRoute({ roles: ["admin"], params: idParams("id") }, async ({ user, params }) => {
  await sendPasswordReset(user, params.id);
  return new Response(null, { status: 202 });
});
