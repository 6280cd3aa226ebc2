// Which readings show the carburetor's steady metering, and in which throttle mode.
//
// * Mode: part throttle up to a throttle threshold, full above it (the secondaries are open and both sides
//   meter). Rows without a throttle column take the mode the caller names for the whole log.
// * Fast throttle movement: when the throttle moves faster than a rate between consecutive rows, the
//   accelerator pump squirts and the wideband shows the shot, not the metering. Such rows, and those within a
//   settling time after, are set aside (only judged where both rows carry a time and a throttle position).
// * Cold engine: below a coolant temperature, or where the logger's own flag says not warm, the choke and fuel
//   on cold walls change the mixture. Set aside.
// Set-aside rows are counted by reason and listed by line, never dropped silently.

import { requireFinite, requireInRange, requireNonNegative, requirePositive } from "./checks";
import type { AirFuelReading } from "./air-fuel-log";
import type { ThrottleMode } from "./staging";

/** Full throttle above 70 % throttle (common practice, no published source). */
export const DEFAULT_FULL_THROTTLE_ABOVE_PCT = 70;
/** Throttle faster than 50 % of its travel per second counts as a transient (common practice, no published source). */
export const DEFAULT_MAX_THROTTLE_RATE_PCT_PER_S = 50;
/** Readings within 0.5 s after a fast throttle movement are still the pump shot (common practice, no published source). */
export const DEFAULT_SETTLE_S = 0.5;
/** Warm from 70 °C coolant, 343.15 K (common practice, no published source). */
export const DEFAULT_WARM_FROM_K = 343.15;

export type SetAsideReason = "fastThrottle" | "cold";

export interface SteadyReadingOptions {
  fullThrottleAbovePct?: number | undefined;
  /** Mode of rows with no throttle position. Required when any row has none. */
  modeWithoutThrottle?: ThrottleMode | undefined;
  maxThrottleRatePctPerS?: number | undefined;
  settleS?: number | undefined;
  warmFromK?: number | undefined;
}

export interface ModeReading extends AirFuelReading {
  mode: ThrottleMode;
}

export interface SteadyReadings {
  readings: ModeReading[];
  setAside: Record<SetAsideReason, number>;
  setAsideLines: { line: number; reason: SetAsideReason }[];
}

/** Keeps the steady, warm readings (in the order given, which is taken as the order logged) with their mode. */
export function steadyReadings(readings: readonly AirFuelReading[], options: SteadyReadingOptions = {}): SteadyReadings {
  const fullAbove = requireInRange("fullThrottleAbovePct", options.fullThrottleAbovePct ?? DEFAULT_FULL_THROTTLE_ABOVE_PCT, 0, 100);
  const maxRate = requirePositive("maxThrottleRatePctPerS", options.maxThrottleRatePctPerS ?? DEFAULT_MAX_THROTTLE_RATE_PCT_PER_S);
  const settleS = requireNonNegative("settleS", options.settleS ?? DEFAULT_SETTLE_S);
  const warmFromK = requirePositive("warmFromK", options.warmFromK ?? DEFAULT_WARM_FROM_K);
  const fallbackMode = options.modeWithoutThrottle;
  if (fallbackMode === undefined && readings.some((r) => r.throttlePct === undefined)) {
    throw new RangeError("modeWithoutThrottle: the log has rows without a throttle position; name the throttle mode they were taken in");
  }

  const result: SteadyReadings = { readings: [], setAside: { fastThrottle: 0, cold: 0 }, setAsideLines: [] };
  let lastFastS = -Infinity;
  readings.forEach((reading, i) => {
    const previous = readings[i - 1];
    if (previous !== undefined && isFast(previous, reading, maxRate)) lastFastS = reading.timeS as number;
    let reason: SetAsideReason | undefined;
    if (reading.warm === false || (reading.coolantK !== undefined && reading.coolantK < warmFromK)) reason = "cold";
    else if (reading.timeS !== undefined && reading.timeS >= lastFastS && reading.timeS - lastFastS <= settleS) reason = "fastThrottle";
    if (reason !== undefined) {
      result.setAside[reason]++;
      result.setAsideLines.push({ line: reading.line, reason });
      return;
    }
    const mode: ThrottleMode =
      reading.throttlePct === undefined ? (fallbackMode as ThrottleMode) : reading.throttlePct > fullAbove ? "full" : "part";
    result.readings.push({ ...reading, mode });
  });
  return result;
}

function isFast(a: AirFuelReading, b: AirFuelReading, maxRate: number): boolean {
  if (a.timeS === undefined || b.timeS === undefined || a.throttlePct === undefined || b.throttlePct === undefined) return false;
  const dt = requireFinite("timeS", b.timeS) - requireFinite("timeS", a.timeS);
  // Out of order or repeated times: the rate cannot be told.
  if (!(dt > 0)) return false;
  return Math.abs(b.throttlePct - a.throttlePct) / dt > maxRate;
}
