import { describe, expect, it } from "vitest";
import {
  proposeStaging,
  stagingBalance,
  suppliedAreaAt,
  sweepStaging,
  targetAfrAt,
  valveIsOpen,
  valveIsOpenJustBelow,
  venturiAirAt,
  type PowerValve,
  type StagingModel,
  type ThrottleMode,
} from "@/lib/engineering/staging";
import { PA_PER_INHG, PA_PER_PSI, PA_STANDARD_ATMOSPHERE, asmeDrill } from "./nist-factors";

function expectNear(actual: number, expected: number, rel = 1e-5) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

/** The area the target needs at one pressure, as the sweep reports it at its first point. */
function sweptNeededArea(m: StagingModel, gaugePa: number, mode: ThrottleMode): number {
  const sweep = sweepStaging(m, { fromGaugePa: gaugePa, toGaugePa: gaugePa + 1, points: 2, band: 0.05 });
  expect(sweep.gaugePa[0]).toBe(gaugePa);
  return sweep[mode].neededM2[0] as number;
}

const P0 = PA_STANDARD_ATMOSPHERE;
const VACUUM: PowerValve = { id: "vac", side: "primary", kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG, restrictionAreaM2: 1e-6 };
const BOOST_SECONDARY: PowerValve = { id: "b3", side: "secondary", kind: "boost", setpointPa: 3 * PA_PER_PSI, restrictionAreaM2: 1.5e-6 };
const BOOST_PRIMARY: PowerValve = { id: "b8", side: "primary", kind: "boost", setpointPa: 8 * PA_PER_PSI, restrictionAreaM2: 1e-6 };

/** Mains 4e-6 m² primary and 6e-6 m² secondary, charge held at the ambient temperature, one target AFR. */
function model(valves: readonly PowerValve[], overrides: Partial<StagingModel> = {}): StagingModel {
  return {
    mainJets: { primary: { count: 2, areaM2: 2e-6 }, secondary: 6e-6 },
    valves,
    ambient: { pressurePa: P0, temperatureK: 298.15 },
    target: { atmosphereAfr: 12.5, peakBoostAfr: 12.5, peakBoostGaugePa: 10 * PA_PER_PSI },
    charge: { kind: "fixed", temperatureK: 298.15 },
    ...overrides,
  };
}

describe("valve states", () => {
  it("opens a vacuum valve once the vacuum falls below its rating", () => {
    // 6.5 inHg rating = 6.5 x 3386.389 = 22 011.53 Pa.
    expect(valveIsOpen(VACUUM, -7 * PA_PER_INHG)).toBe(false);
    expect(valveIsOpen(VACUUM, -6.5 * PA_PER_INHG)).toBe(false);
    expect(valveIsOpen(VACUUM, -6 * PA_PER_INHG)).toBe(true);
    expect(valveIsOpen(VACUUM, 5 * PA_PER_PSI)).toBe(true);
  });

  it("opens a boost valve at its setpoint", () => {
    expect(valveIsOpen(BOOST_PRIMARY, 7.9 * PA_PER_PSI)).toBe(false);
    expect(valveIsOpen(BOOST_PRIMARY, 8 * PA_PER_PSI)).toBe(true);
    expect(valveIsOpenJustBelow(BOOST_PRIMARY, 8 * PA_PER_PSI)).toBe(false);
  });
});

describe("supplied and needed area", () => {
  const m = model([VACUUM, BOOST_SECONDARY, BOOST_PRIMARY]);

  it("adds the open valves to the mains, primary side only at part throttle", () => {
    // Hand, at 5 psi: full = 4e-6 + 6e-6 + 1e-6 (vacuum) + 1.5e-6 (3 psi, secondary) = 12.5e-6 m²;
    // part = 4e-6 + 1e-6 = 5e-6 m² (the secondary valve's fuel has no signal with the secondaries shut).
    expectNear(suppliedAreaAt(m, 5 * PA_PER_PSI, "full"), 12.5e-6, 1e-12);
    expectNear(suppliedAreaAt(m, 5 * PA_PER_PSI, "part"), 5e-6, 1e-12);
    // Hand, at -10 inHg: the vacuum valve is shut: mains only, 10e-6 and 4e-6 m².
    expectNear(suppliedAreaAt(m, -10 * PA_PER_INHG, "full"), 10e-6, 1e-12);
  });

  it("needs area growing as the square root of charge density", () => {
    // Base (supplied at zero gauge) = 4e-6 + 6e-6 + 1e-6 = 11e-6 m². At one atmosphere of boost at the same
    // temperature the density doubles: 11e-6 x sqrt(2) = 1.5556349e-5 m².
    expectNear(sweptNeededArea(m, P0, "full"), 1.5556349e-5);
    // Part throttle base = 4e-6 + 1e-6 = 5e-6 m² -> 7.0710678e-6 m².
    expectNear(sweptNeededArea(m, P0, "part"), 7.0710678e-6);
  });

  it("needs more where the target under boost is richer", () => {
    const richer = model([VACUUM], { target: { atmosphereAfr: 12.5, peakBoostAfr: 11.5, peakBoostGaugePa: 10 * PA_PER_PSI } });
    // Hand, at 10 psi = 68 947.57 Pa: density ratio (101 325 + 68 947.57) / 101 325 = 1.6804596, sqrt = 1.2963254;
    // x 12.5 / 11.5 (1.0869565) = 1.4090494; x 11e-6 = 1.5499543e-5 m².
    expectNear(sweptNeededArea(richer, 10 * PA_PER_PSI, "full"), 1.5499543e-5);
    // Hand, halfway (5 psi) the target is linear between: (12.5 + 11.5) / 2 = 12.0.
    expect(targetAfrAt(richer.target, 5 * PA_PER_PSI)).toBeCloseTo(12, 12);
  });

  it("keeps ambient density at the venturi under vacuum", () => {
    // The venturi sits above the throttle: at -10 inHg it still sees 101 325 Pa, so the needed area is the base.
    expectNear(sweptNeededArea(m, -10 * PA_PER_INHG, "full"), 11e-6, 1e-12);
  });

  it("heats the charge through the compressor", () => {
    const hot = model([VACUUM], { ambient: { pressurePa: P0, temperatureK: 300 }, charge: { kind: "compressor", efficiency: 0.7 } });
    // Hand: pressure ratio 2 at one atmosphere of boost: T = 300 x (1 + (2^0.2857143 - 1) / 0.7) = 393.863 K;
    // density ratio 2 x 300 / 393.863 = 1.5233724, sqrt = 1.2342497; x 11e-6 = 1.3576747e-5 m².
    expectNear(venturiAirAt(hot, P0).temperatureK, 393.863);
    expectNear(sweptNeededArea(hot, P0, "full"), 1.3576747e-5);
  });
});

describe("sweepStaging", () => {
  it("finds where a carburetor without boost valves goes lean", () => {
    const sweep = sweepStaging(model([]), { fromGaugePa: 0, toGaugePa: 50_000, points: 51, band: 0.05 });
    // Hand: ratio = 1 / sqrt(1 + p/101 325) falls below 0.95 once 1 + p/101 325 > 1/0.9025 = 1.1080332,
    // p > 10 946.5 Pa: the first 1000 Pa point past it is 11 000 Pa.
    const full = sweep.zones.filter((z) => z.mode === "full");
    expect(full).toHaveLength(1);
    expect(full[0]).toMatchObject({ kind: "lean", fromGaugePa: 11_000, toGaugePa: 50_000 });
    // Hand: at 50 000 Pa, 1 / sqrt(1.4934616) = 0.8182855.
    expectNear(full[0]?.worstRatio ?? 0, 0.8182855);
    expect(sweep.gaugePa).toHaveLength(51);
    expect(sweep.full.ratio[0]).toBe(1);
  });

  it("reports a rich zone where a valve adds too much", () => {
    const big: PowerValve = { id: "big", side: "primary", kind: "boost", setpointPa: 5000, restrictionAreaM2: 3e-6 };
    const sweep = sweepStaging(model([big]), { fromGaugePa: 0, toGaugePa: 10_000, points: 11, band: 0.05 });
    // Hand: at 5000 Pa supplied 13e-6 against 10e-6 x sqrt(1.0493462) = 10.243760e-6: ratio 1.2690660, rich.
    const rich = sweep.zones.find((z) => z.kind === "rich" && z.mode === "full");
    expect(rich?.fromGaugePa).toBe(5000);
    expectNear(sweep.full.ratio[5] ?? 0, 1.269066);
    expect(sweep.openValveIds[5]).toEqual(["big"]);
    expect(sweep.openValveIds[4]).toEqual([]);
  });

  it("adds each valve's opening pressure to the points", () => {
    const sweep = sweepStaging(model([VACUUM, BOOST_SECONDARY]), { fromGaugePa: -20 * PA_PER_INHG, toGaugePa: 10 * PA_PER_PSI, points: 5, band: 0.05 });
    expect(sweep.gaugePa).toContain(-6.5 * PA_PER_INHG);
    expect(sweep.gaugePa).toContain(3 * PA_PER_PSI);
    expect(sweep.gaugePa).toHaveLength(7);
  });
});

describe("stagingBalance", () => {
  it("reports each stage's enrichment on each side", () => {
    const balance = stagingBalance(model([BOOST_PRIMARY, VACUUM, BOOST_SECONDARY]));
    expect(balance.stages.map((s) => s.valveIds)).toEqual([["vac"], ["b3"], ["b8"]]);
    // Hand: shares 1e-6 / 1e-6 = 1; 1e-6 / 2.5e-6 = 0.4; 2e-6 / 3.5e-6 = 0.5714286.
    expect(balance.stages.map((s) => s.primaryShare)).toEqual([1, 0.4, 2 / 3.5]);
    // Hand: last stage, primary 2e-6 / 4e-6 mains = 0.5, secondary 1.5e-6 / 6e-6 = 0.25.
    expect(balance.stages[2]?.primaryEnrichment).toBeCloseTo(0.5, 12);
    expect(balance.stages[2]?.secondaryEnrichment).toBeCloseTo(0.25, 12);
    expect(balance.secondaryFirst).toBe(false);
  });

  it("flags enrichment that reaches the secondary first", () => {
    // Common practice, no published source: primary first, then secondary.
    const balance = stagingBalance(model([BOOST_PRIMARY, BOOST_SECONDARY]));
    expect(balance.secondaryFirst).toBe(true);
    expect(balance.firstSecondaryGaugePa).toBe(3 * PA_PER_PSI);
  });
});

describe("proposeStaging", () => {
  // Constant target and charge temperature, peak one atmosphere of boost: the needed area is
  // base x sqrt(1 + p/P0), reaching y = sqrt(2) at the peak. A staircase of n valves holding |ratio - 1| <= d
  // at best starts each stage at 1 + d and lets it fall to 1 - d, so y = (1 + d)^n / (1 - d)^(n + 1).
  const peak = P0;
  const fineGrid = Array.from({ length: 404 }, (_, i) => (i + 1) * 250).filter((p) => p <= peak);

  it("places one valve where the hand-solved staircase puts it", () => {
    const result = proposeStaging({ model: model([]), boostValves: 1, peakBoostGaugePa: peak, band: 0.2, modes: ["full"], setpointGridPa: fineGrid });
    // Hand, n = 1: sqrt(2) (1 - d)² = 1 + d, i.e. 1.4142136 d² - 3.8284271 d + 0.4142136 = 0;
    // d = (3.8284271 - sqrt(14.6568542 - 2.3431458)) / 2.8284271 = (3.8284271 - 3.5090894) / 2.8284271 = 0.1129029.
    // The valve opens where 1 / sqrt(1 + s/P0) = 1 - d: 1 + s/P0 = 1 / 0.8870971² = 1.2707430, s = 27 433 Pa,
    // and adds (1 + d) / (1 - d) - 1 = 0.2545447 of the base area (10e-6 m²): 2.545447e-6 m².
    expect(result.worstDeviation).toBeGreaterThanOrEqual(0.1129029 - 1e-6);
    expect(result.worstDeviation).toBeLessThan(0.1129029 + 0.002);
    expect(Math.abs((result.valves[0]?.setpointPa ?? 0) - 27_433)).toBeLessThanOrEqual(500);
    expectNear(result.valves[0]?.restrictionAreaM2 ?? 0, 2.545447e-6, 0.01);
    expect(result.withinBand).toBe(true);
  });

  it("finds the three-valve staircase", () => {
    const result = proposeStaging({ model: model([]), boostValves: 3, peakBoostGaugePa: peak, band: 0.05, modes: ["full"], setpointGridPa: fineGrid });
    // Hand, n = 3: (1 + d)³ / (1 - d)⁴ = sqrt(2) = 1.4142136. Trials: d = 0.0490: 1.154321 / 0.817941 = 1.411251;
    // d = 0.0493: 1.155311 / 0.816910 = 1.414246; d = 0.0495: 1.155972 / 0.816222 = 1.416246. So d = 0.04930.
    expect(result.worstDeviation).toBeGreaterThanOrEqual(0.0493 - 1e-4);
    expect(result.worstDeviation).toBeLessThan(0.0493 + 0.002);
    expect(result.withinBand).toBe(true);
    const setpoints = result.valves.map((v) => v.setpointPa);
    expect(setpoints).toEqual([...setpoints].sort((a, b) => a - b));
  });

  it("holds part and full throttle together, primary first, and the sweep agrees", () => {
    const m = model([VACUUM], {
      ambient: { pressurePa: P0, temperatureK: 298.15 },
      target: { atmosphereAfr: 12.8, peakBoostAfr: 11.5, peakBoostGaugePa: 12 * PA_PER_PSI },
      charge: { kind: "compressor", efficiency: 0.7, intercoolerEffectiveness: 0.7 },
    });
    const result = proposeStaging({ model: m, boostValves: 3, peakBoostGaugePa: 12 * PA_PER_PSI, band: 0.1 });
    expect(result.valves.map((v) => v.side)).toEqual(["primary", "secondary", "primary"]);
    expect(stagingBalance(result.model).secondaryFirst).toBe(false);
    const before = sweepStaging(m, { fromGaugePa: 0, toGaugePa: 12 * PA_PER_PSI, points: 97, band: 0.1 });
    const after = sweepStaging(result.model, { fromGaugePa: 0, toGaugePa: 12 * PA_PER_PSI, points: 97, band: 0.1 });
    const worst = (ratios: number[]) => Math.max(...ratios.map((r) => Math.abs(r - 1)));
    expect(worst(after.full.ratio)).toBeLessThan(worst(before.full.ratio));
    expect(worst(after.part.ratio)).toBeLessThan(worst(before.part.ratio));
    for (const r of [...after.full.ratio, ...after.part.ratio]) {
      expect(r).toBeGreaterThanOrEqual(result.leanestRatio - 1e-12);
      expect(r).toBeLessThanOrEqual(result.richestRatio + 1e-12);
    }
  });

  it("turns each area into holes from the drills given", () => {
    // ASME B94.11M decimals.
    const drills = [asmeDrill("#60", 0.04), asmeDrill("#52", 0.0635), asmeDrill("#43", 0.089), asmeDrill("1/8", 0.125, "fraction")];
    const result = proposeStaging({
      model: model([]),
      boostValves: 2,
      peakBoostGaugePa: peak,
      band: 0.1,
      modes: ["full"],
      layout: { drills, maxHoles: 4 },
    });
    for (const v of result.valves) {
      expect(v.holes).toBeDefined();
      expect(v.restrictionAreaM2).toBe(v.holes?.effectiveAreaM2);
    }
  });

  it("refuses setpoints outside the boost range", () => {
    expect(() => proposeStaging({ model: model([]), boostValves: 1, peakBoostGaugePa: peak, band: 0.1, setpointGridPa: [0, 5000] })).toThrow(RangeError);
    expect(() => proposeStaging({ model: model([]), boostValves: 2, peakBoostGaugePa: peak, band: 0.1, setpointGridPa: [5000] })).toThrow(RangeError);
  });
});
