import type { Metadata, Viewport } from "next";

export const metadata: Metadata = { title: "Bench" };

// White, not paper: the bench pages are read under strong shop light, often at arm's length.
export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1c1f23" };

/** The phone-first pages a traveler's QR code opens: no office header, one column, big targets. */
export default function BenchLayout({ children }: { children: React.ReactNode }) {
  return <div className="min-h-dvh bg-white text-base text-ink">{children}</div>;
}
