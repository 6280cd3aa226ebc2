import { describe, expect, it } from "vitest";
import type { AirFuelReading } from "@/lib/engineering/air-fuel-log";
import { steadyReadings } from "@/lib/engineering/steady-readings";

const at = (line: number, extra: Partial<AirFuelReading>): AirFuelReading => ({ line, gaugePa: 10_000, lambda: 0.8, ...extra });

describe("steadyReadings", () => {
  it("splits modes by throttle, sets fast-throttle and cold rows aside and counts them", () => {
    const result = steadyReadings(
      [
        at(1, { timeS: 0, throttlePct: 30 }),
        // Hand: (85 - 30) / 1.0 s = 55 %/s, above 50 %/s: the pump shot
        at(2, { timeS: 1.0, throttlePct: 85 }),
        // 0.4 s after the fast movement, inside the 0.5 s settling time
        at(3, { timeS: 1.4, throttlePct: 85 }),
        // 1.0 s after it: steady, full throttle above 70 %
        at(4, { timeS: 2.0, throttlePct: 85 }),
        // Hand: (85 - 70) / 1.0 s = 15 %/s, steady; 70 % is still part throttle ("up to" the threshold)
        at(5, { timeS: 3.0, throttlePct: 70 }),
        // 320 K = 46.85 °C, under the 70 °C warm threshold (common practice, no published source)
        at(6, { timeS: 4.0, throttlePct: 70, coolantK: 320 }),
        at(7, { timeS: 5.0, throttlePct: 70, warm: false }),
        at(8, { timeS: 6.0, throttlePct: 70, coolantK: 360 }),
      ],
      { modeWithoutThrottle: "full" },
    );
    expect(result.readings.map((r) => [r.line, r.mode])).toEqual([
      [1, "part"],
      [4, "full"],
      [5, "part"],
      [8, "part"],
    ]);
    expect(result.setAside).toEqual({ fastThrottle: 2, cold: 2 });
    expect(result.setAsideLines).toEqual([
      { line: 2, reason: "fastThrottle" },
      { line: 3, reason: "fastThrottle" },
      { line: 6, reason: "cold" },
      { line: 7, reason: "cold" },
    ]);
  });

  it("gives rows without a throttle column the caller's mode, and asks for it when missing", () => {
    const rows = [at(1, {}), at(2, { timeS: 1 })];
    expect(steadyReadings(rows, { modeWithoutThrottle: "full" }).readings.map((r) => r.mode)).toEqual(["full", "full"]);
    expect(() => steadyReadings(rows)).toThrow(/modeWithoutThrottle/);
  });

  it("judges the rate only where both rows carry time and throttle", () => {
    // No time: a jump from 0 to 100 % cannot be told fast or slow, so both rows stay.
    const result = steadyReadings([at(1, { throttlePct: 0 }), at(2, { throttlePct: 100 })]);
    expect(result.readings.map((r) => r.mode)).toEqual(["part", "full"]);
    expect(result.setAside.fastThrottle).toBe(0);
  });

  it("takes the shop's own thresholds", () => {
    // 60 % is full throttle above a 50 % threshold; 20 %/s is fast above a 10 %/s limit.
    const result = steadyReadings([at(1, { timeS: 0, throttlePct: 40 }), at(2, { timeS: 1, throttlePct: 60 }), at(3, { timeS: 5, throttlePct: 60 })], {
      fullThrottleAbovePct: 50,
      maxThrottleRatePctPerS: 10,
    });
    expect(result.readings.map((r) => [r.line, r.mode])).toEqual([
      [1, "part"],
      [3, "full"],
    ]);
  });
});
