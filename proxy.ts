import { withAuth } from "next-auth/middleware";

// Coarse gate only: anonymous visitors to pages go to sign-in. Roles are checked on the server by every
// page, route handler and server action (lib/auth/session.ts); API routes answer 401 themselves.
export const proxy = withAuth({ pages: { signIn: "/sign-in" } });

export const config = {
  matcher: ["/((?!api/|sign-in|_next/|favicon.ico|icon.svg|robots.txt).*)"],
};
