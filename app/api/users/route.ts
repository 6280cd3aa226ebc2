import { listUsers } from "@/db/users";
import { apiRoute } from "@/lib/http/api-route";
import { createAccount } from "@/lib/auth/accounts";
import { createUserSchema } from "@/app/(office)/shop/users/schema";

export const GET = apiRoute({ roles: ["admin"] }, async () => Response.json({ users: await listUsers() }));

export const POST = apiRoute({ roles: ["admin"], body: createUserSchema }, async ({ user, body }) =>
  Response.json({ user: await createAccount(user.id, body) }, { status: 201 }),
);
