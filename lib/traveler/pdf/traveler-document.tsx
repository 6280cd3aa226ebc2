import { Document, Page, StyleSheet, View } from "@react-pdf/renderer";
import type { PaperSize, TravelerData } from "@/lib/traveler/types";
import { BenchCode } from "./bench-code";
import { TEXT_FACE } from "./fonts";
import type { QrDrawing } from "./qr";
import { BlockCheck, Operation } from "./traveler-operations";
import { RevisionChanges } from "./traveler-changes";
import { BenchCautions, PlanNotes } from "./traveler-safety";
import { Facts, Footer, Header, SupersededWatermark } from "./traveler-header";
import { INK, MARGIN, PAPER } from "./traveler-style";

// The printed traveler of one metering block in one revision, put together from its sections: the header and
// the job's facts, the cautions beside the QR code that opens the bench page, the changes from the revision before, the plan's notes, the numbered
// operations, the block's own check, and the footer.

const PAGE_SIZE: Record<PaperSize, "LETTER" | "A4"> = { letter: "LETTER", a4: "A4" };

const s = StyleSheet.create({
  page: {
    fontFamily: TEXT_FACE,
    fontSize: 9,
    color: INK,
    backgroundColor: PAPER,
    paddingTop: MARGIN,
    paddingBottom: MARGIN + 18,
    paddingHorizontal: MARGIN,
    // No lineHeight here: inherited from the page, it kept absolutely placed text (the footer) from printing.
  },
  intro: { flexDirection: "row", marginBottom: 10 },
});

export interface TravelerDocumentProps {
  data: TravelerData;
  qr: QrDrawing;
  paper: PaperSize;
  /** ISO timestamp printed in the footer. */
  printedAt: string;
  /** The shop's time zone (SHOP_TIME_ZONE): dates print as the shop's calendar days. */
  timeZone: string;
}

export function TravelerDocument({ data, qr, paper, printedAt, timeZone }: TravelerDocumentProps) {
  const superseded = data.revision.status === "superseded";
  const title = `${data.job.number} ${data.block.side} block, revision ${data.revision.number}`;
  return (
    <Document title={`Traveler ${title}`} author="Blockwright" creator="Blockwright" producer="Blockwright" subject={title}>
      <Page size={PAGE_SIZE[paper]} style={s.page}>
        {/* First, so that everything (the QR code's white ground above all) is painted over it. */}
        {superseded ? <SupersededWatermark /> : null}
        <Header data={data} timeZone={timeZone} />
        <Facts data={data} />
        <View style={s.intro} wrap={false}>
          <BenchCautions />
          <BenchCode qr={qr} benchUrl={data.benchUrl} />
        </View>
        <RevisionChanges data={data} />
        <PlanNotes data={data} />
        {data.operations.map((op, i) => (
          <Operation key={op.number} op={op} lead={i === 0 ? "Operations, in order" : undefined} />
        ))}
        <BlockCheck side={data.block.side} />
        <Footer data={data} printedAt={printedAt} timeZone={timeZone} />
      </Page>
    </Document>
  );
}
