import { readFileSync } from "node:fs";
import path from "node:path";
import * as fontkit from "fontkit";
import { describe, expect, it } from "vitest";
import { woffToSfnt } from "@/lib/traveler/pdf/woff";

// The unpacked font is checked against fontkit reading the WOFF itself: an independent WOFF decoder.
const FONTS = ["Inter-400.woff", "Inter-700.woff", "DMMono-400.woff", "DMMono-500.woff"];
const SAMPLE = "BW-0042 REVISION 1 #43 0.0890 in · 2.261 mm ± 0.5 psi — 350 in³ °";

type Face = { numGlyphs: number; unitsPerEm: number; glyphForCodePoint(cp: number): { id: number; advanceWidth: number } };

function open(buffer: Buffer): Face {
  return fontkit.create(buffer) as unknown as Face;
}

describe("woffToSfnt", () => {
  for (const file of FONTS) {
    it(`unpacks ${file} to a TrueType file with the same glyphs and metrics`, () => {
      const woff = readFileSync(path.join(process.cwd(), "fonts", file));
      const sfnt = woffToSfnt(woff);
      // TrueType outlines: sfnt version 0x00010000 (OpenType spec, "Organization of an OpenType font").
      expect(sfnt.readUInt32BE(0)).toBe(0x00010000);
      const fromWoff = open(woff);
      const fromSfnt = open(sfnt);
      expect(fromSfnt.numGlyphs).toBe(fromWoff.numGlyphs);
      expect(fromSfnt.unitsPerEm).toBe(fromWoff.unitsPerEm);
      for (const char of SAMPLE) {
        const cp = char.codePointAt(0)!;
        const a = fromWoff.glyphForCodePoint(cp);
        const b = fromSfnt.glyphForCodePoint(cp);
        expect(b.id, char).toBe(a.id);
        expect(b.id, `${char} has a glyph`).toBeGreaterThan(0);
        expect(b.advanceWidth, char).toBe(a.advanceWidth);
      }
    });
  }

  it("leaves out the tables asked for, and keeps the directory's binary-search fields right", () => {
    const woff = readFileSync(path.join(process.cwd(), "fonts", "Inter-400.woff"));
    const sfnt = woffToSfnt(woff, { without: ["GSUB"] });
    const numTables = sfnt.readUInt16BE(4);
    const tags = Array.from({ length: numTables }, (_, i) => sfnt.toString("latin1", 12 + i * 16, 16 + i * 16));
    expect(tags).not.toContain("GSUB");
    expect(tags).toContain("cmap");
    expect(tags).toContain("GPOS");
    // searchRange = 16 x (largest power of 2 <= numTables); entrySelector = log2 of that power; rangeShift = 16 x numTables - searchRange.
    const power = 2 ** Math.floor(Math.log2(numTables));
    expect(sfnt.readUInt16BE(6)).toBe(16 * power);
    expect(sfnt.readUInt16BE(8)).toBe(Math.log2(power));
    expect(sfnt.readUInt16BE(10)).toBe(16 * numTables - 16 * power);
    expect(open(sfnt).glyphForCodePoint("#".codePointAt(0)!).id).toBeGreaterThan(0);
  });

  it("refuses what is not WOFF 1.0", () => {
    expect(() => woffToSfnt(Buffer.from("wOF2 is a different format"))).toThrow(/WOFF/);
  });
});
