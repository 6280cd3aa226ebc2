import type { Metadata, Viewport } from "next";
import { getSessionUserOrDatabaseDown } from "@/lib/auth/session";
import { DatabaseDownPanel } from "@/components/ui/database-down-panel";

export const metadata: Metadata = { title: "Bench" };

// White, not paper: the bench pages are read under strong shop light, often at arm's length.
export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1c1f23" };

/**
 * The phone-first pages a traveler's QR code opens: no office header, one column, big targets. The session is
 * looked up here first (the page checks the role itself) so that a database that is not answering is told as such.
 */
export default async function BenchLayout({ children }: { children: React.ReactNode }) {
  const databaseDown = (await getSessionUserOrDatabaseDown()) === "database-down";
  return <div className="min-h-dvh bg-white text-base text-ink">{databaseDown ? <DatabaseDownPanel /> : children}</div>;
}
