import { describe, expect, it } from "vitest";
import { extraFuelFromAfr, mainJetArea } from "@/lib/engineering/enrichment";
import { M_PER_IN } from "./nist-factors";

function expectNear(actual: number, expected: number, rel = 1e-5) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe("extra fuel from a mixture change", () => {
  it("follows AFR_before / AFR_after - 1", () => {
    // Hand: 13.0 / 11.5 = 1.1304348 -> 13.04 % more fuel.
    expectNear(extraFuelFromAfr(13.0, 11.5), 0.1304348);
    // Hand: a leaner target asks for less: 12 / 13 - 1 = -0.0769231.
    expectNear(extraFuelFromAfr(12, 13), -0.0769231);
  });
});

describe("mainJetArea", () => {
  it("adds the jets of each side from their measured bores", () => {
    const area = mainJetArea({
      primary: { diameterM: 0.07 * M_PER_IN, count: 2 },
      secondary: { diameterM: 0.08 * M_PER_IN, count: 2 },
    });
    // Hand: 0.070 in = 0.001778 m, d² = 3.161284e-6, x 0.785398163 = 2.482866e-6 m², two jets 4.965731e-6 m².
    // 0.080 in = 0.002032 m, d² = 4.129024e-6, x 0.785398163 = 3.242925e-6 m², two jets 6.485851e-6 m².
    expectNear(area.primaryM2, 4.965731e-6);
    expectNear(area.secondaryM2, 6.485851e-6);
    expectNear(area.totalM2, 1.1451582e-5);
  });

  it("leaves out a side that has no jets", () => {
    const area = mainJetArea({ primary: { diameterM: 0.07 * M_PER_IN, count: 2 } });
    expect(area.secondaryM2).toBe(0);
    expect(area.totalM2).toBe(area.primaryM2);
  });
});
