import "server-only";
import type { NextResponse } from "next/server";
import type { UserRole } from "@/db/schema";
import { apiError } from "@/lib/api";
import { checkRole, type SessionUser } from "./session";

export type Authorized = { ok: true; user: SessionUser } | { ok: false; response: NextResponse };

/** 401 for anonymous callers, 403 for the wrong role. */
export async function authorize(roles: readonly UserRole[]): Promise<Authorized> {
  const access = await checkRole(roles);
  if (access.ok) return access;
  return {
    ok: false,
    response: apiError(access.status, access.status === 401 ? "unauthenticated" : "forbidden", access.message),
  };
}
