import "server-only";
import { lengthPair, type LengthPair } from "@/lib/format/quantity-pairs";
import { planPickupTube, type TubeSegment } from "@/lib/engineering/pickup-tube";
import { toSI } from "@/lib/engineering/units";
import { refuseOutOfRange } from "../refusal";
import type { PickupTubeInput } from "./schema";

export interface PickupTubeResultDto {
  cutLength: LengthPair;
  straight: LengthPair;
  arcs: LengthPair;
  swage: LengthPair;
  reachRearward: LengthPair;
  reachDownward: LengthPair;
  fitsBowl: boolean;
  exceeds: ("rearward" | "downward")[];
}

const RAD_PER_DEG = Math.PI / 180;

export function computePickupTube(input: PickupTubeInput): PickupTubeResultDto {
  const length = (q: { value: number; unit: "in" | "mm" }) => toSI("length", q.value, q.unit);
  const radiusM = length(input.radius);
  const segments: TubeSegment[] = [
    { kind: "straight", lengthM: length(input.firstRun) },
    { kind: "bend", angleRad: input.bendAngle * RAD_PER_DEG, centerlineRadiusM: radiusM },
    { kind: "straight", lengthM: length(input.secondRun) },
  ];
  if (input.secondBendAngle !== undefined && input.thirdRun !== undefined) {
    segments.push(
      { kind: "bend", angleRad: input.secondBendAngle * RAD_PER_DEG, centerlineRadiusM: radiusM },
      { kind: "straight", lengthM: length(input.thirdRun) },
    );
  }
  const plan = refuseOutOfRange(
    () =>
      planPickupTube({
        segments,
        swageEngagementM: length(input.swage),
        outsideDiameterM: length(input.outsideDiameter),
        maxReach: {
          rearwardM: input.maxRearward && length(input.maxRearward),
          downwardM: input.maxDownward && length(input.maxDownward),
        },
      }),
    "radius.value",
  );
  return {
    cutLength: lengthPair(plan.cutLengthM),
    straight: lengthPair(plan.straightM),
    arcs: lengthPair(plan.arcM),
    swage: lengthPair(plan.swageM),
    reachRearward: lengthPair(plan.reach.rearwardM),
    reachDownward: lengthPair(plan.reach.downwardM),
    fitsBowl: plan.fitsBowl,
    exceeds: plan.exceeds,
  };
}
