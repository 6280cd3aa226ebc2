import "server-only";
import { areaIn2, drillDto, tidy, type DrillDto } from "@/lib/format/quantity-pairs";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import type { PlanWarning } from "@/lib/engineering/plan-warnings";
import type { BlockRow } from "@/db/jobs";
import { fromSI, PA_PER_INHG } from "@/lib/engineering/units";

// The plan as the JSON API gives it: every stage with where it opens, the area it needs, the holes chosen and
// the mixture just after it opens; the predicted mixture across manifold pressure in both modes beside the
// target; and the plan's graded warnings. Pressures are gauge psi (vacuum negative), areas in square inches.

export interface PlanStageDto {
  id: string;
  side: "primary" | "secondary";
  valveKind: "vacuum" | "boost";
  opensAt: { value: number; unit: "inHg" | "psi" };
  mode: "part" | "full";
  neededAreaIn2: number;
  chosen: { count: number; drill: DrillDto; effectiveAreaIn2: number } | null;
  targetLambda: number;
  achievedLambda: number;
}

export interface PlanSweepPointDto {
  gaugePsi: number;
  targetLambda: number;
  predictedLambda: number;
  neededAreaIn2: number;
  suppliedAreaIn2: number;
}

export interface PlanDto {
  revision: number | null;
  stages: PlanStageDto[];
  sweep: { part: PlanSweepPointDto[]; full: PlanSweepPointDto[] };
  warnings: { code: string; level: PlanWarning["level"]; message: string }[];
}

export function planDto(plan: ConversionPlan, blocks: readonly BlockRow[], revision: number | null): PlanDto {
  const valveKinds = new Map(blocks.flatMap((b) => b.stages.map((s) => [s.id, s.valveKind] as const)));
  const stages = plan.blocks.flatMap((block) =>
    block.stages.map((s): PlanStageDto => {
      const valveKind = valveKinds.get(s.stageId) ?? (s.openingGaugePa < 0 ? "vacuum" : "boost");
      return {
        id: s.stageId,
        side: block.side,
        valveKind,
        opensAt: valveKind === "vacuum" ? { value: tidy(-s.openingGaugePa / PA_PER_INHG, 3), unit: "inHg" } : { value: tidy(fromSI("pressure", s.openingGaugePa, "psi"), 3), unit: "psi" },
        mode: s.mode,
        neededAreaIn2: areaIn2(s.targetAreaM2),
        chosen: s.chosen ? { count: s.chosen.count, drill: drillDto(s.chosen.drill), effectiveAreaIn2: areaIn2(s.chosen.effectiveAreaM2) } : null,
        targetLambda: tidy(s.targetLambda, 4),
        achievedLambda: tidy(s.achievedLambda, 4),
      };
    }),
  );
  const { sweep, fullThrottleFromGaugePa } = plan.staging;
  const curve = (mode: "part" | "full") =>
    sweep.gaugePa.flatMap((g, i): PlanSweepPointDto[] =>
      mode === "full" && g < fullThrottleFromGaugePa
        ? []
        : [
            {
              gaugePsi: tidy(fromSI("pressure", g, "psi"), 4),
              targetLambda: tidy(sweep.targetAfr[i] as number, 4),
              predictedLambda: tidy(sweep[mode].afr[i] as number, 4),
              neededAreaIn2: areaIn2(sweep[mode].neededM2[i] as number),
              suppliedAreaIn2: areaIn2(sweep[mode].suppliedM2[i] as number),
            },
          ],
    );
  return {
    revision,
    stages,
    sweep: { part: curve("part"), full: curve("full") },
    warnings: plan.warnings.map(({ code, level, message }) => ({ code, level, message })),
  };
}
