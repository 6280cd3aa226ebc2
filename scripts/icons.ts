// Draws the app's PNG icons from the SVG marks in public/icons (run again after changing a mark):
//   npx tsx scripts/icons.ts
import { readFile } from "node:fs/promises";
import path from "node:path";
import sharp from "sharp";

const root = path.resolve(import.meta.dirname, "..");
const icons = path.join(root, "public", "icons");

const outputs = [
  { from: "icon.svg", to: path.join(icons, "icon-192.png"), size: 192 },
  { from: "icon.svg", to: path.join(icons, "icon-512.png"), size: 512 },
  { from: "icon-maskable.svg", to: path.join(icons, "icon-maskable-512.png"), size: 512 },
  // Home-screen icon for phones that read apple-touch-icon (Next serves app/apple-icon.png as it).
  { from: "icon-maskable.svg", to: path.join(root, "app", "apple-icon.png"), size: 180 },
];

for (const { from, to, size } of outputs) {
  const svg = await readFile(path.join(icons, from));
  await sharp(svg, { density: 300 }).resize(size, size).png({ compressionLevel: 9 }).toFile(to);
  console.log(`${path.relative(root, to)} ${size}×${size}`);
}
