import { describe, expect, it } from "vitest";
import { binReadings } from "@/lib/engineering/log-bins";
import type { ModeReading } from "@/lib/engineering/steady-readings";
import { PA_PER_PSI } from "./nist-factors";

const r = (line: number, gaugePa: number, lambda: number, mode: ModeReading["mode"] = "part"): ModeReading => ({ line, gaugePa, lambda, mode });

describe("binReadings", () => {
  const readings = [
    // 0 to 1 psi (0 to 6894.757 Pa, NIST SP 811)
    r(1, 1000, 0.9),
    r(2, 2000, 0.8),
    r(3, 3000, 0.86),
    r(4, 4000, 0.82),
    r(5, 5000, 0.84),
    // 1 to 2 psi: three readings only
    r(6, 8000, 0.8),
    r(7, 9000, 0.79),
    r(8, 10_000, 0.81),
    // Full throttle at the same pressure goes to a bin of its own
    r(9, 3000, 0.78, "full"),
  ];

  it("gives each bin its median, spread and whether it holds enough readings", () => {
    const bins = binReadings(readings);
    expect(bins.map((b) => [b.mode, b.count])).toEqual([
      ["part", 5],
      ["part", 3],
      ["full", 1],
    ]);
    const [first, second, full] = bins;
    expect(first?.fromPa).toBe(0);
    // NIST SP 811 gives 6894.757 Pa to seven figures
    expect(first?.toPa).toBeCloseTo(PA_PER_PSI, 2);
    // Hand: sorted 0.80 0.82 0.84 0.86 0.90 -> median 0.84; quartiles (Hyndman and Fan definition 7) at
    // positions 1 and 3 of 0..4 -> 0.82 and 0.86, spread 0.04. Pressures 1000..5000 -> median 3000 Pa.
    expect(first?.lambda).toBeCloseTo(0.84, 12);
    expect(first?.spread).toBeCloseTo(0.04, 12);
    expect(first?.gaugePa).toBe(3000);
    expect(first?.enough).toBe(true);
    expect(first?.lines).toEqual([1, 2, 3, 4, 5]);
    // Three readings, fewer than the 5 a bin needs (common practice, no published source)
    expect(second?.enough).toBe(false);
    expect(second?.lambda).toBeCloseTo(0.8, 12);
    expect(full?.lambda).toBe(0.78);
    expect(full?.spread).toBe(0);
  });

  it("splits a bin at a valve's opening point so no bin mixes both sides of it", () => {
    const bins = binReadings(readings.slice(0, 5), { edgesPa: [4500] });
    expect(bins.map((b) => [b.fromPa, b.count])).toEqual([
      [0, 4],
      [4500, 1],
    ]);
    // Hand: sorted 0.80 0.82 0.86 0.90 -> median (0.82 + 0.86) / 2 = 0.84; Q1 at position 0.75:
    // 0.80 + 0.75 x 0.02 = 0.815; Q3 at 2.25: 0.86 + 0.25 x 0.04 = 0.87; spread 0.055.
    expect(bins[0]?.lambda).toBeCloseTo(0.84, 12);
    expect(bins[0]?.spread).toBeCloseTo(0.055, 12);
    expect(bins[0]?.toPa).toBe(4500);
    expect(bins[0]?.enough).toBe(false);
  });

  it("takes the shop's width and least count, and bins a vacuum below zero", () => {
    const bins = binReadings([r(1, -1, 1.0), r(2, -9_999, 1.02), r(3, 1, 0.9)], { widthPa: 10_000, minCount: 2 });
    expect(bins.map((b) => [b.fromPa, b.toPa, b.count, b.enough])).toEqual([
      [-10_000, 0, 2, true],
      [0, 10_000, 1, false],
    ]);
  });

  it("refuses a bin width of zero", () => {
    expect(() => binReadings(readings, { widthPa: 0 })).toThrow(/widthPa/);
  });
});
