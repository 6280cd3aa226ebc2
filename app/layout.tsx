import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { mono, sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Blockwright", template: "%s · Blockwright" },
  description: "Metering-block conversions for boosted carbureted engines: plans, travelers and bench records.",
  // Opened from a phone's home screen, the app runs full-screen under its own name (the manifest is app/manifest.ts).
  appleWebApp: { capable: true, title: "Blockwright", statusBarStyle: "default" },
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#f5f3ec" };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request: its scripts carry the nonce proxy.ts put in this request's CSP.
  await connection();
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="antialiased">{children}</body>
    </html>
  );
}
