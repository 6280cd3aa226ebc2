import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { standardAtmospherePressurePa } from "@/lib/engineering/atmosphere";
import { planConversion, type BlockInput, type EngineInput } from "@/lib/engineering/conversion-plan";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { drillRack } from "./drill-rack";
import { GASOLINE } from "@/lib/engineering/fuels";
import { M_PER_IN, PA_PER_INHG, PA_PER_PSI, PA_STANDARD_ATMOSPHERE } from "./nist-factors";

const IN2 = M_PER_IN * M_PER_IN;
const fahrenheitToK = (f: number) => ((f - 32) * 5) / 9 + 273.15; // NIST SP 811, B.8 (exact)

// A symmetric carburetor: two 0.080 in main jets a side. One jet: pi/4 x 0.080^2 = 0.00502655 in2.
const JET_IN = 0.08;

const engine: EngineInput = {
  fuel: GASOLINE,
  peakBoostPa: 10 * PA_PER_PSI,
  targetLambdaAtmosphere: 0.88,
  targetLambdaPeak: 0.78,
  cruiseLambda: 1.0, // common practice, no published source
  ambientPressurePa: PA_STANDARD_ATMOSPHERE,
  ambientTemperatureK: 298.15,
  chargeTemperatureK: fahrenheitToK(120),
  compressorEfficiency: 0.7,
};

// The primary stage opens at 3 psi and adds exactly one #52 hole (ASME B94.11M: #52 = 0.0635 in;
// pi/4 x 0.0635^2 = 0.00316692 in2): it is given as that area, and #52 is the only drill offered for it.
const primary: BlockInput = {
  id: "p",
  side: "primary",
  mainJetDiameterM: JET_IN * M_PER_IN,
  mainJetCount: 2,
  stages: [{ id: "p-b3", valve: { kind: "boost", setpointPa: 3 * PA_PER_PSI }, target: { kind: "area", areaM2: 0.00316692 * IN2 }, mode: "full", maxHoles: 1 }],
};

const secondary: BlockInput = {
  id: "s",
  side: "secondary",
  mainJetDiameterM: JET_IN * M_PER_IN,
  mainJetCount: 2,
  stages: [{ id: "s-b8", valve: { kind: "boost", setpointPa: 8 * PA_PER_PSI }, target: { kind: "lambda", from: 0.85, to: 0.78 }, mode: "full", maxHoles: 4 }],
};

const drills = drillRack(["#52", "#60", "#56", "#54", "#53", "#51", "#50", "#48", "#45", "#40", "#35", "#30"]);

describe("a stage's mixture target is read on the whole engine", () => {
  const plan = planConversion({ engine, blocks: [primary, secondary], drills });
  const stage = plan.blocks[1]!.stages[0]!;

  it("sizes the secondary stage on both sides' jets plus the primary stage already open", () => {
    // Open in full throttle just below 8 psi: 4 jets x 0.00502655 = 0.0201062 in2, plus the 3 psi stage's
    // 0.00316692 in2 = 0.0232731 in2. Lambda 0.85 -> 0.78 asks 0.85 / 0.78 - 1 = 0.0897436 more fuel:
    // 0.0897436 x 0.0232731 = 0.00208861 in2.
    expect(plan.blocks[0]!.stages[0]!.chosen).toMatchObject({ count: 1, drill: { label: "#52" } });
    expect(stage.basis).toBe("engine");
    expect(stage.basisAreaM2 / IN2).toBeCloseTo(0.0232731, 6);
    expect(stage.extraFuelFraction).toBeCloseTo(0.0897436, 6);
    expect(stage.targetAreaM2 / IN2).toBeCloseTo(0.00208861, 7);
    // Sized on its own block's jets it would have asked only 0.0897436 x 0.0100531 = 0.000902 in2: less than half.
    expect(stage.targetAreaM2 / IN2).toBeGreaterThan(2 * 0.000902);
  });

  it("refuses a part-throttle target on the secondary side, whose venturis are shut at part throttle", () => {
    const wrong: BlockInput = { ...secondary, stages: [{ ...secondary.stages[0]!, mode: "part" }] };
    expect(() => planConversion({ engine, blocks: [primary, wrong], drills })).toThrow(/full throttle/);
  });

  it("keeps a percent-of-main-jet stage a per-block figure", () => {
    // 12 % of the primary's two jets: 0.12 x 0.0100531 = 0.00120637 in2, whatever the secondary has.
    const percent: BlockInput = { ...primary, stages: [{ id: "v", valve: { kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG }, target: { kind: "percentMainJet", percent: 12 }, maxHoles: 4 }] };
    const p = planConversion({ engine, blocks: [percent, secondary], drills: ALL_DRILLS }).blocks[0]!.stages[0]!;
    expect(p.basis).toBe("block");
    expect(p.targetAreaM2 / IN2).toBeCloseTo(0.00120637, 7);
  });
});

describe("the calibration point is the local ambient air", () => {
  const neededAtPeak = (e: EngineInput) => planConversion({ engine: e, blocks: [primary, secondary], drills }).staging.sweep.full.neededM2.at(-1)!;

  it("needs more area at peak boost at altitude, as sqrt of the pressure ratios", () => {
    // Same charge temperature at peak, same jets. Needed area at peak / base = sqrt(rho_peak / rho_ambient)
    // x (lambda_atm / lambda_peak) (Heywood, ch. 7: a carburetor's AFR grows as sqrt(rho_air)).
    // 10 psi = 68.94757 kPa. Sea level: sqrt(170.27257 / 101.325) = sqrt(1.680459) = 1.296325.
    // 83.4 kPa: sqrt(152.34757 / 83.4) = sqrt(1.826709) = 1.351558. Ratio 1.351558 / 1.296325 = 1.042607.
    const sea = neededAtPeak(engine);
    const high = neededAtPeak({ ...engine, ambientPressurePa: 83_400 });
    expect(high / sea).toBeCloseTo(1.042607, 5);
  });

  it("needs less area at peak with a hotter charge, as sqrt of the temperature ratio", () => {
    // 120 degF = 322.039 K, 220 degF = 377.594 K (NIST SP 811: T/K = (t/degF + 459.67) / 1.8).
    // Density goes as 1/T, needed area as sqrt(density): cool / hot = sqrt(377.594 / 322.039) = 1.082826.
    const cool = neededAtPeak(engine);
    const hot = neededAtPeak({ ...engine, chargeTemperatureK: fahrenheitToK(220) });
    expect(cool / hot).toBeCloseTo(1.082826, 5);
  });

  it("turns a site elevation into the standard atmosphere's pressure", () => {
    // ISO 2533:1975 table (from memory): 1000 m 89 874.6 Pa, 1500 m 84 556.0 Pa, 2000 m 79 495.2 Pa.
    expect(standardAtmospherePressurePa(0)).toBeCloseTo(101_325, 6);
    expect(standardAtmospherePressurePa(1000)).toBeCloseTo(89_874.6, 0);
    expect(standardAtmospherePressurePa(1500)).toBeCloseTo(84_556.0, 0);
    expect(standardAtmospherePressurePa(2000)).toBeCloseTo(79_495.2, 0);
    expect(() => standardAtmospherePressurePa(20_000)).toThrow(RangeError);
  });
});

describe("cruise under vacuum is judged against the cruise lambda", () => {
  // The vacuum valve adds 12 % of the primary jets and is calibrated in at zero gauge, where the carburetor
  // gives lambda 0.88. With the valve shut at cruise the primary alone gives 0.88 x 1.12 = 0.9856 (less area,
  // leaner): within 5 % of a cruise lambda of 1.0, but 12 % lean of the power target 0.88.
  const vacuum: BlockInput = { ...primary, stages: [{ id: "v", valve: { kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG }, target: { kind: "percentMainJet", percent: 12 }, maxHoles: 4 }] };
  const plan = planConversion({ engine, blocks: [vacuum], drills: drillRack(["#60", "#61", "#62", "#63", "#64", "#65"]) });

  it("charts a healthy cruise as no lean zone", () => {
    const sweep = plan.staging.sweep;
    const at15 = sweep.gaugePa.findIndex((p) => p >= -15 * PA_PER_INHG);
    const chosen = plan.blocks[0]!.stages[0]!.chosen.effectiveAreaM2;
    const mains = 2 * 0.00502655 * IN2;
    // Predicted = 0.88 x (mains + chosen) / mains, whatever drill was picked; the target there is 1.0.
    expect(sweep.part.afr[at15]).toBeCloseTo((0.88 * (mains + chosen)) / mains, 4);
    expect(sweep.targetAfr[at15]).toBe(1.0);
    expect(plan.warnings.filter((w) => w.code === "lean_under_vacuum")).toEqual([]);
  });

  it("still flags a cruise that really is lean, and names the main jets", () => {
    const lean = planConversion({ engine: { ...engine, cruiseLambda: 0.9 }, blocks: [vacuum], drills: ALL_DRILLS });
    const w = lean.warnings.find((x) => x.code === "lean_under_vacuum");
    expect(w?.level).toBe("caution");
    expect(w?.message).toMatch(/main jets/);
  });
});

describe("the plan proves itself", () => {
  it("reports each stage's mixture just after it opens, on target when the before reading is right", () => {
    // Give the 8 psi stage the 'before' the model itself predicts there, then it must land on its target.
    const first = planConversion({ engine, blocks: [primary, secondary], drills: ALL_DRILLS });
    const before = first.blocks[1]!.stages[0]!.beforeLambda;
    const honest: BlockInput = { ...secondary, stages: [{ ...secondary.stages[0]!, target: { kind: "lambda", from: before, to: 0.78 } }] };
    const plan = planConversion({ engine, blocks: [primary, honest], drills: ALL_DRILLS });
    const stage = plan.blocks[1]!.stages[0]!;
    // Holes come in drill steps, so 'on target' means within the 5 % band (common practice, no published source).
    expect(Math.abs(stage.achievedLambda / 0.78 - 1)).toBeLessThan(0.05);
    expect(plan.warnings.filter((w) => w.stageId === "s-b8" && w.code === "stage_off_target")).toEqual([]);
  });

  it("grades a plan that runs lean beyond 10 % under boost as a danger", () => {
    // No boost stages at all: the mains alone lean out as sqrt(rho) while the target goes from 0.88 to 0.78.
    const bare = planConversion({ engine, blocks: [{ ...primary, stages: [{ id: "v", valve: { kind: "vacuum", ratingPa: 6.5 * PA_PER_INHG }, target: { kind: "percentMainJet", percent: 12 }, maxHoles: 4 }] }], drills: ALL_DRILLS });
    const lean = bare.warnings.filter((w) => w.code === "lean_under_boost");
    expect(lean.some((w) => w.level === "danger")).toBe(true);
    expect(bare.warnings[0]!.level).toBe("danger"); // most serious first
  });

  it("never leaves a plan silently lean (property)", () => {
    fc.assert(
      fc.property(
        fc.record({
          jetIn: fc.double({ min: 0.06, max: 0.11, noNaN: true }),
          peakPsi: fc.double({ min: 4, max: 25, noNaN: true }),
          setPsi: fc.double({ min: 1, max: 3.9, noNaN: true }),
          secondaryPsi: fc.double({ min: 4, max: 20, noNaN: true }),
          from: fc.double({ min: 0.8, max: 1.0, noNaN: true }),
          step: fc.double({ min: 0.02, max: 0.15, noNaN: true }),
          ambientKpa: fc.double({ min: 70, max: 104, noNaN: true }),
          chargeF: fc.option(fc.double({ min: 100, max: 300, noNaN: true }), { nil: undefined }),
        }),
        (c) => {
          const e: EngineInput = {
            ...engine,
            peakBoostPa: c.peakPsi * PA_PER_PSI,
            ambientPressurePa: c.ambientKpa * 1000,
            chargeTemperatureK: c.chargeF === undefined ? undefined : fahrenheitToK(c.chargeF),
            intercoolerEffectiveness: 0.7,
          };
          const p: BlockInput = { ...primary, mainJetDiameterM: c.jetIn * M_PER_IN, stages: [{ id: "a", valve: { kind: "boost", setpointPa: c.setPsi * PA_PER_PSI }, target: { kind: "lambda", from: c.from, to: c.from - c.step }, mode: "part", maxHoles: 4 }] };
          const s: BlockInput = { ...secondary, mainJetDiameterM: c.jetIn * M_PER_IN, stages: [{ id: "b", valve: { kind: "boost", setpointPa: Math.min(c.secondaryPsi, c.peakPsi) * PA_PER_PSI }, target: { kind: "lambda", from: c.from, to: c.from - c.step }, mode: "full", maxHoles: 4 }] };
          const plan = planConversion({ engine: e, blocks: [p, s], drills: ALL_DRILLS });
          for (const stage of plan.blocks.flatMap((b) => b.stages)) {
            const miss = Math.abs(stage.achievedLambda / stage.targetLambda - 1);
            if (miss > 0.05) expect(plan.warnings.some((w) => w.stageId === stage.stageId && w.code === "stage_off_target")).toBe(true);
          }
          const { sweep } = plan.staging;
          for (const mode of ["part", "full"] as const) {
            sweep.gaugePa.forEach((g, i) => {
              // Leaner than the band under boost: some lean warning must cover that pressure.
              if (g > 0 && sweep[mode].ratio[i]! < 0.95) {
                expect(plan.warnings.some((w) => w.code === "lean_under_boost" && w.message.startsWith(mode === "part" ? "Part" : "Full"))).toBe(true);
              }
            });
          }
        },
      ),
      { numRuns: 150 },
    );
  });
});
