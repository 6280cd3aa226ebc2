import "server-only";
import { drillDto, lengthPair, tidy, type DrillDto, type LengthPair } from "@/lib/format/quantity-pairs";
import { passagePlug } from "@/lib/engineering/passage-plug";
import { ALL_THREADS, clearanceDrill, METRIC_THREADS, parseThread, tapDrill, UNIFIED_THREADS, type Thread } from "@/lib/engineering/threads";
import { M_PER_IN } from "@/lib/engineering/unit-factors";
import type { Drill } from "@/lib/engineering/types";
import { toSI } from "@/lib/engineering/units";
import { RequestRefusal } from "@/db/refusal";
import { refuseOutOfRange } from "../refusal";
import type { PassagePlugFormInput, TapDrillInput } from "./schema";

export interface ThreadDto {
  label: string;
  major: LengthPair;
  pitch: LengthPair;
  tpi: number | null;
}

function threadDto(thread: Thread): ThreadDto {
  return {
    label: thread.label,
    major: lengthPair(thread.majorM),
    pitch: lengthPair(thread.pitchM),
    tpi: thread.system === "unified" ? Math.round(M_PER_IN / thread.pitchM) : null,
  };
}

export interface TapDrillResultDto {
  thread: ThreadDto;
  engagementAskedPct: number;
  /** Drill size for exactly the engagement asked. */
  ideal: LengthPair;
  drill: DrillDto;
  engagementPct: number;
  closeClearance: DrillDto;
  freeClearance: DrillDto;
}

export function computeTapDrill(input: TapDrillInput): TapDrillResultDto {
  const thread = parseThread(input.thread);
  if (thread === undefined) throw new Error("the schema lets only known threads through");
  const result = refuseOutOfRange(() => tapDrill(thread, { engagementPct: input.engagement }), "engagement");
  return {
    thread: threadDto(thread),
    engagementAskedPct: input.engagement,
    ideal: lengthPair(result.idealM),
    drill: drillDto(result.drill),
    engagementPct: tidy(result.engagementPct, 2),
    closeClearance: drillDto(clearanceDrill(thread, "close")),
    freeClearance: drillDto(clearanceDrill(thread, "free")),
  };
}

export interface PassagePlugResultDto {
  thread: ThreadDto;
  drill: DrillDto;
  tapLabel: string;
  engagementPct: number;
  remainingWall: LengthPair;
  tapDepth: LengthPair;
  drillDepth: LengthPair;
  setScrew: { label: string; length: LengthPair } | null;
  warnings: string[];
}

/** A passage plug's inputs in SI, from the form or the JSON API. */
export interface PassagePlugRequest {
  passageDiameterM: number;
  wallThicknessM: number;
  depthAvailableM: number;
  engagementPct?: number;
  minWallM?: number;
  threads: readonly Thread[];
  /** The shop's drills; the standard series of each thread's system when absent. */
  drills?: readonly Drill[];
}

/** The plug, or a 422 refusal (code no_plug) naming the drill or thread the shop lacks. */
export function planPassagePlug(request: PassagePlugRequest): PassagePlugResultDto {
  const result = refuseOutOfRange(() => passagePlug(request));
  if (!result.ok) throw new RequestRefusal(422, result.message, undefined, { code: result.code });
  const { plug } = result;
  return {
    thread: threadDto(plug.thread),
    drill: drillDto(plug.drill),
    tapLabel: plug.tapLabel,
    engagementPct: tidy(plug.engagementPct, 2),
    remainingWall: lengthPair(plug.remainingWallM),
    tapDepth: lengthPair(plug.tapDepthM),
    drillDepth: lengthPair(plug.drillDepthM),
    setScrew: plug.setScrew === null ? null : { label: plug.setScrew.label, length: lengthPair(plug.setScrew.lengthM) },
    warnings: plug.warnings,
  };
}

export function computePassagePlug(input: PassagePlugFormInput): PassagePlugResultDto {
  const length = (q: { value: number; unit: "in" | "mm" }) => toSI("length", q.value, q.unit);
  return planPassagePlug({
    passageDiameterM: length(input.passage),
    wallThicknessM: length(input.wall),
    depthAvailableM: length(input.depth),
    engagementPct: input.engagement,
    minWallM: input.minWall === undefined ? undefined : length(input.minWall),
    threads: { unified: UNIFIED_THREADS, metric: METRIC_THREADS, both: ALL_THREADS }[input.threadSystem],
  });
}
