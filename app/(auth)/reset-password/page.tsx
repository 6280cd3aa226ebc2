import type { Metadata } from "next";
import Link from "next/link";
import { resetLinkHolder } from "@/lib/auth/passwords";
import { ResetPasswordForm } from "./reset-password-form";

export const metadata: Metadata = { title: "Set a new password", referrer: "no-referrer" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { token } = await searchParams;
  const value = typeof token === "string" ? token : "";
  const holder = /^[A-Za-z0-9_-]{43}$/.test(value) ? await resetLinkHolder(value) : undefined;
  return (
    <main className="mx-auto grid min-h-dvh max-w-md content-center gap-6 px-6 py-10">
      <h1 className="text-3xl font-bold tracking-tight">Set a new password</h1>
      {holder ? (
        <div className="rounded-[var(--radius-sheet)] border-2 border-ink bg-sheet p-8 shadow-[6px_6px_0_var(--color-rule)]">
          <p className="mb-6 text-sm text-graphite">For {holder.email}. The link works once.</p>
          <ResetPasswordForm token={value} />
        </div>
      ) : (
        <p role="alert" className="text-graphite">
          This link has expired or was already used. Ask the shop&apos;s admin for a new one, or{" "}
          <Link href="/sign-in" className="underline">
            sign in
          </Link>
          .
        </p>
      )}
    </main>
  );
}
