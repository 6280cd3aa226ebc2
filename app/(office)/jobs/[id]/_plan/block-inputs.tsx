import "server-only";
import type { BlockRow } from "@/db/jobs";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { circleArea } from "@/lib/engineering/orifice";
import { Fact, Facts } from "./facts";
import { area, length } from "./format";

/** What was measured on one block: jets, channel, vacuum passage, clay and grind, pickup tube. */
export function BlockInputs({ block, unit }: { block: BlockRow; unit: DisplayLengthUnit }) {
  const jets = block.mainJetCount * circleArea(block.mainJetDiameterM);
  const runs = block.tubeRunsM ?? [];
  const lengths: [string, number | null][] = [
    ["Channel length", block.channelLengthM],
    ["Least web", block.minWebM],
    ["Vacuum passage", block.passageDiameterM],
    ["Passage wall", block.passageWallM],
    ["Depth available", block.passageDepthM],
    ["Valve protrusion", block.valveProtrusionM],
    ["Clay gap", block.measuredGapM],
    ["Boss wall", block.bossWallM],
    ["Running clearance", block.runningClearanceM],
    ...runs.map((r, i): [string, number] => [`Tube run ${i + 1}`, r]),
    ["Bend radius", block.tubeBendRadiusM],
    ["Swage", block.tubeSwageM],
  ];
  const measured = lengths.filter((entry): entry is [string, number] => entry[1] !== null);
  const missing = lengths.filter(([, v]) => v === null).map(([label]) => label.toLowerCase());
  return (
    <div className="flex flex-col gap-2">
      <Facts label={`${block.side} block measurements`}>
        <Fact label="Main jets">
          {block.mainJetCount} × {length(block.mainJetDiameterM, unit)}
        </Fact>
        <Fact label="Main-jet area">{area(jets, unit)}</Fact>
        {measured.map(([label, m]) => (
          <Fact key={label} label={label}>
            {length(m, unit)}
          </Fact>
        ))}
        {block.tubeBendDeg !== null && (runs.length > 0 || block.tubeBendRadiusM !== null) ? <Fact label="Tube bend">{block.tubeBendDeg}°</Fact> : null}
      </Facts>
      {missing.length ? <p className="text-xs text-pencil">Not measured: {missing.join(", ")}.</p> : null}
    </div>
  );
}
