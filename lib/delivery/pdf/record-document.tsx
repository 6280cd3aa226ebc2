import { Document, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import { formatDateTime } from "@/lib/format/dates";
import { ALL_CAUTIONS } from "@/lib/safety/cautions";
import { FIGURE_FACE, TEXT_FACE } from "@/lib/traveler/pdf/fonts";
import { CautionRow } from "@/lib/traveler/pdf/traveler-safety";
import { INK, MARGIN, PAPER, shared } from "@/lib/traveler/pdf/traveler-style";
import type { ConversionRecordData, RecordBlock } from "../types";

// The customer's record of a conversion: what went into each metering block and how it measured, the mixture
// the plan holds to, the cautions, and how to reach the shop. Black on white, like the travelers.

const s = StyleSheet.create({
  page: { fontFamily: TEXT_FACE, fontSize: 9, color: INK, backgroundColor: PAPER, padding: MARGIN, paddingBottom: MARGIN + 18 },
  header: { flexDirection: "row", justifyContent: "space-between", alignItems: "flex-end", borderBottomWidth: 3, borderBottomColor: INK, paddingBottom: 6, marginBottom: 10 },
  kicker: { fontSize: 8, fontWeight: 700, textTransform: "uppercase" },
  title: { fontSize: 18, fontWeight: 700 },
  number: { fontFamily: FIGURE_FACE, fontSize: 14 },
  section: { marginBottom: 10 },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: INK, paddingVertical: 2.5 },
  label: { width: "42%", fontWeight: 700 },
  value: { flex: 1 },
  figure: { fontFamily: FIGURE_FACE },
  blockTitle: { fontSize: 11, fontWeight: 700, marginBottom: 4 },
  headRow: { flexDirection: "row", borderBottomWidth: 1.5, borderBottomColor: INK, paddingBottom: 2, fontSize: 7.5, fontWeight: 700, textTransform: "uppercase" },
  cell: { flex: 1, paddingRight: 4 },
  wide: { flex: 1.5, paddingRight: 4 },
  opens: { flex: 1.3, paddingRight: 4 },
  footer: { position: "absolute", bottom: MARGIN - 6, left: MARGIN, right: MARGIN, fontSize: 7.5, flexDirection: "row", justifyContent: "space-between" },
});

function Facts({ rows }: { rows: { label: string; value: string; figure?: boolean }[] }) {
  return (
    <View>
      {rows.map((row) => (
        <View key={row.label} style={s.row}>
          <Text style={s.label}>{row.label}</Text>
          <Text style={row.figure ? [s.value, s.figure] : s.value}>{row.value}</Text>
        </View>
      ))}
    </View>
  );
}

function BlockSection({ block }: { block: RecordBlock }) {
  return (
    <View style={s.section} wrap={false}>
      <Text style={s.blockTitle}>{block.side === "primary" ? "Primary" : "Secondary"} metering block</Text>
      <Text style={shared.sectionTitle}>Power valves and opening points</Text>
      <View style={s.headRow}>
        <Text style={s.cell}>Valve</Text>
        <Text style={s.opens}>Opens</Text>
        <Text style={s.wide}>Enrichment planned</Text>
        <Text style={s.cell}>Opening as set</Text>
      </View>
      {block.valves.map((v, i) => (
        <View key={i} style={s.row}>
          <Text style={s.cell}>{v.valve}</Text>
          <Text style={[s.opens, s.figure]}>{v.opens}</Text>
          <Text style={s.wide}>{v.target}</Text>
          <Text style={[s.cell, s.figure]}>{v.measured ?? "-"}</Text>
        </View>
      ))}
      <View style={{ marginTop: 6 }}>
        <Text style={shared.sectionTitle}>Channel restriction holes, as drilled and measured</Text>
        {block.restrictions.length === 0 ? <Text>No restriction holes in this block.</Text> : null}
        {block.restrictions.map((r) => (
          <View key={r.title} style={{ marginBottom: 4 }}>
            <Text>
              <Text style={{ fontWeight: 700 }}>{r.title}: </Text>
              <Text style={s.figure}>{r.drilled}</Text>
            </Text>
            {r.holes.map((h) => (
              <View key={h.label} style={s.row}>
                <Text style={s.label}>{h.label}</Text>
                <Text style={[s.value, s.figure]}>
                  {h.value}
                  {h.withinPlan === false ? " (outside the planned band)" : ""}
                </Text>
              </View>
            ))}
          </View>
        ))}
      </View>
    </View>
  );
}

export function ConversionRecordDocument({ data, timeZone, printedAt }: { data: ConversionRecordData; timeZone: string; printedAt: string }) {
  const { job, delivery } = data;
  return (
    <Document title={`${job.number} conversion record`} author={data.shop.name} creator="Blockwright" producer="Blockwright">
      <Page size="LETTER" style={s.page}>
        <View style={s.header}>
          <View>
            <Text style={s.kicker}>{data.shop.name}</Text>
            <Text style={s.title}>Conversion record</Text>
          </View>
          <Text style={s.number}>
            {job.number} · revision {job.revision}
          </Text>
        </View>
        <View style={s.section}>
          <Facts
            rows={[
              { label: "Customer", value: job.customer },
              { label: "Carburetor", value: job.carburetor },
              { label: "Engine", value: job.displacement, figure: true },
              { label: "Fuel", value: job.fuel },
              { label: "Peak boost planned", value: job.peakBoost, figure: true },
              ...(delivery
                ? [
                    { label: "Handed over", value: `${formatDateTime(delivery.deliveredAt, timeZone)} by ${delivery.handedOverBy}` },
                    { label: "Received by", value: delivery.handedTo },
                  ]
                : []),
            ]}
          />
        </View>
        <View style={s.section} wrap={false}>
          <Text style={shared.sectionTitle}>Mixture plan</Text>
          <Facts rows={data.mixture.map((m) => ({ ...m, figure: true }))} />
        </View>
        {data.blocks.map((block) => (
          <BlockSection key={block.side} block={block} />
        ))}
        <View style={s.section} wrap={false}>
          <Text style={shared.sectionTitle}>Safety</Text>
          {ALL_CAUTIONS.map((caution) => (
            <CautionRow key={caution.topic} caution={caution} />
          ))}
        </View>
        <View style={s.section} wrap={false}>
          <Text style={shared.sectionTitle}>Questions about this work</Text>
          <Text>
            {data.shop.name}: {data.shop.contact}. Quote {job.number} and revision {job.revision}; keep this record with the carburetor for its next
            visit.
          </Text>
        </View>
        <View style={s.footer} fixed>
          <Text>
            {job.number} · {data.shop.name} · printed {formatDateTime(printedAt, timeZone)}
          </Text>
          <Text render={({ pageNumber, totalPages }) => `page ${pageNumber} of ${totalPages}`} />
        </View>
      </Page>
    </Document>
  );
}
