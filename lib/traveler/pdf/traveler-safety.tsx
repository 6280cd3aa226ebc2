import { Path, StyleSheet, Svg, Text, View } from "@react-pdf/renderer";
import type { CautionTopic } from "@/lib/engineering/conversion-plan";
import { SAFETY_CAUTIONS, type SafetyCaution } from "@/lib/safety/cautions";
import type { TravelerData } from "@/lib/traveler/types";
import { INK, PAPER, shared } from "./traveler-style";

// What the traveler says about safety and about the plan itself: the cautions of the bench work on the first
// page (and in brief beside an operation), and the plan's graded notes for this block.

/** What to read in every caution box, in this order on the first page. */
const BENCH_CAUTIONS: readonly CautionTopic[] = ["grinding", "drilling", "fuel", "pressurizedBowls"];

const s = StyleSheet.create({
  planNotes: { marginBottom: 10 },
  planNote: { fontSize: 8, lineHeight: 1.3, marginBottom: 2 },
  planNoteLevel: { fontWeight: 700 },
  safety: { flex: 1, marginRight: 12 },
  cautionRow: { flexDirection: "row", alignItems: "stretch", borderWidth: 1, borderColor: INK, marginBottom: 3, flexGrow: 1 },
  signalBox: { backgroundColor: INK, width: 78, flexDirection: "row", alignItems: "center", justifyContent: "center", paddingVertical: 3, paddingHorizontal: 4 },
  signalWord: { color: PAPER, fontSize: 9.5, fontWeight: 700 },
  cautionText: { flex: 1, paddingHorizontal: 5, paddingVertical: 2.5, fontSize: 7.5, lineHeight: 1.25 },
  cautionTitle: { fontWeight: 700 },
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
export function CautionRow({ caution, brief = false }: { caution: SafetyCaution; brief?: boolean }) {
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

/** The cautions of the bench work and the deferral to qualified practice. */
export function BenchCautions() {
  return (
    <View style={s.safety}>
      <Text style={shared.sectionTitle}>Safety</Text>
      {BENCH_CAUTIONS.map((topic) => (
        <CautionRow key={topic} caution={SAFETY_CAUTIONS[topic]} />
      ))}
      <CautionRow caution={SAFETY_CAUTIONS.general} />
    </View>
  );
}

/** What the plan says about itself that concerns this block, graded; nothing when the plan holds together. */
export function PlanNotes({ data }: { data: TravelerData }) {
  if (data.planNotes.length === 0 && data.acknowledgedDangers === 0) return null;
  return (
    <View style={s.planNotes} wrap={false}>
      <Text style={shared.sectionTitle}>Plan notes</Text>
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
