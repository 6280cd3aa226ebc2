import "server-only";
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { endSessions } from "@/db/users";
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable } from "@/db/faults";
import { safeCallbackPath } from "@/lib/http/safe-callback";
import { getEnv } from "@/lib/server/env";
import { clientAddress } from "./client-address";
import { SignInRefused, verifyCredentials } from "./credentials";

const credentialsSchema = z.object({
  email: z.email(),
  password: z.string().min(1),
});

// A machinist's session should outlast a shift at the bench.
const SESSION_HOURS = 14;

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: SESSION_HOURS * 60 * 60 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw, req) {
        const parsed = credentialsSchema.safeParse(raw);
        if (!parsed.success) throw new Error("Enter an e-mail address and a password.");
        try {
          return await verifyCredentials({ ...parsed.data, address: clientAddress(req?.headers, getEnv().TRUSTED_PROXY) });
        } catch (error) {
          if (error instanceof SignInRefused) throw new Error(error.message);
          // next-auth hands a thrown message to the sign-in form as it is: never the failed query's text.
          if (isDatabaseUnavailable(error)) throw new Error(DATABASE_UNAVAILABLE_MESSAGE);
          throw error;
        }
      },
    }),
  ],
  events: {
    // Signing out ends the session everywhere: the cookie a browser may have kept (or someone copied) stops
    // working at once instead of at its expiry.
    async signOut({ token }) {
      if (token?.sub) await endSessions(token.sub);
    },
  },
  callbacks: {
    // The same rule as the sign-in page: only a path on this site, whatever callbackUrl said.
    redirect({ url, baseUrl }) {
      return `${baseUrl}${safeCallbackPath(url, baseUrl)}`;
    },
    // The token only carries the user's id and session version; role, active state and the current version
    // are read from the database on every request (lib/auth/session.ts), so a role change, deactivation or
    // sign-out everywhere takes effect at once.
    jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.sv = (user as { sessionVersion?: number }).sessionVersion;
      }
      return token;
    },
    session({ session, token }) {
      return { ...session, userId: token.sub, sessionVersion: token.sv };
    },
  },
};
