import "server-only";
import { createUser, DuplicateEmailError, updateUser, type UserSummary } from "@/db/users";
import type { UserRole } from "@/db/schema";
import { RequestRefusal } from "@/db/refusal";
import { hashPassword } from "./credentials";
import { refuseWeak } from "./passwords";

export async function createAccount(
  actorId: string,
  input: { email: string; name: string; role: UserRole; password: string },
): Promise<UserSummary> {
  refuseWeak(input.password, input, "password");
  try {
    return await createUser({ actorId, email: input.email, name: input.name, role: input.role, passwordHash: await hashPassword(input.password) });
  } catch (error) {
    if (error instanceof DuplicateEmailError) throw new RequestRefusal(409, error.message, "email");
    throw error;
  }
}

/** Role changes and deactivation; the data layer keeps one active admin (in the same transaction). */
export async function changeAccount(
  actorId: string,
  input: { userId: string; role?: UserRole; active?: boolean },
): Promise<UserSummary> {
  const updated = await updateUser({ actorId, ...input });
  if (!updated) throw new RequestRefusal(404, "No such user.", "userId");
  return updated;
}
