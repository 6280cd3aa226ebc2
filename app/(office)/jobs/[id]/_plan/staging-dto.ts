import "server-only";
import type { BlockRow } from "@/db/jobs";
import { STAGING_BAND, STAGING_CHART_VACUUM_PA, STAGING_SWEEP_POINTS, type ConversionPlan } from "@/lib/engineering/conversion-plan";
import { stagingChartData, type StagingChartDto } from "@/lib/jobs/staging-chart";

/** Short marks for the valves: P1, P2 … on the primary, S1 … on the secondary, in opening order per block. */
export function valveMarks(blocks: readonly BlockRow[]): Map<string, string> {
  const marks = new Map<string, string>();
  for (const block of blocks) block.stages.forEach((s, i) => marks.set(s.id, `${block.side === "primary" ? "P" : "S"}${i + 1}`));
  return marks;
}

/** The chart of the plan's fuel curve, on the same model, grid and band as the plan's own warnings. */
export function jobStagingChart(blocks: readonly BlockRow[], plan: ConversionPlan): StagingChartDto {
  const { model, fullThrottleFromGaugePa } = plan.staging;
  const target = model.target as { peakBoostGaugePa: number };
  const chart = stagingChartData(model, {
    fromGaugePa: -STAGING_CHART_VACUUM_PA,
    toGaugePa: target.peakBoostGaugePa,
    band: STAGING_BAND,
    points: STAGING_SWEEP_POINTS,
    fullThrottleFromGaugePa,
  });
  const marks = valveMarks(blocks);
  return { ...chart, valves: chart.valves.map((v) => ({ ...v, mark: marks.get(v.id) ?? v.mark })) };
}
