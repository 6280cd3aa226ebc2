import { inflateSync } from "node:zlib";

/**
 * Unpacks a WOFF 1.0 font into the plain TrueType/OpenType file it wraps (W3C WOFF File Format 1.0, sections
 * 4-5): each table is zlib-compressed unless its compressed length equals its original length. Done once when
 * the fonts are registered: @react-pdf/renderer reads WOFF directly, but it then inflates the tables again on
 * every render, which dominated the traveler's render time.
 */
export function woffToSfnt(woff: Buffer, options: { without?: readonly string[] } = {}): Buffer {
  const without = new Set(options.without ?? []);
  if (woff.toString("latin1", 0, 4) !== "wOFF") throw new Error("not a WOFF 1.0 font");
  const flavor = woff.readUInt32BE(4);
  const count = woff.readUInt16BE(12);
  const tables: { tag: number; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < count; i++) {
    const entry = 44 + i * 20;
    const tag = woff.readUInt32BE(entry);
    if (without.has(woff.toString("latin1", entry, entry + 4))) continue;
    const offset = woff.readUInt32BE(entry + 4);
    const compLength = woff.readUInt32BE(entry + 8);
    const origLength = woff.readUInt32BE(entry + 12);
    const checksum = woff.readUInt32BE(entry + 16);
    const stored = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(stored) : Buffer.from(stored);
    if (data.length !== origLength) throw new Error("WOFF table length does not match its header");
    tables.push({ tag, checksum, data });
  }
  const numTables = tables.length;
  // sfnt offset table: binary-search fields from the largest power of two not above numTables.
  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  const headerLength = 12 + 16 * numTables;
  const padded = (n: number) => (n + 3) & ~3;
  const total = tables.reduce((sum, t) => sum + padded(t.data.length), headerLength);
  const out = Buffer.alloc(total);
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange, 10);
  let offset = headerLength;
  tables.forEach((t, i) => {
    const record = 12 + i * 16;
    out.writeUInt32BE(t.tag, record);
    out.writeUInt32BE(t.checksum, record + 4);
    out.writeUInt32BE(offset, record + 8);
    out.writeUInt32BE(t.data.length, record + 12);
    t.data.copy(out, offset);
    offset += padded(t.data.length);
  });
  return out;
}
