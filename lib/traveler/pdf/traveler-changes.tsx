import { StyleSheet, Text, View } from "@react-pdf/renderer";
import type { TravelerData } from "@/lib/traveler/types";
import { INK, shared } from "./traveler-style";

// What this revision changes from the one before, as accepted from the dyno: the machinist sees at a glance
// which holes differ from the blocks that came back ("secondary stage 1: 2 x #44 -> 3 x #44").

const s = StyleSheet.create({
  box: { marginBottom: 10, borderWidth: 1, borderColor: INK, padding: 6 },
  line: { fontSize: 9, lineHeight: 1.3, marginBottom: 2 },
});

export function RevisionChanges({ data }: { data: TravelerData }) {
  if (!data.changes) return null;
  return (
    <View style={s.box} wrap={false}>
      <Text style={shared.sectionTitle}>{`Changes from revision ${data.changes.fromRevision}`}</Text>
      {data.changes.lines.map((line, i) => (
        <Text key={i} style={s.line}>
          {`• ${line}`}
        </Text>
      ))}
    </View>
  );
}
