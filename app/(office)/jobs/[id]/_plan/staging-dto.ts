import "server-only";
import type { BlockRow } from "@/db/jobs";
import type { Job } from "@/db/schema";
import { STAGING_BAND, STAGING_CHART_VACUUM_PA, stagingModelFor, type ConversionPlan } from "@/lib/engineering/conversion-plan";
import type { StagingModel } from "@/lib/engineering/staging";
import { blockInputOf, engineInputOf } from "@/lib/job-plan";
import { stagingChartData, type StagingChartDto } from "@/lib/staging-chart";

/** The staging model of a solved job: its engine, its blocks and the layouts the plan chose. */
export function jobStagingModel(job: Job, blocks: readonly BlockRow[], plan: ConversionPlan): StagingModel {
  return stagingModelFor(engineInputOf(job), blocks.map(blockInputOf), plan.blocks);
}

/** Short marks for the valves: P1, P2 … on the primary, S1 … on the secondary, in opening order per block. */
export function valveMarks(blocks: readonly BlockRow[]): Map<string, string> {
  const marks = new Map<string, string>();
  for (const block of blocks) block.stages.forEach((s, i) => marks.set(s.id, `${block.side === "primary" ? "P" : "S"}${i + 1}`));
  return marks;
}

/** The chart of the job's fuel curve, on the same grid and band as the plan's own warnings. */
export function jobStagingChart(job: Job, blocks: readonly BlockRow[], plan: ConversionPlan): StagingChartDto {
  const chart = stagingChartData(jobStagingModel(job, blocks, plan), {
    fromGaugePa: -STAGING_CHART_VACUUM_PA,
    toGaugePa: job.peakBoostPa,
    band: STAGING_BAND,
    // The grid planConversion sweeps, so that the shaded zones match the plan's warnings.
    points: 61,
  });
  const marks = valveMarks(blocks);
  return { ...chart, valves: chart.valves.map((v) => ({ ...v, mark: marks.get(v.id) ?? v.mark })) };
}
