import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import { formatDate } from "@/lib/format/dates";
import { displacement, lengthBoth, psi } from "@/lib/traveler/format";
import type { TravelerData } from "@/lib/traveler/types";
import { FIGURE_FACE } from "./fonts";
import { INK, MARGIN, PAPER } from "./traveler-style";

// The traveler's page furniture (the header and footer repeated on every page, the watermark of a superseded
// revision) and the job's facts at the top of the first page.

const s = StyleSheet.create({
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
  facts: { flexDirection: "row", flexWrap: "wrap", borderTopWidth: 1, borderLeftWidth: 1, borderColor: INK, marginBottom: 8 },
  fact: { borderRightWidth: 1, borderBottomWidth: 1, borderColor: INK, paddingHorizontal: 5, paddingVertical: 2.5 },
  factLabel: { fontSize: 7, fontWeight: 700, textTransform: "uppercase" },
  factValue: { fontSize: 9 },
  factFigure: { fontFamily: FIGURE_FACE, fontSize: 9 },
});

/** Across every page of a superseded revision; placed first, so that everything else is painted over it. */
export function SupersededWatermark() {
  return (
    <Text style={s.watermark} fixed>
      SUPERSEDED — DO NOT USE
    </Text>
  );
}

/** `timeZone` is the shop's: the dates printed are the shop's calendar days. */
export function Header({ data, timeZone }: { data: TravelerData; timeZone: string }) {
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
        {revision.releasedAt ? `${formatDate(revision.releasedAt, timeZone)} by ${revision.releasedBy ?? "—"}` : "not yet"}
        {"   ·   "}
        <Text style={s.metaLabel}>Approved </Text>
        {`${formatDate(revision.approvedAt, timeZone)} by ${revision.approvedBy}`}
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

export function Facts({ data }: { data: TravelerData }) {
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

export function Footer({ data, printedAt, timeZone }: { data: TravelerData; printedAt: string; timeZone: string }) {
  return (
    <View style={s.footer} fixed>
      <Text style={s.footerText}>
        {data.job.number} · {data.block.side} block · revision {data.revision.number} · printed {formatDate(printedAt, timeZone)} · the code shows whether this is still the current revision
      </Text>
      <Text style={s.pageNumber} render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
    </View>
  );
}
