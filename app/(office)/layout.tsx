import Link from "next/link";
import { redirect } from "next/navigation";
import { getSessionUserOrDatabaseDown } from "@/lib/auth/session";
import { DatabaseDownPanel } from "@/components/ui/database-down-panel";
import { navigationFor } from "@/components/navigation";
import { SignOutButton } from "@/components/sign-out-button";
import { QueryProvider } from "@/components/query-provider";

export default async function OfficeLayout({ children }: { children: React.ReactNode }) {
  const user = await getSessionUserOrDatabaseDown();
  // Without the database nobody's role is known: no header or navigation, only why the page is not there.
  if (user === "database-down") return <DatabaseDownPanel />;
  if (!user) redirect("/sign-in");
  const links = navigationFor(user.role);
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="no-print border-b-2 border-ink bg-sheet">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-8 gap-y-2 px-6 py-3">
          <Link href="/" className="flex items-center gap-2 text-lg font-bold tracking-tight">
            <span aria-hidden className="inline-block h-5 w-5 rotate-45 border-[3px] border-accent" />
            Blockwright
          </Link>
          <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
            {links.map((link) => (
              <Link key={link.href} href={link.href} className="rounded-[var(--radius-sheet)] px-3 py-2 text-sm font-medium text-graphite hover:bg-accent-soft hover:text-accent-strong">
                {link.label}
              </Link>
            ))}
          </nav>
          <div className="flex items-center gap-3 text-sm">
            <span data-testid="signed-in-user">
              <span className="font-semibold">{user.name}</span>{" "}
              <span className="rounded-full border border-rule-strong px-2 py-0.5 text-2xs font-semibold uppercase tracking-wider text-graphite">
                {user.role}
              </span>
            </span>
            <SignOutButton />
          </div>
        </div>
      </header>
      <main className="mx-auto w-full max-w-7xl flex-1 px-6 py-8">
        <QueryProvider>{children}</QueryProvider>
      </main>
      <footer className="no-print border-t border-rule px-6 py-4 text-center text-xs text-pencil">
        Blockwright figures are planning aids: a qualified person checks them. Follow the manufacturer&apos;s instructions,
        local codes and licensed practice.
      </footer>
    </div>
  );
}
