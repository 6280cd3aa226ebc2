import { StyleSheet } from "@react-pdf/renderer";
import { FIGURE_FACE } from "./fonts";

// What every part of the printed traveler shares: black on white only (it is read at the bench with oily hands
// and photocopied), the page's measures, and the few styles more than one section prints with.

export const INK = "#000000";
export const PAPER = "#ffffff";
/** Points per inch: PDF user space. */
export const PT = 72;
export const MARGIN = 0.5 * PT;
/** The QR drawing's side, quiet zone included: 2 in, so the symbol itself is about 1.6 in (40 mm). */
export const QR_SIDE = 2 * PT;

export const shared = StyleSheet.create({
  sectionTitle: { fontSize: 8, fontWeight: 700, textTransform: "uppercase", borderBottomWidth: 1.5, borderBottomColor: INK, paddingBottom: 2, marginBottom: 4 },
  figure: { fontFamily: FIGURE_FACE },
  // Write-in boxes big enough for a carpenter's pencil.
  signOffLabel: { fontSize: 7, fontWeight: 700, textTransform: "uppercase", marginBottom: 1 },
  signOffBox: { borderWidth: 1.5, borderColor: INK, height: 26, width: 68, marginBottom: 4 },
});
