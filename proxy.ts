import { NextResponse, type NextFetchEvent, type NextRequest } from "next/server";
import { withAuth, type NextRequestWithAuth } from "next-auth/middleware";
import { applySecurityHeaders, createNonce, securityHeaders } from "@/lib/http/security-headers";

// Runs before every request. Two jobs: the security headers on every answer (pages get a fresh script nonce,
// which Next reads from the request's Content-Security-Policy and puts on its own scripts), and the coarse
// redirect of anonymous page visits to sign-in. Roles are checked on the server by every page, route handler
// and server action (lib/auth/session.ts); API routes answer 401 themselves.

const signInGate = withAuth({ pages: { signIn: "/sign-in" } });

/**
 * Paths anyone may open: sign-in, setting a password from a reset link, the API (it answers for itself), Next's
 * assets, and what a phone fetches to install the app (the manifest and its icons: browsers fetch them without
 * the session cookie).
 */
function isPublicPath(pathname: string): boolean {
  return /^\/(sign-in|reset-password|api\/|_next\/|favicon\.ico|icon\.svg|robots\.txt|manifest\.webmanifest$|icons\/|apple-icon\.png)/.test(pathname);
}

export async function proxy(request: NextRequest, event: NextFetchEvent): Promise<Response> {
  const { pathname } = request.nextUrl;
  const nonce = createNonce();
  const headers = pathname.startsWith("/api/")
    ? securityHeaders("api")
    : securityHeaders({ page: { nonce, development: process.env.NODE_ENV === "development" } });
  if (!isPublicPath(pathname)) {
    const toSignIn = await signInGate(request as NextRequestWithAuth, event);
    if (toSignIn) {
      applySecurityHeaders(toSignIn.headers, headers);
      return toSignIn;
    }
  }
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("x-nonce", nonce);
  requestHeaders.set("content-security-policy", headers["content-security-policy"]!);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  applySecurityHeaders(response.headers, headers);
  return response;
}

export const config = {
  // Everything but Next's hashed static files (served with their own long cache).
  matcher: ["/((?!_next/static|_next/image).*)"],
};
