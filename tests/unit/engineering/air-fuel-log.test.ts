import { describe, expect, it } from "vitest";
import { readAirFuelLog, type AirFuelRow } from "@/lib/engineering/air-fuel-log";
import { ethanolBlend } from "@/lib/engineering/fuels";
import { pressure } from "@/lib/engineering/units";
import { PA_PER_PSI } from "./nist-factors";

// E85's stoichiometric ratio as the job's fuel (lib/engineering/fuels.ts); only the fuel-scale readings use it.
const E85_STOICH = ethanolBlend(85).stoichAfr;
const SITE_AMBIENT_PA = 98_000;

function row(line: number, gaugePa: number, mixture: AirFuelRow["mixture"], extra: Partial<AirFuelRow> = {}): AirFuelRow {
  return { line, manifold: { pa: gaugePa, reference: "gauge" }, mixture, ...extra };
}

describe("readAirFuelLog", () => {
  it("reads a gasoline-scaled AFR on an E85 job through lambda", () => {
    const { readings, rejected } = readAirFuelLog([row(2, 0, { kind: "afr", value: 11.0, scale: "gasoline" })], {
      ambientPa: SITE_AMBIENT_PA,
      fuelStoichAfr: E85_STOICH,
    });
    expect(rejected).toEqual([]);
    // Hand: 11.0 / 14.7 (the gasoline readout scale, common practice, no published source) = 0.748299
    expect(readings[0]?.lambda).toBeCloseTo(0.748299, 6);
    // Never the gasoline-scaled figure over E85's own ratio: 11.0 / 9.8 = 1.122 would read as lean.
    expect(readings[0]?.lambda).not.toBeCloseTo(1.122, 2);
  });

  it("gives one lambda for a gasoline-scaled reading whatever the job's fuel", () => {
    const rows = [row(2, 0, { kind: "afr", value: 12.5, scale: "gasoline" })];
    const onGasoline = readAirFuelLog(rows, { ambientPa: SITE_AMBIENT_PA, fuelStoichAfr: 14.7 }).readings[0]?.lambda;
    const onE85 = readAirFuelLog(rows, { ambientPa: SITE_AMBIENT_PA, fuelStoichAfr: E85_STOICH }).readings[0]?.lambda;
    // Hand: 12.5 / 14.7 = 0.850340 on both
    expect(onGasoline).toBeCloseTo(0.85034, 5);
    expect(onE85).toBeCloseTo(0.85034, 5);
  });

  it("reads an AFR on the fuel's own scale through the fuel's ratio, and lambda as it is", () => {
    // An invented alcohol blend with a 9.8:1 ratio (the commonly quoted E85 figure, from memory).
    const { readings } = readAirFuelLog(
      [row(2, 0, { kind: "afr", value: 7.84, scale: "fuel" }), row(3, 0, { kind: "lambda", value: 0.78 })],
      { ambientPa: SITE_AMBIENT_PA, fuelStoichAfr: 9.8 },
    );
    // Hand: 7.84 / 9.8 = 0.80
    expect(readings[0]?.lambda).toBeCloseTo(0.8, 12);
    expect(readings[1]?.lambda).toBe(0.78);
  });

  it("turns absolute and gauge manifold readings into gauge pressure against the job's ambient", () => {
    const { readings } = readAirFuelLog(
      [
        { line: 2, manifold: { pa: 150_000, reference: "absolute" }, mixture: { kind: "lambda", value: 0.8 } },
        { line: 3, manifold: pressure(10, "psi", "gauge"), mixture: { kind: "lambda", value: 0.8 } },
      ],
      { ambientPa: SITE_AMBIENT_PA, fuelStoichAfr: 14.7 },
    );
    // Hand: 150 000 - 98 000 = 52 000 Pa gauge
    expect(readings[0]?.gaugePa).toBeCloseTo(52_000, 6);
    // NIST SP 811, B.8: 10 psi = 10 x 6894.757 = 68 947.57 Pa, gauge stays gauge
    expect(readings[1]?.gaugePa).toBeCloseTo(10 * PA_PER_PSI, 2);
  });

  it("refuses impossible rows with their line and the field at fault, and keeps the rest", () => {
    const { readings, rejected } = readAirFuelLog(
      [
        row(2, 20_000, { kind: "lambda", value: 0.8 }),
        row(7, 20_000, { kind: "lambda", value: 2.5 }),
        { line: 8, manifold: { pa: 5_000, reference: "absolute" }, mixture: { kind: "lambda", value: 0.8 } },
        // 98 kPa ambient - 95 kPa = 3 kPa absolute: no engine pulls that
        row(9, -95_000, { kind: "lambda", value: 0.8 }),
        // Hand: 40 / 14.7 = 2.72, beyond a wideband's useful range
        row(10, 0, { kind: "afr", value: 40, scale: "gasoline" }),
        row(11, 0, { kind: "lambda", value: 0.8 }, { throttlePct: 130 }),
        row(12, 0, { kind: "lambda", value: Number.NaN }),
        row(13, 0, { kind: "lambda", value: 0.8 }, { coolantK: 900 }),
      ],
      { ambientPa: SITE_AMBIENT_PA, fuelStoichAfr: 14.7 },
    );
    expect(readings.map((r) => r.line)).toEqual([2]);
    expect(rejected.map((r) => r.line)).toEqual([7, 8, 9, 10, 11, 12, 13]);
    expect(rejected[0]?.reason).toMatch(/^mixture\.value: lambda 2\.500/);
    expect(rejected[1]?.reason).toMatch(/^manifold\.pa: 5\.0 kPa absolute/);
    expect(rejected[2]?.reason).toMatch(/^manifold\.pa: 3\.0 kPa absolute/);
    expect(rejected[3]?.reason).toMatch(/^mixture\.value: lambda 2\.721 \(AFR 40\.00 on the gasoline scale\)/);
    expect(rejected[4]?.reason).toMatch(/^throttlePct/);
    expect(rejected[5]?.reason).toMatch(/^mixture\.value/);
    expect(rejected[6]?.reason).toMatch(/^coolantK/);
  });

  it("names every wrong field of one row", () => {
    const { rejected } = readAirFuelLog([row(4, 500_000, { kind: "lambda", value: 0.1 }, { rpm: -5 })], {
      ambientPa: SITE_AMBIENT_PA,
      fuelStoichAfr: 14.7,
    });
    expect(rejected[0]?.reason).toMatch(/manifold\.pa.*mixture\.value.*rpm/);
  });

  it("refuses a job without an ambient pressure", () => {
    expect(() => readAirFuelLog([], { ambientPa: 0, fuelStoichAfr: 14.7 })).toThrow(/ambientPa/);
  });
});
