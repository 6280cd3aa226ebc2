import "server-only";
import { lengthPair, type LengthPair } from "@/lib/format/quantity-pairs";
import { planGrind } from "@/lib/engineering/grind-plan";
import { toSI } from "@/lib/engineering/units";
import { refuseOutOfRange } from "../refusal";
import type { GrindInput } from "./schema";

export interface GrindResultDto {
  ok: boolean;
  stopReason: string | null;
  grindNeeded: boolean;
  depth: LengthPair;
  wallSpare: LengthPair;
  remainingWall: LengthPair;
  passes: { pass: number; depth: LengthPair; cumulative: LengthPair; clayCheck: boolean }[];
}

export function computeGrind(input: GrindInput): GrindResultDto {
  const length = (q: { value: number; unit: "in" | "mm" }) => toSI("length", q.value, q.unit);
  const plan = refuseOutOfRange(() =>
    planGrind({
      valveProtrusionM: length(input.protrusion),
      runningClearanceM: length(input.clearance),
      measuredGapM: length(input.clayGap),
      wallThicknessM: length(input.wall),
      minRemainingWallM: length(input.minWall),
      maxDepthPerPassM: length(input.perPass),
      clayCheckEvery: input.clayEvery,
    }),
    { maxDepthPerPassM: "perPass.value" },
  );
  return {
    ok: plan.ok,
    stopReason: plan.reason?.message ?? null,
    grindNeeded: plan.grindNeeded,
    depth: lengthPair(plan.depthM),
    wallSpare: lengthPair(plan.wallSpareM),
    remainingWall: lengthPair(plan.remainingWallM),
    passes: plan.passes.map((p) => ({
      pass: p.pass,
      depth: lengthPair(p.depthM),
      cumulative: lengthPair(p.cumulativeDepthM),
      clayCheck: p.clayCheck,
    })),
  };
}
