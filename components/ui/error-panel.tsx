"use client";

import Link from "next/link";
import { Button } from "./button";

/**
 * What a page shows when it failed on the server or in the browser: no details (they are in the server log, under
 * the digest), a way to try again, and the way home. Shared by the error boundaries of the app's groups.
 */
export function ErrorPanel({ digest, retry, home = "/" }: { digest?: string | undefined; retry: () => void; home?: string }) {
  return (
    <main className="mx-auto flex min-h-[60dvh] max-w-xl flex-col justify-center gap-4 px-6" role="alert">
      <p className="text-xs font-semibold uppercase tracking-[0.2em] text-pencil">Error</p>
      <h1 className="text-3xl font-bold">This page could not be shown</h1>
      <p className="text-graphite">
        Something went wrong while it was being prepared. Nothing you entered was half-saved: a change is stored whole or not at all.
        {digest ? <> If it happens again, give the shop&apos;s admin this reference: <span className="numeric">{digest}</span>.</> : null}
      </p>
      <div className="flex flex-wrap items-center gap-4">
        <Button type="button" onClick={retry}>
          Try again
        </Button>
        <Link href={home} className="font-semibold text-accent underline">
          Back to your home page
        </Link>
      </div>
    </main>
  );
}
