import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { INCH_DRILLS } from "@/lib/engineering/drills";
import type { MixtureBin } from "@/lib/engineering/log-bins";
import { correctStages, type StageToCorrect } from "@/lib/engineering/stage-correction";
import { suppliedAreaAt, valveIsOpen, type PowerValve } from "@/lib/engineering/staging";

const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

// A plan: main jets, one to four valves at distinct openings (a vacuum valve below zero gauge), each with a
// throttle mode (secondary stages read in full throttle); and a log's bins anywhere from vacuum to boost.
const plan = fc
  .record({
    primary: num(1e-6, 1e-5),
    secondary: num(0, 1e-5),
    openings: fc.uniqueArray(fc.integer({ min: -30, max: 100 }), { minLength: 1, maxLength: 4 }),
    sides: fc.array(fc.boolean(), { minLength: 4, maxLength: 4 }),
    partModes: fc.array(fc.boolean(), { minLength: 4, maxLength: 4 }),
    areas: fc.array(num(0, 4e-6), { minLength: 4, maxLength: 4 }),
    bins: fc.array(
      fc.record({ full: fc.boolean(), kPa: num(-50, 120), lambda: num(0.6, 1.3), count: fc.integer({ min: 1, max: 10 }) }),
      { maxLength: 12 },
    ),
  })
  .map((p) => {
    const valves: PowerValve[] = p.openings.map((kPa, i) => {
      const secondary = kPa >= 0 && (p.sides[i] as boolean);
      const side = secondary ? "secondary" : "primary";
      const restrictionAreaM2 = p.areas[i] as number;
      return kPa < 0
        ? { id: `v${i}`, side, kind: "vacuum", ratingPa: -kPa * 1000, restrictionAreaM2 }
        : { id: `v${i}`, side, kind: "boost", setpointPa: kPa * 1000, restrictionAreaM2 };
    });
    const stages: StageToCorrect[] = valves.map((v, i) => ({
      valveId: v.id,
      mode: v.side === "secondary" || !(p.partModes[i] as boolean) ? "full" : "part",
      index: i + 1,
      layout: null,
      maxHoles: 4,
    }));
    const bins: MixtureBin[] = p.bins.map((b) => ({
      mode: b.full ? "full" : "part",
      fromPa: b.kPa * 1000 - 500,
      toPa: b.kPa * 1000 + 500,
      gaugePa: b.kPa * 1000,
      count: b.count,
      lambda: b.lambda,
      spread: 0,
      enough: b.count >= 5,
      lines: [],
    }));
    const cruiseBelow = Math.min(0, ...valves.filter((v) => v.kind === "vacuum").map((v) => -v.ratingPa));
    const target = { atmosphereAfr: 0.85, peakBoostAfr: 0.78, peakBoostGaugePa: 100_000, cruiseAfr: 1.0, cruiseBelowGaugePa: cruiseBelow };
    return { mainJets: { primary: p.primary, secondary: p.secondary }, valves, stages, bins, target };
  });

describe("stage correction properties", () => {
  it("never leaves a stage below zero, and the changes carried are the changes made", { timeout: 120_000 }, () => {
    fc.assert(
      fc.property(plan, ({ mainJets, valves, stages, bins, target }) => {
        const result = correctStages({ model: { mainJets, valves, target }, stages, bins, drills: INCH_DRILLS, primaryMainJetDiameterM: 0.0018 });
        const corrected = { mainJets, valves: result.valves };
        const original = { mainJets, valves };
        for (const c of result.corrections) {
          expect(c.proposedAreaM2).toBeGreaterThanOrEqual(0);
          expect(c.drilledAreaM2).toBeGreaterThanOrEqual(0);
          expect(Math.abs(c.realisedChangeM2 - (c.drilledAreaM2 - c.currentAreaM2))).toBeLessThanOrEqual(1e-18);
        }
        for (const v of result.valves) expect(v.restrictionAreaM2).toBeGreaterThanOrEqual(0);

        for (const b of result.bins) {
          // What the corrected carburetor adds at the bin is the sum of the realised changes open there.
          const added = suppliedAreaAt(corrected, b.gaugePa, b.mode) - suppliedAreaAt(original, b.gaugePa, b.mode);
          let realised = 0;
          for (const c of result.corrections) {
            const v = valves.find((x) => x.id === c.stageId) as PowerValve;
            if ((b.mode === "full" || v.side === "primary") && valveIsOpen(v, b.gaugePa)) realised += c.realisedChangeM2;
          }
          expect(Math.abs(added - realised)).toBeLessThanOrEqual(1e-17);
        }

        for (const c of result.corrections) {
          const own = result.bins.filter((b) => b.enough && b.mode === c.mode && b.use.kind === "stage" && b.use.valveIds.includes(c.stageId));
          const lowest = own.sort((x, y) => x.gaugePa - y.gaugePa)[0];
          if (lowest === undefined) {
            expect(c.limitedBy).toBe("readings");
            continue;
          }
          // What the stages below already add at its bins, read off the corrected carburetor.
          const below =
            suppliedAreaAt(corrected, lowest.gaugePa, c.mode) - suppliedAreaAt(original, lowest.gaugePa, c.mode) - c.realisedChangeM2;
          expect(Math.abs(c.appliedBelowM2 - below)).toBeLessThanOrEqual(1e-17);
        }
      }),
      { numRuns: 150 },
    );
  });
});
