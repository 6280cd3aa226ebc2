import { listUsers } from "@/db/users";
import { invalidInput, readJson, refusalResponse } from "@/lib/api";
import { authorize } from "@/lib/auth/api-access";
import { createAccount } from "@/lib/auth/accounts";
import { createUserSchema } from "@/app/(office)/shop/users/schema";

export async function GET() {
  const access = await authorize(["admin"]);
  if (!access.ok) return access.response;
  return Response.json({ users: await listUsers() });
}

export async function POST(request: Request) {
  const body = await readJson(request);
  if (!body.ok) return body.response;
  const parsed = createUserSchema.safeParse(body.value);
  if (!parsed.success) return invalidInput(parsed.error);
  const access = await authorize(["admin"]);
  if (!access.ok) return access.response;
  try {
    return Response.json({ user: await createAccount(access.user.id, parsed.data) }, { status: 201 });
  } catch (error) {
    return refusalResponse(error);
  }
}
