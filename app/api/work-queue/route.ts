import { apiRoute } from "@/lib/http/api-route";
import { ALL_ROLES } from "@/lib/auth/session";
import { workQueueFor } from "@/lib/work-queue/queue";

/** The signed-in person's work queue: the tuner's, the machinist's or the admin's lists (see lib/work-queue/types.ts). */
export const GET = apiRoute({ roles: ALL_ROLES }, async ({ user }) => Response.json(await workQueueFor(user)));
