import QRCode from "qrcode";

/** Modules of quiet zone around the symbol, as ISO/IEC 18004 asks (4). */
export const QR_QUIET_ZONE = 4;

export interface QrDrawing {
  /** Side of the drawing in modules, quiet zone included. */
  size: number;
  /** One SVG path of every dark module, in module units. */
  path: string;
}

/**
 * The QR code of `text` as a vector drawing: crisp on paper at any printer resolution, and cheaper to make than
 * a PNG. Error correction level Q (about 25 % of the symbol may be lost) because travelers get oily and creased.
 */
export function qrDrawing(text: string): QrDrawing {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: "Q" });
  const n = modules.size;
  const parts: string[] = [];
  for (let row = 0; row < n; row++) {
    let col = 0;
    while (col < n) {
      if (!modules.get(row, col)) {
        col++;
        continue;
      }
      const start = col;
      while (col < n && modules.get(row, col)) col++;
      // One rectangle per run of dark modules in a row.
      parts.push(`M${start + QR_QUIET_ZONE} ${row + QR_QUIET_ZONE}h${col - start}v1h-${col - start}z`);
    }
  }
  return { size: n + 2 * QR_QUIET_ZONE, path: parts.join("") };
}
