import localFont from "next/font/local";

// The same files feed the PDF traveler, so the screen and the paper share one type.
export const sans = localFont({
  src: [
    { path: "../fonts/Inter-400.woff", weight: "400" },
    { path: "../fonts/Inter-500.woff", weight: "500" },
    { path: "../fonts/Inter-600.woff", weight: "600" },
    { path: "../fonts/Inter-700.woff", weight: "700" },
  ],
  variable: "--font-sans",
  display: "swap",
});

export const mono = localFont({
  src: [
    { path: "../fonts/DMMono-400.woff", weight: "400" },
    { path: "../fonts/DMMono-500.woff", weight: "500" },
  ],
  variable: "--font-mono",
  display: "swap",
});
