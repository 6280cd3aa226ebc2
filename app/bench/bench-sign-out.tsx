"use client";

import { signOut } from "next-auth/react";

/** Sign-out for the bench's top bar: 44 px tall, light on the dark bar. */
export function BenchSignOut() {
  return (
    <button
      type="button"
      onClick={() => signOut({ callbackUrl: "/sign-in" })}
      className="min-h-11 shrink-0 rounded-[var(--radius-sheet)] border-2 border-white px-3 text-sm font-semibold text-white active:bg-white active:text-ink"
    >
      Sign out
    </button>
  );
}
