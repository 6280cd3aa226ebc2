import "server-only";
import type { BlockRow, StageRow } from "@/db/jobs";
import { fromSI } from "@/lib/engineering/units";
import { areaUnitFor, type FormLengthUnit } from "@/lib/forms/quantity/units";
import { typed } from "../edit/form-values";
import { newBlock, type BlockForm, type BlocksForm, type StageForm } from "./form-shape";

/** The stored blocks (SI) as the form's starting values, lengths in the user's unit. */
export function blocksFormValues(blocks: BlockRow[], unit: FormLengthUnit): BlocksForm {
  if (blocks.length === 0) return { blocks: [newBlock("primary", unit)] };
  const areaUnit = areaUnitFor(unit);
  const len = (m: number | null | undefined) => ({ value: m === null || m === undefined ? undefined : typed(fromSI("length", m, unit)), unit });
  const area = (m2: number | null) => ({ value: m2 === null ? undefined : typed(fromSI("area", m2, areaUnit)), unit: areaUnit });
  const stage = (s: StageRow): StageForm => ({
    valveKind: s.valveKind,
    vacuumRating: { value: s.vacuumRatingPa === null ? undefined : typed(fromSI("pressure", s.vacuumRatingPa, "inHg")), unit: "inHg" },
    setpoint: { value: s.setpointPa === null ? undefined : typed(fromSI("pressure", s.setpointPa, "psi")), unit: "psi" },
    targetKind: s.targetKind,
    mode: s.mode,
    targetFrom: s.targetFrom ?? undefined,
    targetTo: s.targetKind === "area" ? undefined : s.targetTo,
    targetArea: area(s.targetKind === "area" ? s.targetTo : null),
    valveWindowArea: area(s.valveWindowAreaM2),
    maxHoles: s.maxHoles,
  });
  return {
    blocks: blocks.map(
      (b): BlockForm => ({
        side: b.side,
        mainJetDiameter: len(b.mainJetDiameterM),
        mainJetCount: b.mainJetCount,
        channelLength: len(b.channelLengthM),
        minWeb: len(b.minWebM),
        passageDiameter: len(b.passageDiameterM),
        passageWall: len(b.passageWallM),
        passageDepth: len(b.passageDepthM),
        valveProtrusion: len(b.valveProtrusionM),
        runningClearance: len(b.runningClearanceM),
        measuredGap: len(b.measuredGapM),
        bossWall: len(b.bossWallM),
        tubeRun1: len(b.tubeRunsM?.[0]),
        tubeRun2: len(b.tubeRunsM?.[1]),
        tubeBendDeg: b.tubeBendDeg ?? undefined,
        tubeBendRadius: len(b.tubeBendRadiusM),
        tubeSwage: len(b.tubeSwageM),
        tubeMaxRearward: len(b.tubeMaxRearwardM),
        tubeMaxDownward: len(b.tubeMaxDownwardM),
        stages: b.stages.map(stage),
      }),
    ),
  };
}
