import "server-only";
import type { StageRow } from "@/db/jobs";
import type { DisplayLengthUnit } from "@/lib/format/display";
import { area, inHg, psi } from "./format";

// A stage described the way the tuner gave it.

export function valveText(stage: Pick<StageRow, "valveKind" | "vacuumRatingPa" | "setpointPa">): string {
  return stage.valveKind === "vacuum"
    ? `Vacuum valve, opens below ${inHg(stage.vacuumRatingPa ?? 0)}`
    : `Boost valve, opens at ${psi(stage.setpointPa ?? 0)}`;
}

export function targetText(stage: Pick<StageRow, "targetKind" | "targetFrom" | "targetTo">, unit: DisplayLengthUnit): string {
  switch (stage.targetKind) {
    case "afr":
      return `AFR ${(stage.targetFrom ?? stage.targetTo).toFixed(1)} → ${stage.targetTo.toFixed(1)}`;
    case "lambda":
      return `λ ${(stage.targetFrom ?? stage.targetTo).toFixed(2)} → ${stage.targetTo.toFixed(2)}`;
    case "percentMainJet":
      return `${stage.targetTo.toFixed(1)} % of the main-jet area`;
    case "area":
      return `${area(stage.targetTo, unit)} of restriction`;
  }
}
