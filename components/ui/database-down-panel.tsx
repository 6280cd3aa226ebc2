"use client";

import { Button } from "./button";

/**
 * What a page shows while the shop's database is not answering (restarting, or the server is down): not a fault
 * of the page, nothing was lost, and the same page works again once the database is back. The layouts detect it on
 * the server, where the cause is known; an error boundary in production only sees a hidden message.
 */
export function DatabaseDownPanel() {
  return (
    <main className="mx-auto flex min-h-[60dvh] max-w-xl flex-col justify-center gap-4 px-6" role="alert" data-testid="database-down">
      <p className="text-xs font-semibold uppercase tracking-[0.2em] text-pencil">Unavailable</p>
      <h1 className="text-3xl font-bold">The shop&apos;s database is not answering</h1>
      <p className="text-graphite">
        It may be restarting. Nothing you saved is lost, and nothing was half-saved: a change is stored whole or not at all. Try again in
        a few seconds; if it stays down, tell the shop&apos;s admin.
      </p>
      <div>
        <Button type="button" onClick={() => window.location.reload()}>
          Try again
        </Button>
      </div>
    </main>
  );
}
