import { describe, expect, it } from "vitest";
import type { MixtureBin } from "@/lib/engineering/log-bins";
import { correctStages, type StageToCorrect } from "@/lib/engineering/stage-correction";
import type { PowerValve, StagingModel } from "@/lib/engineering/staging";
import { asmeDrill, M_PER_IN, PA_PER_INHG, PA_PER_PSI } from "./nist-factors";

function expectNear(actual: number | undefined, expected: number, abs = 1e-13) {
  expect(actual).toBeDefined();
  expect(Math.abs((actual as number) - expected)).toBeLessThanOrEqual(abs);
}

// ASME B94.11M: #60 = 0.0400 in, #54 = 0.0550 in, #52 = 0.0635 in, #44 = 0.0860 in.
const DRILLS = [asmeDrill("#60", 0.04), asmeDrill("#54", 0.055), asmeDrill("#52", 0.0635), asmeDrill("#44", 0.086)];
const MAINS = { primary: 4e-6, secondary: 6e-6 };
// Primary main jets of 0.070 in (an invented job).
const JET_M = 0.07 * M_PER_IN;

const bin = (mode: MixtureBin["mode"], gaugePa: number, lambda: number, count = 6): MixtureBin => ({
  mode,
  fromPa: gaugePa - 1000,
  toPa: gaugePa + 1000,
  gaugePa,
  count,
  lambda,
  spread: 0.01,
  enough: count >= 5,
  lines: [],
});

const stage = (valveId: string, mode: StageToCorrect["mode"], index: number, layout: StageToCorrect["layout"] = null): StageToCorrect => ({
  valveId,
  mode,
  index,
  layout,
  maxHoles: 4,
});

const flat = (lambda: number): StagingModel["target"] => ({ atmosphereAfr: lambda, peakBoostAfr: lambda, peakBoostGaugePa: 100_000 });

describe("correctStages", () => {
  const vacuum: PowerValve = { id: "vac", side: "primary", kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG, restrictionAreaM2: 1e-6 };
  const secondary: PowerValve = { id: "sec", side: "secondary", kind: "boost", setpointPa: 20_000, restrictionAreaM2: 2e-6 };

  it("grows the last open stage by the whole area open in full throttle times the miss", () => {
    const result = correctStages({
      model: { mainJets: MAINS, valves: [vacuum, secondary], target: flat(0.78) },
      stages: [stage("vac", "part", 1), stage("sec", "full", 1, { count: 1, drill: { label: "#52" } })],
      bins: [bin("full", 30_000, 0.82)],
      drills: DRILLS,
      primaryMainJetDiameterM: JET_M,
    });
    const [vac, sec] = result.corrections;
    // Hand: open in full throttle at 30 kPa: mains 4e-6 + 6e-6, vacuum valve 1e-6, secondary stage 2e-6 = 1.3e-5 m².
    expectNear(result.bins[0]?.openAreaM2, 1.3e-5);
    expect(result.bins[0]?.targetLambda).toBe(0.78);
    // Hand: (0.82 / 0.78 - 1) = 0.04 / 0.78 = 0.0512821; x 1.3e-5 = 6.66667e-7 m²; 2e-6 + 6.66667e-7 = 2.66667e-6 m².
    expectNear(sec?.proposedAreaM2, 2.666667e-6, 1e-12);
    expectNear(sec?.changePct ?? 0, 33.3333, 1e-3);
    // Hand (ASME B94.11M): #60 hole 0.785398 x (1.016e-3 m)² = 8.10732e-7 m²; 3 x #60 = 2.432196e-6 (-8.8 %);
    // #54 hole 0.785398 x (1.397e-3)² = 1.532776e-6, 2 x #54 = 3.065552e-6 (+15.0 %); #52 2.043172e-6 (-23.4 %);
    // #44 3.747626e-6 (+40.5 %). Closest: 3 x #60.
    expect(sec?.layout?.count).toBe(3);
    expect(sec?.layout?.drill.label).toBe("#60");
    expectNear(sec?.drilledAreaM2, 2.432196e-6, 1e-12);
    expect(sec?.limitedBy).toBeNull();
    expect(sec?.change).toBe("secondary stage 1: 1 x #52 -> 3 x #60");
    // The vacuum stage has no part-throttle bin of its own: it stays, and says why.
    expect(vac?.limitedBy).toBe("readings");
    expect(vac?.realisedChangeM2).toBe(0);
    expect(vac?.change).toBe("primary stage 1: no holes, unchanged: no bin with enough readings");
    expect(result.jetAdvice).toBeNull();
    expect(result.valves.find((v) => v.id === "sec")?.restrictionAreaM2).toBe(sec?.drilledAreaM2);
  });

  it("closes a stage that would need less than no area and carries only that change upward", () => {
    const a: PowerValve = { id: "a", side: "primary", kind: "boost", setpointPa: 10_000, restrictionAreaM2: 1e-6 };
    const b: PowerValve = { id: "b", side: "secondary", kind: "boost", setpointPa: 40_000, restrictionAreaM2: 2e-6 };
    const result = correctStages({
      model: { mainJets: MAINS, valves: [a, b], target: flat(0.8) },
      stages: [stage("a", "full", 1, { count: 2, drill: { label: "#60" } }), stage("b", "full", 1)],
      bins: [bin("full", 20_000, 0.7), bin("full", 50_000, 0.8)],
      drills: DRILLS,
      primaryMainJetDiameterM: JET_M,
    });
    const [ca, cb] = result.corrections;
    // Hand, stage a at 20 kPa: open 1e-5 + 1e-6 = 1.1e-5 m²; 0.70 / 0.80 - 1 = -0.125; change -1.375e-6 m²;
    // 1e-6 - 1.375e-6 = -3.75e-7: below zero, so the channel closes and only -1e-6 really happens.
    expectNear(ca?.wantedAreaM2, -3.75e-7);
    expect(ca?.proposedAreaM2).toBe(0);
    expect(ca?.clamped).toBe(true);
    expect(ca?.realisedChangeM2).toBe(-1e-6);
    expect(ca?.layout).toBeNull();
    expect(ca?.change).toBe("primary stage 1: 2 x #60 -> no holes (close the channel; still rich)");
    // Hand, stage b at 50 kPa: on target, so the engine wants no change there (0 m²), but stage a's -1e-6 is open
    // there: b adds +1e-6 -> 3e-6 m². Carrying the unrealised -1.375e-6 would have given 3.375e-6.
    expectNear(cb?.appliedBelowM2, -1e-6);
    expectNear(cb?.proposedAreaM2, 3e-6);
  });

  describe("cruise under vacuum", () => {
    const model = {
      mainJets: MAINS,
      valves: [vacuum, secondary],
      // Cruise lambda 1.0 under the vacuum valve's opening (common practice), power target 0.85 above it.
      target: { atmosphereAfr: 0.85, peakBoostAfr: 0.78, peakBoostGaugePa: 100_000, cruiseAfr: 1.0, cruiseBelowGaugePa: -6.5 * PA_PER_INHG },
    };
    const stages = [stage("vac", "part", 1), stage("sec", "full", 1)];
    const input = (lambda: number) => ({
      model,
      stages,
      // Hand: 6.5 inHg x 3386.389 = 22 011.5 Pa; both bins lie deeper, with every valve shut.
      bins: [bin("part", -40_000, lambda), bin("part", -30_000, lambda)],
      drills: DRILLS,
      primaryMainJetDiameterM: JET_M,
    });

    it("reads a healthy cruise against the cruise lambda and changes nothing", () => {
      const result = correctStages(input(1.0));
      expect(result.bins.map((b) => b.targetLambda)).toEqual([1.0, 1.0]);
      expect(result.bins.map((b) => b.use.kind)).toEqual(["cruise", "cruise"]);
      expect(result.jetAdvice).toBeNull();
      expect(result.corrections.map((c) => c.realisedChangeM2)).toEqual([0, 0]);
    });

    it("points a lean cruise at the primary main jets and changes no stage", () => {
      const result = correctStages(input(1.1));
      // Hand: area x 1.10, diameter x sqrt(1.10) = 1.0488088; 0.0700 in x 1.0488088 = 0.0734166 in.
      expect(result.jetAdvice?.side).toBe("primary");
      expectNear(result.jetAdvice?.ratio, 1.1, 1e-12);
      expectNear(result.jetAdvice?.proposedDiameterM, 0.0734166 * M_PER_IN, 1e-8);
      expect(result.jetAdvice?.message).toMatch(/0\.0700 in .* to 0\.0734 in/);
      expect(result.corrections.map((c) => c.realisedChangeM2)).toEqual([0, 0]);
      expect(result.corrections.map((c) => c.limitedBy)).toEqual(["readings", "readings"]);
    });
  });

  it("does not correct from a bin with too few readings", () => {
    const result = correctStages({
      model: { mainJets: MAINS, valves: [secondary], target: flat(0.78) },
      stages: [stage("sec", "full", 1)],
      bins: [bin("full", 30_000, 0.9, 3)],
      drills: DRILLS,
      primaryMainJetDiameterM: JET_M,
    });
    expect(result.corrections[0]?.limitedBy).toBe("readings");
    expect(result.corrections[0]?.proposedAreaM2).toBe(2e-6);
  });

  it("moves the opening of a stage that starts rich and ends lean instead of changing its area", () => {
    const result = correctStages({
      model: { mainJets: MAINS, valves: [secondary], target: flat(0.8) },
      stages: [stage("sec", "full", 1, { count: 1, drill: { label: "#52" } })],
      // Hand: 0.72 / 0.80 - 1 = -10 % (rich), 0.88 / 0.80 - 1 = +10 % (lean), both beyond the 5 % band.
      bins: [bin("full", 22_000, 0.72), bin("full", 40_000, 0.8), bin("full", 60_000, 0.88)],
      drills: DRILLS,
      primaryMainJetDiameterM: JET_M,
    });
    const c = result.corrections[0];
    // Hand: one bin width later, 20 000 + 6894.757 = 26 894.757 Pa (NIST SP 811: psi = 6894.757 Pa) = 3.9 psi;
    // now 20 000 / 6894.757 = 2.9 psi.
    expect(c?.opening?.direction).toBe("later");
    expectNear(c?.opening?.proposedGaugePa, 20_000 + PA_PER_PSI, 1e-3);
    expect(c?.realisedChangeM2).toBe(0);
    expect(c?.change).toBe("secondary stage 1: 1 x #52, unchanged; set the valve to open at 3.9 psi (now 2.9 psi): it comes in too early");
  });

  it("moves a vacuum valve's opening no further than zero gauge", () => {
    const shallow: PowerValve = { id: "vac", side: "primary", kind: "vacuum", ratingPa: 0.5 * PA_PER_INHG, restrictionAreaM2: 1e-6 };
    const result = correctStages({
      model: { mainJets: MAINS, valves: [shallow], target: flat(0.8) },
      stages: [stage("vac", "part", 1)],
      // Hand: rated 0.5 inHg = 1693.2 Pa; the bins lie above -1693.2 Pa with the valve open, rich (-10 %) then lean (+10 %).
      bins: [bin("part", -1000, 0.72), bin("part", 5000, 0.88)],
      drills: DRILLS,
      primaryMainJetDiameterM: JET_M,
    });
    const c = result.corrections[0];
    // Hand: one psi later would be -1693.2 + 6894.8 = +5201.6 Pa, a boost: the rating stops at 0 inHg.
    expect(c?.opening?.direction).toBe("later");
    expect(c?.opening?.proposedGaugePa).toBe(0);
    expect(c?.change).toMatch(/open at 0\.0 inHg \(now 0\.5 inHg\)/);
  });

  it("says when the valve's own window keeps the stage from its area", () => {
    const result = correctStages({
      model: { mainJets: MAINS, valves: [secondary], target: flat(0.78) },
      stages: [{ ...stage("sec", "full", 1), valveWindowAreaM2: 2.5e-6 }],
      // Hand: open 1.2e-5 m²; 0.90 / 0.78 - 1 = 0.153846; +1.846e-6 -> 3.846e-6 m², above the 2.5e-6 m² window.
      bins: [bin("full", 30_000, 0.9)],
      drills: DRILLS,
      primaryMainJetDiameterM: JET_M,
    });
    expectNear(result.corrections[0]?.proposedAreaM2, 3.846154e-6, 1e-12);
    expect(result.corrections[0]?.limitedBy).toBe("valve");
  });

  it("refuses a secondary stage read at part throttle", () => {
    expect(() =>
      correctStages({
        model: { mainJets: MAINS, valves: [secondary], target: flat(0.78) },
        stages: [stage("sec", "part", 1)],
        bins: [],
        drills: DRILLS,
        primaryMainJetDiameterM: JET_M,
      }),
    ).toThrow(/stages\[0\]\.mode/);
  });
});
