// The web app manifest points at icons that exist, at the sizes it claims: a phone refuses to install an app
// whose icon is missing or the wrong size.
import path from "node:path";
import { existsSync } from "node:fs";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import manifest from "@/app/manifest";

const publicDir = path.resolve(import.meta.dirname, "../../public");

describe("the web app manifest", () => {
  const m = manifest();

  it("opens standalone at the home page with a name", () => {
    expect(m.name).toBe("Blockwright");
    expect(m.start_url).toBe("/");
    expect(m.display).toBe("standalone");
  });

  it("lists a 192 and a 512 pixel PNG and a maskable icon, each as large as it says", async () => {
    const icons = m.icons ?? [];
    // Installability asks for at least a 192×192 and a 512×512 icon (common practice of the major browsers,
    // no published source).
    expect(icons.some((i) => i.sizes === "192x192" && i.type === "image/png")).toBe(true);
    expect(icons.some((i) => i.sizes === "512x512" && i.type === "image/png")).toBe(true);
    expect(icons.some((i) => i.purpose === "maskable")).toBe(true);
    for (const icon of icons) {
      const file = path.join(publicDir, icon.src);
      expect(existsSync(file), icon.src).toBe(true);
      if (icon.type !== "image/png") continue;
      const { width, height, format } = await sharp(file).metadata();
      expect(format).toBe("png");
      expect(`${width}x${height}`).toBe(icon.sizes);
    }
  });
});
