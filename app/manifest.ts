import type { MetadataRoute } from "next";

/**
 * The web app manifest (served at /manifest.webmanifest): lets a phone put Blockwright on its home screen and
 * open it full-screen at the work queue, which is where the day starts, at the bench or in the office.
 */
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Blockwright",
    short_name: "Blockwright",
    description: "Metering-block conversions for boosted carbureted engines: plans, travelers and bench records.",
    id: "/",
    start_url: "/",
    scope: "/",
    display: "standalone",
    orientation: "any",
    background_color: "#f5f3ec",
    theme_color: "#f5f3ec",
    categories: ["productivity", "business"],
    icons: [
      { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
      { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
      { src: "/icons/icon-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
      { src: "/icons/icon.svg", sizes: "any", type: "image/svg+xml", purpose: "any" },
    ],
  };
}
