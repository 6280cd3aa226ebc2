import { apiRoute } from "@/lib/http/api-route";
import { signOutEverywhere } from "@/lib/auth/passwords";
import { ALL_ROLES } from "@/lib/auth/session";

/** Signs the caller out on every device: every session cookie issued so far stops working (204). */
export const DELETE = apiRoute({ roles: ALL_ROLES }, async ({ user }) => {
  await signOutEverywhere(user);
  return new Response(null, { status: 204 });
});
