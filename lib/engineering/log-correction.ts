// From a wideband log to stage corrections in one call: convert and refuse rows (air-fuel-log.ts), keep the
// steady warm readings with their throttle mode (steady-readings.ts), bin them by pressure with every valve's
// opening as an edge (log-bins.ts), judge and correct (stage-correction.ts).

import { readAirFuelLog, type AirFuelRow, type RejectedRow } from "./air-fuel-log";
import { binReadings, DEFAULT_BIN_WIDTH_PA } from "./log-bins";
import { correctStages, type StageCorrectionInput, type StageCorrectionResult } from "./stage-correction";
import { valveOpeningGaugePa } from "./staging";
import { steadyReadings, type SteadyReadingOptions, type SteadyReadings } from "./steady-readings";

export interface LogCorrectionInput {
  rows: readonly AirFuelRow[];
  /** The job's ambient pressure, absolute Pa: gauge readings are relative to it. */
  ambientPa: number;
  fuelStoichAfr: number;
  steady?: SteadyReadingOptions | undefined;
  /** The shop's bin width (Pa, default 1 psi) and least readings per bin (default 5). */
  bins?: { widthPa?: number | undefined; minCount?: number | undefined } | undefined;
  correction: Omit<StageCorrectionInput, "bins" | "openingStepPa">;
}

export interface LogCorrection extends StageCorrectionResult {
  rejected: RejectedRow[];
  setAside: SteadyReadings["setAside"];
  setAsideLines: SteadyReadings["setAsideLines"];
  /** Readings that reached the bins. */
  usedReadings: number;
}

export function correctFromLog(input: LogCorrectionInput): LogCorrection {
  const { readings, rejected } = readAirFuelLog(input.rows, { ambientPa: input.ambientPa, fuelStoichAfr: input.fuelStoichAfr });
  const steady = steadyReadings(readings, input.steady);
  const widthPa = input.bins?.widthPa ?? DEFAULT_BIN_WIDTH_PA;
  const bins = binReadings(steady.readings, {
    widthPa,
    minCount: input.bins?.minCount,
    edgesPa: input.correction.model.valves.map(valveOpeningGaugePa),
  });
  const result = correctStages({ ...input.correction, bins, openingStepPa: widthPa });
  return { ...result, rejected, setAside: steady.setAside, setAsideLines: steady.setAsideLines, usedReadings: steady.readings.length };
}
