import { describe, expect, it } from "vitest";
import { FRACTION_DRILLS, LETTER_DRILLS, METRIC_DRILLS, NUMBER_DRILLS, findDrill } from "@/lib/engineering/drills";
import { holeAcceptBand } from "@/lib/engineering/hole-accept-band";
import { asmeDrill, M_PER_IN } from "./nist-factors";

const MM = 0.001;
const inches = (m: number) => m / M_PER_IN;

function band(label: string, series?: Parameters<typeof holeAcceptBand>[1]) {
  const drill = findDrill(label);
  if (drill === undefined) throw new Error(`no drill ${label}`);
  return holeAcceptBand(drill, series);
}

describe("holeAcceptBand", () => {
  it("keeps a #70 hole apart from #69 and #71", () => {
    // ASME B94.11M: #69 = 0.0292 in, #70 = 0.0280 in, #71 = 0.0260 in.
    // Under: gap 0.0280 - 0.0260 = 0.0020, half 0.0010; the largest 0.0001 in step strictly under it is 0.0009.
    // Over: gap 0.0292 - 0.0280 = 0.0012, half 0.0006; strictly under: 0.0005.
    // Band 0.0280 - 0.0009 = 0.0271 in to 0.0280 + 0.0005 = 0.0285 in.
    const b = band("#70");
    expect(inches(b.belowM)).toBeCloseTo(0.0009, 9);
    expect(inches(b.aboveM)).toBeCloseTo(0.0005, 9);
    expect(inches(b.minM)).toBeCloseTo(0.0271, 9);
    expect(inches(b.maxM)).toBeCloseTo(0.0285, 9);
    // #69 and #71 themselves fall outside it
    expect(0.0292 * M_PER_IN).toBeGreaterThan(b.maxM);
    expect(0.026 * M_PER_IN).toBeLessThan(b.minM);
    // and #71's own band ends under #70's: its over-allowance is 0.0009 (gap 0.0020), so 0.0269 in < 0.0271 in
    expect(band("#71").maxM).toBeLessThan(b.minM);
  });

  it("caps the band at 0.001 in where drills are far apart", () => {
    // ASME B94.11M: #44 = 0.0860, #43 = 0.0890, #42 = 0.0935 in: halves of the gaps 0.0015 and 0.00225 in,
    // both over the 0.001 in bench allowance (common practice) -> 0.0880 to 0.0900 in
    const b = band("#43");
    expect(inches(b.minM)).toBeCloseTo(0.088, 9);
    expect(inches(b.maxM)).toBeCloseTo(0.09, 9);
  });

  it("gives an end of the series its one neighbour's allowance on both sides", () => {
    // ASME B94.11M: #80 = 0.0135, #79 = 0.0145 in: half the gap 0.0005, strictly under it 0.0004 -> 0.0131 to 0.0139
    const b = band("#80");
    expect(inches(b.minM)).toBeCloseTo(0.0131, 9);
    expect(inches(b.maxM)).toBeCloseTo(0.0139, 9);
  });

  it("works in 0.001 mm steps for metric drills", () => {
    // Metric series in 0.05 mm steps below 3 mm: 2.45, 2.50, 2.55 mm; half the gap 0.025 mm, strictly under 0.024 mm
    const small = band("2.5 mm");
    expect(small.minM / MM).toBeCloseTo(2.476, 9);
    expect(small.maxM / MM).toBeCloseTo(2.524, 9);
    // 0.1 mm steps from 3 mm: half the gap 0.05 mm, capped at 0.001 in = 0.0254 mm, i.e. 25 steps of 0.001 mm
    const large = band("5 mm");
    expect(large.minM / MM).toBeCloseTo(4.975, 9);
    expect(large.maxM / MM).toBeCloseTo(5.025, 9);
  });

  it("takes the neighbours from the series given", () => {
    // A #70 among a rack holding 0.70 mm (0.70 / 25.4 = 0.027559 in): gap 0.000441 in, half 0.00022 -> 0.0002 under;
    // over, #69 at 0.0292 as before -> 0.0005
    const rack = [asmeDrill("#69", 0.0292), asmeDrill("#70", 0.028), { label: "0.70 mm", system: "metric" as const, diameterM: 0.7 * MM }];
    const b = band("#70", rack);
    expect(inches(b.belowM)).toBeCloseTo(0.0002, 9);
    expect(inches(b.aboveM)).toBeCloseTo(0.0005, 9);
  });

  it("never reaches half way to a neighbour, nor past 0.001 in, in any standard series", () => {
    for (const series of [NUMBER_DRILLS, LETTER_DRILLS, FRACTION_DRILLS, METRIC_DRILLS]) {
      const sorted = [...series].sort((a, b) => a.diameterM - b.diameterM);
      sorted.forEach((drill, i) => {
        const b = holeAcceptBand(drill);
        expect(b.belowM).toBeGreaterThan(0);
        expect(b.aboveM).toBeGreaterThan(0);
        expect(Math.max(b.belowM, b.aboveM)).toBeLessThanOrEqual(0.001 * M_PER_IN + 1e-12);
        const lower = sorted[i - 1];
        const upper = sorted[i + 1];
        if (lower) expect(b.minM).toBeGreaterThan((lower.diameterM + drill.diameterM) / 2);
        if (upper) expect(b.maxM).toBeLessThan((upper.diameterM + drill.diameterM) / 2);
      });
    }
  });
});
