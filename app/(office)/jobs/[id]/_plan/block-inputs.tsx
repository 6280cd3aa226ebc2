import "server-only";
import type { BlockRow } from "@/db/jobs";
import type { DisplayLengthUnit } from "@/lib/display";
import { circleArea } from "@/lib/engineering/orifice";
import { Fact, Facts } from "./facts";
import { area, length } from "./format";

/** What was measured on one block: jets, channel, vacuum passage, clay and grind, pickup tube. */
export function BlockInputs({ block, unit }: { block: BlockRow; unit: DisplayLengthUnit }) {
  const jets = block.mainJetCount * circleArea(block.mainJetDiameterM);
  const maybe = (m: number | null) => (m === null ? "not measured" : length(m, unit));
  const runs = block.tubeRunsM ?? [];
  const hasTube = block.tubeBendRadiusM !== null || runs.length > 0;
  return (
    <Facts label={`${block.side} block measurements`}>
      <Fact label="Main jets">
        {block.mainJetCount} × {length(block.mainJetDiameterM, unit)}
      </Fact>
      <Fact label="Main-jet area">{area(jets, unit)}</Fact>
      <Fact label="Channel length">{maybe(block.channelLengthM)}</Fact>
      <Fact label="Least web">{maybe(block.minWebM)}</Fact>
      <Fact label="Vacuum passage">{maybe(block.passageDiameterM)}</Fact>
      <Fact label="Wall · depth">
        {maybe(block.passageWallM)} · {maybe(block.passageDepthM)}
      </Fact>
      <Fact label="Valve protrusion">{maybe(block.valveProtrusionM)}</Fact>
      <Fact label="Clay gap">{maybe(block.measuredGapM)}</Fact>
      <Fact label="Boss wall">{maybe(block.bossWallM)}</Fact>
      {hasTube ? (
        <Fact label="Pickup tube">
          {runs.map((r) => length(r, unit)).join(" + ")}
          {block.tubeBendDeg !== null ? `, ${block.tubeBendDeg}° bend` : ""}
        </Fact>
      ) : null}
    </Facts>
  );
}
