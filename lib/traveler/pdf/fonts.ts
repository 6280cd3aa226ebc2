import { readFileSync } from "node:fs";
import path from "node:path";
import { Font } from "@react-pdf/renderer";
import { woffToSfnt } from "./woff";

// The traveler's faces: Inter for words, DM Mono for figures (SIL OFL, shipped in fonts/). Registered once per
// process; @react-pdf/renderer then keeps each face loaded, so only the first render pays for reading them.
// Paths come from the working directory, which is the project root under `next start`, vitest and tsx alike.

export const TEXT_FACE = "Inter";
export const FIGURE_FACE = "DM Mono";

let registered = false;

export function registerTravelerFonts(): void {
  if (registered) return;
  const dir = path.join(/*turbopackIgnore: true*/ process.cwd(), "fonts");
  // Unpacked once here and handed over as data, so no render pays for decompressing the tables. Without the
  // glyph-substitution table: its contextual alternates and ligatures change nothing a traveler prints (every
  // character it uses has its own glyph), and shaping them took a third of each render.
  const face = (file: string) =>
    `data:font/ttf;base64,${woffToSfnt(readFileSync(path.join(dir, file)), { without: ["GSUB"] }).toString("base64")}`;
  Font.register({
    family: TEXT_FACE,
    // Two weights of words and two of figures: every face used is subset and embedded on each render.
    fonts: [400, 700].map((fontWeight) => ({ src: face(`Inter-${fontWeight}.woff`), fontWeight })),
  });
  Font.register({
    family: FIGURE_FACE,
    fonts: [400, 500].map((fontWeight) => ({ src: face(`DMMono-${fontWeight}.woff`), fontWeight })),
  });
  // Never hyphenate: "#4-40 UNC" or a drill label split over two lines is a misreading waiting to happen.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
