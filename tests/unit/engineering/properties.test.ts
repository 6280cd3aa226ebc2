import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { solveHoleLayout, type HoleLayoutCandidate } from "@/lib/engineering/hole-layout";
import { areaFromMassFlow, seriesPairArea } from "@/lib/engineering/orifice";
import { suppliedAreaAt, type PowerValve, type StagingModel } from "@/lib/engineering/staging";

const RUNS = { numRuns: 200 };
const positive = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

describe("orifice properties", () => {
  it("twice the flow needs twice the area, four times the signal half the area", () => {
    fc.assert(
      fc.property(positive(1e-6, 1), positive(0.3, 1), positive(500, 1100), positive(10, 1e5), (massFlowKgS, cd, densityKgM3, deltaPPa) => {
        const area = areaFromMassFlow({ massFlowKgS, cd, densityKgM3, deltaPPa });
        // Bernoulli with a discharge coefficient (White, Fluid Mechanics): area goes as the flow, as 1/sqrt(signal).
        expect(areaFromMassFlow({ massFlowKgS: 2 * massFlowKgS, cd, densityKgM3, deltaPPa })).toBeCloseTo(2 * area, 15);
        const quartered = areaFromMassFlow({ massFlowKgS, cd, densityKgM3, deltaPPa: 4 * deltaPPa });
        expect(Math.abs(quartered - area / 2)).toBeLessThanOrEqual(1e-12 * area);
      }),
      RUNS,
    );
  });

  it("two orifices in series never pass more than the smaller one", () => {
    fc.assert(
      fc.property(positive(1e-9, 1e-3), positive(1e-9, 1e-3), (a, b) => {
        expect(seriesPairArea(a, b)).toBeLessThanOrEqual(Math.min(a, b) * (1 + 1e-12));
      }),
      RUNS,
    );
  });
});

describe("hole layout properties", () => {
  // Every drill of every series may be used here: the ranking rules, not the shop's limits, are under test.
  const anyDrill = { system: "mixed", smallestDrillM: 1e-6, largestDrillM: 1 } as const;
  const layoutInput = fc.record({
    target: positive(1e-8, 2e-5),
    maxHoles: fc.integer({ min: 1, max: 4 }),
    window: fc.option(positive(1e-7, 5e-5), { nil: undefined }),
    channel: fc.option(positive(1e-3, 1.5e-2), { nil: undefined }),
    web: fc.option(positive(0, 1e-3), { nil: undefined }),
  });

  it("more holes of one drill never give less effective area", () => {
    fc.assert(
      fc.property(layoutInput, ({ target, maxHoles, window }) => {
        const all = solveHoleLayout({ targetEffectiveAreaM2: target, drills: ALL_DRILLS, maxHoles, valveWindowAreaM2: window, limits: anyDrill }).candidates;
        const byDrill = new Map<string, HoleLayoutCandidate[]>();
        for (const c of all) byDrill.set(c.drill.label, [...(byDrill.get(c.drill.label) ?? []), c]);
        for (const list of byDrill.values()) {
          list.sort((x, y) => x.count - y.count);
          for (let i = 1; i < list.length; i++) {
            expect(list[i]!.effectiveAreaM2).toBeGreaterThanOrEqual(list[i - 1]!.effectiveAreaM2);
          }
        }
      }),
      { numRuns: 50 },
    );
  });

  it("the first candidate has the smallest error of all fitting layouts, and the ranking follows its rules", () => {
    fc.assert(
      fc.property(layoutInput, ({ target, maxHoles, window, channel, web }) => {
        const ranked = solveHoleLayout({
          targetEffectiveAreaM2: target,
          drills: ALL_DRILLS,
          maxHoles,
          valveWindowAreaM2: window,
          channelLengthM: channel,
          minWebM: web,
          limits: anyDrill,
        }).candidates;
        expect(ranked).toHaveLength(ALL_DRILLS.length * maxHoles);
        // Oracle written here from the definitions: hole area n pi d²/4, series with the window, the fit rule
        // n d + (n - 1) web <= channel.
        let bestFittingError = Infinity;
        for (const drill of ALL_DRILLS) {
          for (let n = 1; n <= maxHoles; n++) {
            const holes = (n * Math.PI * drill.diameterM ** 2) / 4;
            const effective = window === undefined ? holes : 1 / Math.sqrt(1 / holes ** 2 + 1 / window ** 2);
            // Web left unset: 0.020 in (common practice, no published source).
            const fits = channel === undefined || n * drill.diameterM + (n - 1) * (web ?? 0.02 * 0.0254) <= channel;
            if (fits) bestFittingError = Math.min(bestFittingError, Math.abs(effective - target));
          }
        }
        const first = ranked[0]!;
        if (Number.isFinite(bestFittingError)) {
          expect(first.fits).toBe(true);
          expect(Math.abs(Math.abs(first.errorM2) - bestFittingError)).toBeLessThanOrEqual(1e-9 * target);
        } else {
          expect(first.fits).toBe(false);
        }
        // Neighbours in the ranking: fitting first, then |error|, then fewer holes, then the larger drill.
        for (let i = 1; i < ranked.length; i++) {
          const a = ranked[i - 1]!;
          const b = ranked[i]!;
          if (a.fits !== b.fits) {
            expect(a.fits).toBe(true);
            continue;
          }
          const ea = Math.abs(a.errorM2);
          const eb = Math.abs(b.errorM2);
          expect(ea).toBeLessThanOrEqual(eb);
          if (ea !== eb) continue;
          expect(a.count).toBeLessThanOrEqual(b.count);
          if (a.count === b.count) expect(a.drill.diameterM).toBeGreaterThanOrEqual(b.drill.diameterM);
        }
      }),
      { numRuns: 100 },
    );
  }, 30_000);
});

describe("hole layout within a shop's limits", () => {
  it("offers only drills of the plan's system between its smallest and largest drill", () => {
    const sizes = fc.uniqueArray(fc.integer({ min: 0, max: ALL_DRILLS.length - 1 }), { minLength: 2, maxLength: 2 });
    fc.assert(
      fc.property(positive(1e-8, 2e-5), fc.integer({ min: 1, max: 4 }), fc.constantFrom("inch" as const, "metric" as const, "mixed" as const), sizes, (target, maxHoles, system, pair) => {
        const [a, b] = pair.map((i) => ALL_DRILLS[i]!.diameterM).sort((x, y) => x - y) as [number, number];
        const result = solveHoleLayout({ targetEffectiveAreaM2: target, drills: ALL_DRILLS, maxHoles, limits: { system, smallestDrillM: a, largestDrillM: b } });
        for (const c of result.candidates) {
          expect(c.drill.diameterM).toBeGreaterThanOrEqual(a - 1e-9);
          expect(c.drill.diameterM).toBeLessThanOrEqual(b + 1e-9);
          if (system === "inch") expect(c.drill.system).not.toBe("metric");
          if (system === "metric") expect(c.drill.system).toBe("metric");
        }
        if (result.candidates.length === 0) expect(result.limitedBy).toBe("no-drill");
      }),
      { numRuns: 100 },
    );
    // Hundreds of candidates a run: slow on a loaded machine, and speed is not what this checks.
  }, 30_000);
});

describe("staging properties", () => {
  const valve = fc.oneof(
    fc.record({
      side: fc.constantFrom("primary" as const, "secondary" as const),
      kind: fc.constant("vacuum" as const),
      ratingPa: positive(0, 80_000),
      restrictionAreaM2: positive(0, 5e-6),
    }),
    fc.record({
      side: fc.constantFrom("primary" as const, "secondary" as const),
      kind: fc.constant("boost" as const),
      setpointPa: positive(-50_000, 200_000),
      restrictionAreaM2: positive(0, 5e-6),
    }),
  );

  it("full-throttle supplied area never falls as manifold pressure rises", () => {
    fc.assert(
      fc.property(
        fc.array(valve, { maxLength: 6 }),
        fc.array(positive(-90_000, 250_000), { minLength: 2, maxLength: 40 }),
        (specs, pressures) => {
          const valves: PowerValve[] = specs.map((v, i) => ({ ...v, id: `v${i}` }));
          const model: StagingModel = {
            mainJets: { primary: 4e-6, secondary: 6e-6 },
            valves,
            ambient: { pressurePa: 101_325, temperatureK: 298.15 },
            target: { atmosphereAfr: 12.5, peakBoostAfr: 11.5, peakBoostGaugePa: 100_000 },
            charge: { kind: "fixed", temperatureK: 298.15 },
          };
          const sorted = [...pressures].sort((a, b) => a - b);
          for (let i = 1; i < sorted.length; i++) {
            expect(suppliedAreaAt(model, sorted[i]!, "full")).toBeGreaterThanOrEqual(suppliedAreaAt(model, sorted[i - 1]!, "full"));
          }
        },
      ),
      RUNS,
    );
  });
});
