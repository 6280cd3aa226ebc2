import { StyleSheet, Text, View } from "@react-pdf/renderer";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { acceptance, measured } from "@/lib/traveler/format";
import type { TravelerOperation } from "@/lib/traveler/types";
import { FIGURE_FACE } from "./fonts";
import { CautionRow } from "./traveler-safety";
import { INK, shared } from "./traveler-style";

// The numbered operations, one under another with heavy rules between them: figures in a monospace face,
// grind passes to tick, measurements to write in, and a sign-off under each number; then the block's own check.

const s = StyleSheet.create({
  opsTitle: { fontSize: 8, fontWeight: 700, textTransform: "uppercase", marginBottom: 3 },
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
  end: { borderTopWidth: 3, borderTopColor: INK, paddingTop: 6, flexDirection: "row", alignItems: "flex-end" },
  endText: { flex: 1, fontSize: 8.5, paddingRight: 12 },
  endSignOff: { flexDirection: "row", alignItems: "flex-end" },
});

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
            <Text style={[s.colPlan, shared.figure]}>
              {planned.main}
              {"\n"}
              <Text style={{ fontSize: 7.5 }}>{planned.other}</Text>
            </Text>
            <Text style={[s.colAccept, shared.figure]}>{acceptance(m.quantity, m.plannedSi, m.minSi, m.maxSi)}</Text>
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
      <Text style={shared.signOffLabel}>Initials</Text>
      <View style={shared.signOffBox} />
      <Text style={shared.signOffLabel}>Date</Text>
      <View style={shared.signOffBox} />
    </View>
  );
}

/** Rows an operation fills, roughly; an operation that could outgrow a page is allowed to break. */
function fitsOnePage(op: TravelerOperation): boolean {
  return op.measurements.length + Math.ceil(op.grindPasses.length / 7) + Math.ceil(op.callouts.length / 3) <= 16;
}

/** One operation; `lead` is a label printed above it that must not be left alone at the foot of a page. */
export function Operation({ op, lead }: { op: TravelerOperation; lead?: string | undefined }) {
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

/** After the last operation: the whole block checked and signed before it goes back on the carburetor. */
export function BlockCheck({ side }: { side: string }) {
  return (
    <View style={s.end} wrap={false}>
      <Text style={s.endText}>
        End of the traveler for the {side} block. Every operation above is signed, and every measurement written in, before the block goes back on
        the carburetor.
      </Text>
      <View style={s.endSignOff}>
        <Text style={[shared.signOffLabel, { marginRight: 4 }]}>Block checked by</Text>
        <View style={[shared.signOffBox, { marginRight: 12 }]} />
        <Text style={[shared.signOffLabel, { marginRight: 4 }]}>Date</Text>
        <View style={shared.signOffBox} />
      </View>
    </View>
  );
}
