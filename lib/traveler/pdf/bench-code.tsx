import { Path, Rect, StyleSheet, Svg, Text, View } from "@react-pdf/renderer";
import { FIGURE_FACE } from "./fonts";
import type { QrDrawing } from "./qr";
import { INK, PAPER, QR_SIDE } from "./traveler-style";

// The QR code that opens the block's bench page from arm's length, with its caption and the URL spelled out.

const s = StyleSheet.create({
  qrCell: { width: QR_SIDE + 8, alignItems: "center" },
  qrFrame: { borderWidth: 1.5, borderColor: INK, padding: 3 },
  qrCaption: { fontSize: 8, fontWeight: 700, textAlign: "center", marginTop: 3, width: QR_SIDE + 8 },
  qrUrl: { fontFamily: FIGURE_FACE, fontSize: 5, textAlign: "center", width: QR_SIDE + 8, marginTop: 1 },
});

function QrCode({ qr }: { qr: QrDrawing }) {
  return (
    <View style={s.qrFrame}>
      <Svg width={QR_SIDE} height={QR_SIDE} viewBox={`0 0 ${qr.size} ${qr.size}`}>
        <Rect x={0} y={0} width={qr.size} height={qr.size} fill={PAPER} />
        <Path d={qr.path} fill={INK} />
      </Svg>
    </View>
  );
}

/** The URL in lines that fit under the code (a URL has no spaces to wrap at): origin, then path and query. */
function urlLines(url: string): string {
  return url.replace(/(\/bench\/|\?)/g, "\n$1");
}

export function BenchCode({ qr, benchUrl }: { qr: QrDrawing; benchUrl: string }) {
  return (
    <View style={s.qrCell}>
      <QrCode qr={qr} />
      <Text style={s.qrCaption}>Scan at the bench to sign off steps and record measurements</Text>
      <Text style={s.qrUrl}>{urlLines(benchUrl)}</Text>
    </View>
  );
}
