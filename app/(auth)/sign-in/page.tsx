import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getSessionUser } from "@/lib/auth/session";
import { getEnv } from "@/lib/server/env";
import { safeCallbackPath } from "@/lib/http/safe-callback";
import { SafetyNote } from "@/components/ui/safety-note";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const params = await searchParams;
  const returnTo = safeCallbackPath(params.callbackUrl, getEnv().APP_BASE_URL);
  if (await getSessionUser()) redirect(returnTo);
  return (
    <main className="mx-auto grid min-h-dvh max-w-5xl items-center gap-10 px-6 py-10 md:grid-cols-[1.1fr_1fr]">
      <div>
        <p className="text-xs font-semibold uppercase tracking-[0.2em] text-pencil">Metering-block conversions</p>
        <h1 className="mt-2 text-5xl font-bold tracking-tight">Blockwright</h1>
        <p className="mt-4 max-w-md text-lg text-graphite">
          Plan the restriction holes, the plug and the grind for every block of a blow-through carburetor, print its
          traveler, and sign the work off at the bench.
        </p>
        <div className="mt-8 hidden max-w-md md:block">
          <SafetyNote signal="NOTICE" title={SAFETY_CAUTIONS.general.title}>
            {SAFETY_CAUTIONS.general.text}
          </SafetyNote>
        </div>
      </div>
      <div className="rounded-[var(--radius-sheet)] border-2 border-ink bg-sheet p-8 shadow-[6px_6px_0_var(--color-rule)]">
        <h2 className="mb-6 text-xl font-semibold">Sign in</h2>
        {params.notice === "password-changed" || params.notice === "signed-out-everywhere" ? (
          <p role="status" className="mb-4 text-sm text-graphite">
            {params.notice === "password-changed" ? "Your password is changed: sign in with the new one." : "You are signed out on every device."}
          </p>
        ) : null}
        <SignInForm returnTo={returnTo} />
      </div>
    </main>
  );
}
