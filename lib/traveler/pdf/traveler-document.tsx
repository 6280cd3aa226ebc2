import { Document, Page, Path, Rect, StyleSheet, Svg, Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import type { CautionTopic } from "@/lib/engineering/conversion-plan";
import { SAFETY_CAUTIONS, type SafetyCaution } from "@/lib/safety/cautions";
import { acceptance, displacement, isoDate, lengthBoth, measured, psi } from "@/lib/traveler/format";
import type { PaperSize, TravelerData, TravelerOperation } from "@/lib/traveler/types";
import { FIGURE_FACE, TEXT_FACE } from "./fonts";
import type { QrDrawing } from "./qr";

// The printed traveler of one metering block in one revision. Black on white only: it is read at the bench
// with oily hands and photocopied. Heavy rules between operations, figures in a monospace face, write-in boxes
// big enough for a carpenter's pencil, and a QR code that opens the bench page from arm's length.

const INK = "#000000";
const PAPER = "#ffffff";
/** Points per inch: PDF user space. */
const PT = 72;
const MARGIN = 0.5 * PT;
/** The QR drawing's side, quiet zone included: 2 in, so the symbol itself is about 1.6 in (40 mm). */
const QR_SIDE = 2 * PT;

const PAGE_SIZE: Record<PaperSize, "LETTER" | "A4"> = { letter: "LETTER", a4: "A4" };

/** What to read in every caution box, in this order on the first page. */
const BENCH_CAUTIONS: readonly CautionTopic[] = ["grinding", "drilling", "fuel", "pressurizedBowls"];

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
  // Header, repeated on every page.
  header: { borderBottomWidth: 3, borderBottomColor: INK, paddingBottom: 6, marginBottom: 10 },
  headerRow: { flexDirection: "row", alignItems: "stretch" },
  kicker: { fontSize: 7, fontWeight: 700, textTransform: "uppercase" },
  jobNumber: { fontFamily: FIGURE_FACE, fontWeight: 500, fontSize: 26, lineHeight: 1.05 },
  customer: { fontSize: 11, fontWeight: 700, marginTop: 2 },
  sideCell: { justifyContent: "flex-end", paddingHorizontal: 12, borderLeftWidth: 1.5, borderLeftColor: INK, marginLeft: 12 },
  side: { fontSize: 18, fontWeight: 700, textTransform: "uppercase", lineHeight: 1.05 },
  revisionBox: { backgroundColor: INK, paddingHorizontal: 12, paddingVertical: 6, justifyContent: "center", alignItems: "center", minWidth: 150 },
  revision: { color: PAPER, fontSize: 24, fontWeight: 700, lineHeight: 1.05 },
  revisionStatus: { color: PAPER, fontSize: 8, fontWeight: 700, textTransform: "uppercase", marginTop: 2 },
  metaRow: { marginTop: 6, fontSize: 8.5 },
  metaLabel: { fontWeight: 700 },
  banner: { marginTop: 6, borderWidth: 3, borderColor: INK, paddingVertical: 3, alignItems: "center" },
  bannerText: { fontSize: 15, fontWeight: 700 },
  watermark: {
    position: "absolute",
    top: "44%",
    left: -100,
    right: -100,
    textAlign: "center",
    fontSize: 44,
    fontWeight: 700,
    color: INK,
    opacity: 0.14,
    transform: "rotate(-32deg)",
  },
  footer: {
    position: "absolute",
    bottom: MARGIN - 6,
    left: MARGIN,
    right: MARGIN,
    flexDirection: "row",
    justifyContent: "space-between",
    borderTopWidth: 1,
    borderTopColor: INK,
    paddingTop: 4,
    fontSize: 8,
  },
  footerText: { flex: 1, paddingRight: 12 },
  pageNumber: { fontSize: 10, fontWeight: 700, width: 90, textAlign: "right" },
  // First page: the job and the code.
  facts: { flexDirection: "row", flexWrap: "wrap", borderTopWidth: 1, borderLeftWidth: 1, borderColor: INK, marginBottom: 8 },
  fact: { borderRightWidth: 1, borderBottomWidth: 1, borderColor: INK, paddingHorizontal: 5, paddingVertical: 2.5 },
  factLabel: { fontSize: 7, fontWeight: 700, textTransform: "uppercase" },
  factValue: { fontSize: 9 },
  factFigure: { fontFamily: FIGURE_FACE, fontSize: 9 },
  intro: { flexDirection: "row", marginBottom: 10 },
  planNotes: { marginBottom: 10 },
  planNote: { fontSize: 8, lineHeight: 1.3, marginBottom: 2 },
  planNoteLevel: { fontWeight: 700 },
  sectionTitle: { fontSize: 8, fontWeight: 700, textTransform: "uppercase", borderBottomWidth: 1.5, borderBottomColor: INK, paddingBottom: 2, marginBottom: 4 },
  figure: { fontFamily: FIGURE_FACE },
  opsTitle: { fontSize: 8, fontWeight: 700, textTransform: "uppercase", marginBottom: 3 },
  qrCell: { width: QR_SIDE + 8, alignItems: "center" },
  qrFrame: { borderWidth: 1.5, borderColor: INK, padding: 3 },
  qrCaption: { fontSize: 8, fontWeight: 700, textAlign: "center", marginTop: 3, width: QR_SIDE + 8 },
  qrUrl: { fontFamily: FIGURE_FACE, fontSize: 5, textAlign: "center", width: QR_SIDE + 8, marginTop: 1 },
  // Safety.
  safety: { flex: 1, marginRight: 12 },
  cautionRow: { flexDirection: "row", alignItems: "stretch", borderWidth: 1, borderColor: INK, marginBottom: 3, flexGrow: 1 },
  signalBox: { backgroundColor: INK, width: 78, flexDirection: "row", alignItems: "center", justifyContent: "center", paddingVertical: 3, paddingHorizontal: 4 },
  signalWord: { color: PAPER, fontSize: 9.5, fontWeight: 700 },
  cautionText: { flex: 1, paddingHorizontal: 5, paddingVertical: 2.5, fontSize: 7.5, lineHeight: 1.25 },
  cautionTitle: { fontWeight: 700 },
  // Operations.
  op: { borderTopWidth: 3, borderTopColor: INK, paddingTop: 6, paddingBottom: 8 },
  opHead: { flexDirection: "row", alignItems: "flex-start" },
  opRail: { width: 78, paddingRight: 10 },
  opNumber: { fontFamily: FIGURE_FACE, fontWeight: 500, fontSize: 26, lineHeight: 1, marginBottom: 6 },
  opBody: { flex: 1 },
  opTitle: { fontSize: 13, fontWeight: 700, marginBottom: 3 },
  instructions: { fontSize: 9.5, lineHeight: 1.3, marginBottom: 5 },
  callouts: { flexDirection: "row", flexWrap: "wrap", borderTopWidth: 1, borderLeftWidth: 1, borderColor: INK, marginBottom: 5 },
  callout: { width: "25%", borderRightWidth: 1, borderBottomWidth: 1, borderColor: INK, paddingHorizontal: 5, paddingVertical: 3 },
  calloutLabel: { fontSize: 7, fontWeight: 700, textTransform: "uppercase" },
  calloutValue: { fontFamily: FIGURE_FACE, fontWeight: 500, fontSize: 12, lineHeight: 1.15 },
  calloutText: { fontSize: 9.5, fontWeight: 700, lineHeight: 1.2 },
  calloutDetail: { fontFamily: FIGURE_FACE, fontSize: 7.5 },
  calloutNote: { fontSize: 7.5, fontWeight: 400 },
  passes: { flexDirection: "row", flexWrap: "wrap", marginBottom: 5 },
  // Seven to a row on Letter and A4 alike; a longer grind wraps to the next row.
  pass: { width: "13.2%", borderWidth: 1, borderColor: INK, marginRight: "1%", marginBottom: 3, padding: 3, alignItems: "center" },
  passLabel: { fontSize: 7, fontWeight: 700, textTransform: "uppercase" },
  passDepth: { fontFamily: FIGURE_FACE, fontSize: 8 },
  passCheck: { flexDirection: "row", alignItems: "center", marginTop: 2, fontSize: 7 },
  tickBox: { width: 11, height: 11, borderWidth: 1.2, borderColor: INK, marginRight: 3 },
  table: { borderTopWidth: 1.5, borderColor: INK, marginBottom: 6 },
  tableHead: { flexDirection: "row", borderBottomWidth: 1, borderColor: INK, paddingVertical: 2 },
  th: { fontSize: 7, fontWeight: 700, textTransform: "uppercase" },
  tr: { flexDirection: "row", alignItems: "center", borderBottomWidth: 1, borderColor: INK, paddingVertical: 3 },
  colLabel: { flex: 1.15, paddingRight: 4 },
  colPlan: { flex: 1, paddingRight: 4 },
  colAccept: { flex: 1.35, paddingRight: 4 },
  colMeasured: { width: 132 },
  colOk: { width: 40, alignItems: "center" },
  writeIn: { flexDirection: "row", alignItems: "flex-end", borderWidth: 1.5, borderColor: INK, height: 28, width: 128, paddingRight: 4, paddingBottom: 3, justifyContent: "flex-end" },
  writeInUnit: { fontFamily: FIGURE_FACE, fontSize: 8 },
  okBox: { width: 20, height: 20, borderWidth: 1.5, borderColor: INK },
  signOff: {},
  signOffLabel: { fontSize: 7, fontWeight: 700, textTransform: "uppercase", marginBottom: 1 },
  signOffBox: { borderWidth: 1.5, borderColor: INK, height: 26, width: 68, marginBottom: 4 },
  end: { borderTopWidth: 3, borderTopColor: INK, paddingTop: 6, flexDirection: "row", alignItems: "flex-end" },
  endText: { flex: 1, fontSize: 8.5, paddingRight: 12 },
  endSignOff: { flexDirection: "row", alignItems: "flex-end" },
});

// The safety alert symbol of ANSI Z535 (a triangle with an exclamation mark), white on the black box: one path,
// the mark cut out of the triangle by the even-odd rule.
const ALERT_SYMBOL = "M12 1.5L23 22H1Z M10.6 8H13.4V16H10.6Z M10.6 17.6H13.4V20.4H10.6Z";

function SafetyAlertSymbol({ size }: { size: number }) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" style={{ marginRight: 3 }}>
      <Path d={ALERT_SYMBOL} fill={PAPER} fillRule="evenodd" />
    </Svg>
  );
}

function SignalBox({ caution }: { caution: SafetyCaution }) {
  return (
    <View style={s.signalBox}>
      {caution.signal === "NOTICE" ? null : <SafetyAlertSymbol size={11} />}
      <Text style={s.signalWord}>{caution.signal}</Text>
    </View>
  );
}

/** A caution in full (first page), or in brief beside an operation: its first sentence and where the rest is. */
function CautionRow({ caution, brief = false }: { caution: SafetyCaution; brief?: boolean }) {
  const firstSentence = /^.*?[.:](?=\s|$)/.exec(caution.text)?.[0] ?? caution.text;
  return (
    <View style={s.cautionRow} wrap={false}>
      <SignalBox caution={caution} />
      <Text style={s.cautionText}>
        <Text style={s.cautionTitle}>{caution.title}. </Text>
        {brief ? `${firstSentence} The whole caution is under Safety on page 1.` : caution.text}
      </Text>
    </View>
  );
}

function Header({ data }: { data: TravelerData }) {
  const { job, block, revision } = data;
  const superseded = revision.status === "superseded";
  return (
    <View style={s.header} fixed>
      <View style={s.headerRow}>
        {/* Stacked lines of one paragraph each: this header is laid out again on every page. */}
        <Text style={{ flex: 1 }}>
          <Text style={s.kicker}>Blockwright traveler · job</Text>
          {"\n"}
          <Text style={s.jobNumber}>{job.number}</Text>
          {"\n"}
          <Text style={s.customer}>{job.customer}</Text>
        </Text>
        <View style={s.sideCell}>
          <Text>
            <Text style={s.kicker}>Metering block</Text>
            {"\n"}
            <Text style={s.side}>{block.side}</Text>
          </Text>
        </View>
        <View style={s.revisionBox}>
          <Text style={s.revision}>REVISION {revision.number}</Text>
          <Text style={s.revisionStatus}>{superseded ? "superseded" : revision.releasedAt ? "released" : "approved, not released"}</Text>
        </View>
      </View>
      <Text style={s.metaRow}>
        <Text style={s.metaLabel}>Released </Text>
        {revision.releasedAt ? `${isoDate(revision.releasedAt)} by ${revision.releasedBy ?? "—"}` : "not yet"}
        {"   ·   "}
        <Text style={s.metaLabel}>Approved </Text>
        {`${isoDate(revision.approvedAt)} by ${revision.approvedBy}`}
        {"   ·   "}
        <Text style={s.metaLabel}>Tuner </Text>
        {revision.tuner}
      </Text>
      {superseded ? (
        <View style={s.banner}>
          <Text style={s.bannerText}>SUPERSEDED — DO NOT USE</Text>
        </View>
      ) : revision.releasedAt === null ? (
        <View style={s.banner}>
          <Text style={s.bannerText}>NOT RELEASED — FOR REVIEW, NOT FOR THE BENCH</Text>
        </View>
      ) : null}
    </View>
  );
}

function Fact({ label, children, width, figure = false }: { label: string; children: ReactNode; width: string; figure?: boolean }) {
  return (
    <View style={[s.fact, { width }]}>
      <Text>
        <Text style={s.factLabel}>{label}</Text>
        {"\n"}
        <Text style={figure ? s.factFigure : s.factValue}>{children}</Text>
      </Text>
    </View>
  );
}

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

function Facts({ data }: { data: TravelerData }) {
  const { job, block } = data;
  return (
    <View style={s.facts} wrap={false}>
      <Fact label="Carburetor" width="50%">
        {job.carburetor}
      </Fact>
      <Fact label="Displacement" width="25%" figure>
        {displacement(job.displacementM3)}
      </Fact>
      <Fact label="Fuel" width="25%">
        {job.fuel}
      </Fact>
      <Fact label="Block" width="20%">
        {block.side === "primary" ? "Primary (front)" : "Secondary (rear)"}
      </Fact>
      <Fact label="Main jets" width="30%" figure>
        {`${block.mainJetCount} x ${lengthBoth(block.mainJetDiameterM)}`}
      </Fact>
      <Fact label="Peak boost" width="20%" figure>
        {psi(job.peakBoostPa)}
      </Fact>
      <Fact label="Operations" width="30%" figure>
        {data.operations.length ? data.operations.map((op) => op.number).join(" ") : "none"}
      </Fact>
    </View>
  );
}

/** What the plan says about itself that concerns this block, graded; nothing when the plan holds together. */
function PlanNotes({ data }: { data: TravelerData }) {
  if (data.planNotes.length === 0 && data.acknowledgedDangers === 0) return null;
  return (
    <View style={s.planNotes} wrap={false}>
      <Text style={s.sectionTitle}>Plan notes</Text>
      {data.acknowledgedDangers > 0 ? (
        <Text style={s.planNote}>
          {`Approved with ${data.acknowledgedDangers} danger warning${data.acknowledgedDangers > 1 ? "s" : ""} acknowledged by the approver: check the mixture on the dyno before full boost.`}
        </Text>
      ) : null}
      {data.planNotes.map((note, i) => (
        <Text key={i} style={s.planNote}>
          <Text style={s.planNoteLevel}>{`${note.level} · `}</Text>
          {note.message}
        </Text>
      ))}
    </View>
  );
}

/** The cautions of the bench work and the deferral to qualified practice, beside the code that opens the bench page. */
function SafetyAndCode({ data, qr }: { data: TravelerData; qr: QrDrawing }) {
  return (
    <View style={s.intro} wrap={false}>
      <View style={s.safety}>
        <Text style={s.sectionTitle}>Safety</Text>
        {BENCH_CAUTIONS.map((topic) => (
          <CautionRow key={topic} caution={SAFETY_CAUTIONS[topic]} />
        ))}
        <CautionRow caution={SAFETY_CAUTIONS.general} />
      </View>
      <View style={s.qrCell}>
        <QrCode qr={qr} />
        <Text style={s.qrCaption}>Scan at the bench to sign off steps and record measurements</Text>
        <Text style={s.qrUrl}>{urlLines(data.benchUrl)}</Text>
      </View>
    </View>
  );
}

function Callouts({ op }: { op: TravelerOperation }) {
  if (!op.callouts.length) return null;
  return (
    <View style={s.callouts}>
      {op.callouts.map((c) => {
        const wordy = c.value.length > 16;
        return (
          // One paragraph of three lines: each separate text costs the layout engine far more than a line.
          <View key={c.label} style={s.callout}>
            <Text>
              <Text style={s.calloutLabel}>{c.label}</Text>
              {"\n"}
              <Text style={wordy ? s.calloutText : s.calloutValue}>{c.value}</Text>
              {c.detail ? "\n" : null}
              {c.detail ? <Text style={wordy ? s.calloutNote : s.calloutDetail}>{c.detail}</Text> : null}
            </Text>
          </View>
        );
      })}
    </View>
  );
}

function GrindPasses({ op }: { op: TravelerOperation }) {
  if (!op.grindPasses.length) return null;
  return (
    <View style={s.passes}>
      {op.grindPasses.map((p) => (
        <View key={p.pass} style={s.pass} wrap={false}>
          <Text style={{ textAlign: "center" }}>
            <Text style={s.passLabel}>Pass {p.pass}</Text>
            {"\n"}
            <Text style={s.passDepth}>{measured("length", p.cumulativeDepthM).main}</Text>
          </Text>
          {p.clayCheck ? (
            <View style={s.passCheck}>
              <View style={s.tickBox} />
              <Text>clay</Text>
            </View>
          ) : (
            <Text style={[s.passCheck, { marginTop: 3 }]}>no check</Text>
          )}
        </View>
      ))}
    </View>
  );
}

function Measurements({ op }: { op: TravelerOperation }) {
  if (!op.measurements.length) return null;
  return (
    <View style={s.table}>
      <View style={s.tableHead}>
        <Text style={[s.th, s.colLabel]}>Measure</Text>
        <Text style={[s.th, s.colPlan]}>Planned</Text>
        <Text style={[s.th, s.colAccept]}>Accept</Text>
        <Text style={[s.th, s.colMeasured]}>Measured</Text>
        <Text style={[s.th, s.colOk, { textAlign: "center" }]}>OK</Text>
      </View>
      {op.measurements.map((m) => {
        const planned = measured(m.quantity, m.plannedSi);
        return (
          <View key={m.key} style={s.tr} wrap={false}>
            <Text style={[s.colLabel, { fontWeight: 700 }]}>{m.label}</Text>
            <Text style={[s.colPlan, s.figure]}>
              {planned.main}
              {"\n"}
              <Text style={{ fontSize: 7.5 }}>{planned.other}</Text>
            </Text>
            <Text style={[s.colAccept, s.figure]}>{acceptance(m.quantity, m.plannedSi, m.minSi, m.maxSi)}</Text>
            <View style={s.colMeasured}>
              <View style={s.writeIn}>
                <Text style={s.writeInUnit}>{m.quantity === "length" ? "in" : "psi"}</Text>
              </View>
            </View>
            <View style={s.colOk}>
              <View style={s.okBox} />
            </View>
          </View>
        );
      })}
    </View>
  );
}

/** The step's sign-off, under its number: who did it and when, in boxes big enough for a pencil. */
function SignOff() {
  return (
    <View style={s.signOff}>
      <Text style={s.signOffLabel}>Initials</Text>
      <View style={s.signOffBox} />
      <Text style={s.signOffLabel}>Date</Text>
      <View style={s.signOffBox} />
    </View>
  );
}

/** Rows an operation fills, roughly; an operation that could outgrow a page is allowed to break. */
function fitsOnePage(op: TravelerOperation): boolean {
  return op.measurements.length + Math.ceil(op.grindPasses.length / 7) + Math.ceil(op.callouts.length / 3) <= 16;
}

/** One operation; `lead` is a label printed above it that must not be left alone at the foot of a page. */
function Operation({ op, lead }: { op: TravelerOperation; lead?: string | undefined }) {
  const caution = op.caution ? SAFETY_CAUTIONS[op.caution] : null;
  return (
    <View wrap={!fitsOnePage(op)}>
      {lead ? <Text style={s.opsTitle}>{lead}</Text> : null}
      <View style={s.op}>
        <View style={s.opHead}>
          <View style={s.opRail}>
            <Text style={s.opNumber}>{op.number}</Text>
            <SignOff />
          </View>
          <View style={s.opBody}>
            <Text style={s.opTitle}>{op.title}</Text>
            <Text style={s.instructions}>{op.instructions}</Text>
            {caution ? <CautionRow caution={caution} brief /> : null}
            <View style={{ height: 4 }} />
            <Callouts op={op} />
            <GrindPasses op={op} />
            <Measurements op={op} />
          </View>
        </View>
      </View>
    </View>
  );
}

function Footer({ data, printedAt }: { data: TravelerData; printedAt: string }) {
  return (
    <View style={s.footer} fixed>
      <Text style={s.footerText}>
        {data.job.number} · {data.block.side} block · revision {data.revision.number} · printed {isoDate(printedAt)} · the code shows whether this is still the current revision
      </Text>
      <Text style={s.pageNumber} render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
    </View>
  );
}

export interface TravelerDocumentProps {
  data: TravelerData;
  qr: QrDrawing;
  paper: PaperSize;
  /** ISO timestamp printed in the footer. */
  printedAt: string;
}

export function TravelerDocument({ data, qr, paper, printedAt }: TravelerDocumentProps) {
  const superseded = data.revision.status === "superseded";
  const title = `${data.job.number} ${data.block.side} block, revision ${data.revision.number}`;
  return (
    <Document title={`Traveler ${title}`} author="Blockwright" creator="Blockwright" producer="Blockwright" subject={title}>
      <Page size={PAGE_SIZE[paper]} style={s.page}>
        {/* First, so that everything (the QR code's white ground above all) is painted over it. */}
        {superseded ? (
          <Text style={s.watermark} fixed>
            SUPERSEDED — DO NOT USE
          </Text>
        ) : null}
        <Header data={data} />
        <Facts data={data} />
        <SafetyAndCode data={data} qr={qr} />
        <PlanNotes data={data} />
        {data.operations.map((op, i) => (
          <Operation key={op.number} op={op} lead={i === 0 ? "Operations, in order" : undefined} />
        ))}
        <View style={s.end} wrap={false}>
          <Text style={s.endText}>
            End of the traveler for the {data.block.side} block. Every operation above is signed, and every measurement written in, before the
            block goes back on the carburetor.
          </Text>
          <View style={s.endSignOff}>
            <Text style={[s.signOffLabel, { marginRight: 4 }]}>Block checked by</Text>
            <View style={[s.signOffBox, { marginRight: 12 }]} />
            <Text style={[s.signOffLabel, { marginRight: 4 }]}>Date</Text>
            <View style={s.signOffBox} />
          </View>
        </View>
        <Footer data={data} printedAt={printedAt} />
      </Page>
    </Document>
  );
}
