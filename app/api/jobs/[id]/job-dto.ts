import type { JobRecord } from "@/db/jobs";

/** The job as the JSON API returns it: SI values with the unit in each name. */
export function jobDto(record: JobRecord) {
  const { job } = record;
  const current = record.revisions.find((r) => r.status === "current");
  return {
    id: job.id,
    number: job.number,
    state: job.state,
    customer: record.customer,
    tuner: record.tuner,
    carburetor: job.carburetor,
    engine: {
      displacementM3: job.displacementM3,
      fuel: { kind: job.fuelKind, ethanolPct: job.fuelEthanolPct, densityKgM3: job.fuelDensityKgM3, stoichAfr: job.fuelStoichAfr },
      targetPowerW: job.targetPowerW,
      peakBoostPa: job.peakBoostPa,
      targetLambdaAtmosphere: job.targetLambdaAtmosphere,
      targetLambdaPeak: job.targetLambdaPeak,
      intercooled: job.intercooled,
      chargeTemperatureK: job.chargeTemperatureK,
      ambientTemperatureK: job.ambientTemperatureK,
      ambientPressurePa: job.ambientPressurePa,
      siteElevationM: job.siteElevationM,
      cruiseLambda: job.cruiseLambda,
      compressorEfficiency: job.compressorEfficiency,
      intercoolerEffectiveness: job.intercoolerEffectiveness,
    },
    useAllDrills: job.useAllDrills,
    drillSystem: job.drillSystem,
    notes: job.notes,
    blocks: record.blocks.map(({ jobId: _jobId, createdAt: _createdAt, stages, ...block }) => ({
      ...block,
      stages: stages.map(({ blockId: _blockId, ...stage }) => stage),
    })),
    currentRevision: current ? { number: current.number, approvedAt: current.approvedAt, releasedAt: current.releasedAt, approvedBy: current.approvedBy } : null,
    revisions: record.revisions,
    updatedAt: job.updatedAt.toISOString(),
  };
}
