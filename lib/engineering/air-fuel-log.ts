// Air-fuel readings taken on the car (a wideband log), turned into what the corrections work on: manifold
// gauge pressure against the job's ambient, and lambda.
//
// Lambda is the only mixture figure compared with a target. A wideband that shows AFR shows it on one of two
// scales: the fuel's own (AFR / that fuel's stoichiometric ratio) or, as many do whatever the fuel, a gasoline
// scale (lambda x 14.7; GASOLINE.stoichAfr in fuels.ts, the ratio lambda readouts scale by: common practice,
// no published source; Heywood, Internal Combustion Engine Fundamentals, appendix D lists 14.6 for a typical
// gasoline, from memory). A gasoline-scaled 11.0 on an E85 engine is lambda 11.0 / 14.7, never 11.0 / 9.8.
//
// Rows that cannot be a running engine's are refused with the field and the reason, never dropped silently.

import { GASOLINE } from "./fuels";
import { requirePositive } from "./checks";
import type { PressureReference } from "./types";
import { PA_PER_KPA } from "./unit-factors";
import { toGauge } from "./units";

/** A mixture as the wideband showed it. */
export type ShownMixture =
  | { kind: "lambda"; value: number }
  | { kind: "afr"; value: number; scale: "fuel" | "gasoline" };

/** One row of a log, pressure already in Pa (units.ts `pressure()` reads kPa, psi, bar, inHg). */
export interface AirFuelRow {
  /** Line of the file the row came from, for messages. */
  line: number;
  manifold: { pa: number; reference: PressureReference };
  mixture: ShownMixture;
  rpm?: number | undefined;
  /** Throttle position, percent of full opening. */
  throttlePct?: number | undefined;
  /** Coolant temperature, K; or a logger's own warm flag. */
  coolantK?: number | undefined;
  warm?: boolean | undefined;
  /** Seconds from the start of the log. */
  timeS?: number | undefined;
}

/** A row as the corrections read it: gauge pressure (Pa, against the job's ambient) and lambda. */
export interface AirFuelReading {
  line: number;
  gaugePa: number;
  lambda: number;
  rpm?: number | undefined;
  throttlePct?: number | undefined;
  coolantK?: number | undefined;
  warm?: boolean | undefined;
  timeS?: number | undefined;
}

export interface RejectedRow {
  line: number;
  /** Every field that is wrong, each named: "mixture.value: lambda 2.40 is outside 0.5 to 2.0". */
  reason: string;
}

// What a running engine can show (plausibility bounds, common practice, no published source): a wideband's
// useful range, a manifold from deep vacuum to high boost, an engine speed, a coolant from cold start to boil-over.
export const LAMBDA_RANGE = { min: 0.5, max: 2.0 } as const;
export const ABSOLUTE_MANIFOLD_RANGE_PA = { min: 10_000, max: 400_000 } as const;
export const RPM_RANGE = { min: 0, max: 20_000 } as const;
/** A throttle sensor's calibration can read a little past its ends. */
export const THROTTLE_RANGE_PCT = { min: -5, max: 105 } as const;
export const COOLANT_RANGE_K = { min: 220, max: 420 } as const;

/** Lambda of a shown mixture; the fuel's stoichiometric ratio is only used for an AFR on the fuel's own scale. */
export function lambdaOfShown(mixture: ShownMixture, fuelStoichAfr: number): number {
  if (mixture.kind === "lambda") return mixture.value;
  return mixture.value / (mixture.scale === "gasoline" ? GASOLINE.stoichAfr : fuelStoichAfr);
}

function outside(value: number, range: { min: number; max: number }): boolean {
  return !(Number.isFinite(value) && value >= range.min && value <= range.max);
}

const text = (value: number, digits: number) => (Number.isFinite(value) ? value.toFixed(digits) : String(value));

/**
 * Converts a log's rows: gauge pressure against `ambientPa` (absolute Pa) and lambda through the job's fuel.
 * Returns the readings in the order given and every refused row with its reason.
 */
export function readAirFuelLog(
  rows: readonly AirFuelRow[],
  job: { ambientPa: number; fuelStoichAfr: number },
): { readings: AirFuelReading[]; rejected: RejectedRow[] } {
  const ambientPa = requirePositive("ambientPa", job.ambientPa);
  const stoich = requirePositive("fuelStoichAfr", job.fuelStoichAfr);
  const readings: AirFuelReading[] = [];
  const rejected: RejectedRow[] = [];
  for (const row of rows) {
    const problems: string[] = [];
    const { pa, reference } = row.manifold;
    const absolutePa = reference === "absolute" ? pa : ambientPa + pa;
    if (reference !== "absolute" && reference !== "gauge") problems.push(`manifold.reference: must be "absolute" or "gauge"`);
    else if (outside(absolutePa, ABSOLUTE_MANIFOLD_RANGE_PA)) {
      problems.push(`manifold.pa: ${text(absolutePa / PA_PER_KPA, 1)} kPa absolute is outside 10 to 400 kPa`);
    }
    const lambda = lambdaOfShown(row.mixture, stoich);
    if (outside(lambda, LAMBDA_RANGE)) {
      const shown = row.mixture.kind === "afr" ? ` (AFR ${text(row.mixture.value, 2)} on the ${row.mixture.scale} scale)` : "";
      problems.push(`mixture.value: lambda ${text(lambda, 3)}${shown} is outside 0.5 to 2.0`);
    }
    if (row.rpm !== undefined && outside(row.rpm, RPM_RANGE)) problems.push(`rpm: ${text(row.rpm, 0)} is outside 0 to 20000`);
    if (row.throttlePct !== undefined && outside(row.throttlePct, THROTTLE_RANGE_PCT)) {
      problems.push(`throttlePct: ${text(row.throttlePct, 1)} % is outside -5 to 105 %`);
    }
    if (row.coolantK !== undefined && outside(row.coolantK, COOLANT_RANGE_K)) {
      problems.push(`coolantK: ${text(row.coolantK, 1)} K is outside 220 to 420 K`);
    }
    if (row.timeS !== undefined && !Number.isFinite(row.timeS)) problems.push(`timeS: must be a finite number, got ${row.timeS}`);
    if (problems.length > 0) {
      rejected.push({ line: row.line, reason: problems.join("; ") });
      continue;
    }
    readings.push({
      line: row.line,
      gaugePa: toGauge({ pa, reference }, ambientPa).pa,
      lambda,
      rpm: row.rpm,
      throttlePct: row.throttlePct,
      coolantK: row.coolantK,
      warm: row.warm,
      timeS: row.timeS,
    });
  }
  return { readings, rejected };
}
