import type { BlockFields, JobFields, StageFields } from "@/db/jobs";
import type { JobBlocksInput, UpdateJobInput } from "@/lib/jobs/schema";
import { standardAtmospherePressurePa } from "@/lib/engineering/atmosphere";

// Parsed form/API input (already SI) -> database columns.

type ParsedJobFields = Omit<UpdateJobInput, "tunerId" | "customerId">;

export function jobColumns(input: Partial<ParsedJobFields>): Partial<JobFields> {
  const columns: Partial<JobFields> = {
    carburetor: input.carburetor,
    displacementM3: input.displacement,
    fuelKind: input.fuelKind,
    targetPowerW: input.targetPower,
    peakBoostPa: input.peakBoost,
    targetLambdaAtmosphere: input.targetLambdaAtmosphere,
    targetLambdaPeak: input.targetLambdaPeak,
    intercooled: input.intercooled,
    chargeTemperatureK: input.chargeTemperature,
    ambientTemperatureK: input.ambientTemperature,
    compressorEfficiency: input.compressorEfficiencyPct === undefined ? undefined : input.compressorEfficiencyPct / 100,
    intercoolerEffectiveness: input.intercoolerEffectivenessPct === undefined ? undefined : input.intercoolerEffectivenessPct / 100,
    useAllDrills: input.useAllDrills,
    cruiseLambda: input.cruiseLambda,
    drillSystem: input.drillSystem,
    notes: input.notes,
  };
  if (input.fuelKind !== undefined) {
    // Only the details of the chosen fuel are kept; the others are cleared.
    columns.fuelEthanolPct = input.fuelKind === "blend" ? input.ethanolPct : null;
    columns.fuelDensityKgM3 = input.fuelKind === "custom" ? input.fuelDensityKgM3 : null;
    columns.fuelStoichAfr = input.fuelKind === "custom" ? input.fuelStoichAfr : null;
  }
  // The ambient is a barometer reading, or the standard atmosphere at the site's elevation (which is kept).
  if (input.siteElevation !== undefined) {
    columns.ambientPressurePa = standardAtmospherePressurePa(input.siteElevation);
    columns.siteElevationM = input.siteElevation;
  } else if (input.ambientPressure !== undefined) {
    columns.ambientPressurePa = input.ambientPressure;
    columns.siteElevationM = null;
  }
  if ("targetPower" in input && input.targetPower === undefined) columns.targetPowerW = null;
  if ("chargeTemperature" in input && input.chargeTemperature === undefined) columns.chargeTemperatureK = null;
  return Object.fromEntries(Object.entries(columns).filter(([, v]) => v !== undefined)) as Partial<JobFields>;
}

const orNull = (v: number | undefined) => (v === undefined ? null : v);

export function blockColumns(input: JobBlocksInput): (BlockFields & { stages: StageFields[] })[] {
  return input.blocks.map((block) => ({
    side: block.side,
    mainJetDiameterM: block.mainJetDiameter,
    mainJetCount: block.mainJetCount,
    channelLengthM: orNull(block.channelLength),
    minWebM: orNull(block.minWeb),
    passageDiameterM: orNull(block.passageDiameter),
    passageWallM: orNull(block.passageWall),
    passageDepthM: orNull(block.passageDepth),
    valveProtrusionM: orNull(block.valveProtrusion),
    runningClearanceM: orNull(block.runningClearance),
    measuredGapM: orNull(block.measuredGap),
    bossWallM: orNull(block.bossWall),
    tubeRunsM: [block.tubeRun1, block.tubeRun2].filter((v): v is number => v !== undefined),
    tubeBendDeg: orNull(block.tubeBendDeg),
    tubeBendRadiusM: orNull(block.tubeBendRadius),
    tubeSwageM: orNull(block.tubeSwage),
    tubeMaxRearwardM: orNull(block.tubeMaxRearward),
    tubeMaxDownwardM: orNull(block.tubeMaxDownward),
    stages: block.stages.map((stage) => ({
      valveKind: stage.valveKind,
      vacuumRatingPa: stage.valveKind === "vacuum" ? orNull(stage.vacuumRating) : null,
      setpointPa: stage.valveKind === "boost" ? orNull(stage.setpoint) : null,
      targetKind: stage.targetKind,
      mode: stage.mode ?? (block.side === "primary" ? "part" : "full"),
      targetFrom: stage.targetKind === "afr" || stage.targetKind === "lambda" ? orNull(stage.targetFrom) : null,
      // AFR and lambda "to", a percent of main-jet area, or an area in m².
      targetTo: (stage.targetKind === "area" ? stage.targetArea : stage.targetTo) ?? 0,
      valveWindowAreaM2: orNull(stage.valveWindowArea),
      maxHoles: stage.maxHoles,
    })),
  }));
}
