import { describe, expect, it } from "vitest";
import type { PowerValve } from "@/lib/engineering/staging";
import { correctStages } from "@/lib/engineering/tuning-correction";
import { PA_PER_INHG, asmeDrill } from "./nist-factors";

function expectNear(actual: number, expected: number, abs = 1e-12) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(abs);
}

const valves: PowerValve[] = [
  { id: "vac", side: "primary", kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG, restrictionAreaM2: 1e-6 },
  { id: "a", side: "secondary", kind: "boost", setpointPa: 20_000, restrictionAreaM2: 2e-6 },
  { id: "b", side: "primary", kind: "boost", setpointPa: 60_000, restrictionAreaM2: 2e-6 },
];
const model = {
  mainJets: { primary: 4e-6, secondary: 6e-6 },
  valves,
  target: { atmosphereAfr: 12, peakBoostAfr: 12, peakBoostGaugePa: 100_000 },
};

describe("correctStages", () => {
  it("settles the stages from the lowest up", () => {
    const result = correctStages({
      model,
      readings: [
        { gaugePa: 10_000, afr: 12.6 },
        { gaugePa: 40_000, afr: 12.0 },
        { gaugePa: 80_000, afr: 12.6 },
        { gaugePa: 90_000, afr: 12.48 },
      ],
    });
    expect(result.stages.map((s) => s.stage)).toEqual(["mains", "vac", "a", "b"]);
    const [mains, vac, a, b] = result.stages;
    // No reading below the vacuum valve's opening: nothing to change on the mains.
    expect(mains?.readingCount).toBe(0);
    expect(mains?.changeM2).toBe(0);
    // Hand, vacuum stage at 10 kPa: total 1e-5 + 1e-6 = 1.1e-5 m²; 12.6 / 12 - 1 = 0.05; change 5.5e-7 m²;
    // new area 1e-6 + 5.5e-7 = 1.55e-6 m².
    expectNear(vac?.changeM2 ?? 0, 5.5e-7);
    expectNear(vac?.valves[0]?.newAreaM2 ?? 0, 1.55e-6);
    // Hand, stage a at 40 kPa: total 1.3e-5 m², on target: 0 total change, but the vacuum stage's +5.5e-7
    // is open here too, so stage a gives it back: -5.5e-7; new 2e-6 - 5.5e-7 = 1.45e-6 m².
    expectNear(a?.changeM2 ?? 0, -5.5e-7);
    expectNear(a?.valves[0]?.newAreaM2 ?? 0, 1.45e-6);
    // Hand, stage b: 80 kPa total 1.5e-5 x 0.05 = 7.5e-7; 90 kPa 1.5e-5 x (12.48 / 12 - 1 = 0.04) = 6e-7;
    // mean 6.75e-7, less the 5.5e-7 - 5.5e-7 = 0 made below: 6.75e-7; new 2e-6 + 6.75e-7 = 2.675e-6 m².
    expectNear(b?.meanTotalChangeM2 ?? 0, 6.75e-7);
    expectNear(b?.changeM2 ?? 0, 6.75e-7);
    expectNear(b?.valves[0]?.newAreaM2 ?? 0, 2.675e-6);
    expect(b?.toGaugePa).toBe(Infinity);
  });

  it("counts only the primary side at part throttle", () => {
    const result = correctStages({ model, mode: "part", readings: [{ gaugePa: 70_000, afr: 13.2 }] });
    // Hand: primary mains 4e-6 + vac 1e-6 + b 2e-6 = 7e-6 m²; 13.2 / 12 - 1 = 0.1; change 7e-7 m² on b.
    expect(result.stages.map((s) => s.stage)).toEqual(["mains", "vac", "b"]);
    expectNear(result.stages[2]?.changeM2 ?? 0, 7e-7);
  });

  it("closes a channel that would need less than no area", () => {
    const result = correctStages({ model, readings: [{ gaugePa: 40_000, afr: 9.6 }] });
    // Hand: 1.3e-5 x (9.6 / 12 - 1 = -0.2) = -2.6e-6 m², more than stage a's 2e-6 m².
    const a = result.stages.find((s) => s.stage === "a");
    expect(a?.valves[0]?.newAreaM2).toBe(0);
    expect(a?.valves[0]?.clampedToZero).toBe(true);
    expect(a?.valves[0]?.holes).toBeUndefined();
  });

  it("proposes new holes for the corrected area", () => {
    // ASME B94.11M decimals: #60 0.0400 in, #52 0.0635 in, #43 0.0890 in, 1/16 0.0625 in.
    const drills = [asmeDrill("#60", 0.04), asmeDrill("#52", 0.0635), asmeDrill("#43", 0.089), asmeDrill("1/16", 0.0625, "fraction")];
    const result = correctStages({ model, readings: [{ gaugePa: 10_000, afr: 12.6 }], layout: { drills, maxHoles: 4 } });
    const holes = result.stages.find((s) => s.stage === "vac")?.valves[0]?.holes;
    // Hand: target 1.55e-6 m². #60: d = 0.001016 m, area 8.10732e-7; 2 x #60 = 1.621464e-6 (+4.6 %);
    // 1 x 1/16 = 1.979326e-6 (+27.7 %); 1 x #52 = 2.043172e-6 (+31.8 %); 1 x #60 (-47.7 %). Best: 2 x #60.
    expect(holes?.count).toBe(2);
    expect(holes?.drill.label).toBe("#60");
  });

  it("shares a stage between valves opening together in proportion to their areas", () => {
    const twin: PowerValve[] = [
      { id: "p", side: "primary", kind: "boost", setpointPa: 20_000, restrictionAreaM2: 1e-6 },
      { id: "s", side: "secondary", kind: "boost", setpointPa: 20_000, restrictionAreaM2: 3e-6 },
    ];
    const result = correctStages({ model: { ...model, valves: twin }, readings: [{ gaugePa: 30_000, afr: 13.2 }] });
    // Hand: total 1e-5 + 4e-6 = 1.4e-5 m² x 0.1 = 1.4e-6 m²; shares 1/4 and 3/4: +3.5e-7 and +1.05e-6 m².
    const stage = result.stages.find((s) => s.stage === "p+s");
    expectNear(stage?.valves[0]?.newAreaM2 ?? 0, 1.35e-6);
    expectNear(stage?.valves[1]?.newAreaM2 ?? 0, 4.05e-6);
  });
});
