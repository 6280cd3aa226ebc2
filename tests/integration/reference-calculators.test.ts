// The reference calculators' server actions, posted as the browser posts their forms: results against
// published or hand-worked figures, and bad input answered 400 with the field named.
import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { setLengthUnitAction } from "@/app/(office)/reference/actions";
import { grindPlanAction } from "@/app/(office)/reference/calculators/grind/actions";
import { pickupTubeAction } from "@/app/(office)/reference/calculators/pickup-tube/actions";
import { restrictionAction } from "@/app/(office)/reference/calculators/restriction/actions";
import { stagingAction } from "@/app/(office)/reference/calculators/staging/actions";
import { passagePlugAction, tapDrillAction } from "@/app/(office)/reference/calculators/tap-drill/actions";
import * as schema from "@/db/schema";
import type { FormResult } from "@/lib/forms/form-action";
import { actAs, formData, resetDatabase, testDb } from "./support/database";
import { nestedFormData } from "./support/form-fields";
import {
  GRIND_FORM,
  PASSAGE_PLUG_FORM,
  PICKUP_TUBE_FORM,
  RESTRICTION_FORM,
  STAGING_FORM,
  TAP_DRILL_FORM,
  withFields,
  type Fields,
} from "./support/reference-forms";

// NIST SP 811 (2008), B.8: 1 psi = 6894.757 Pa; standard atmosphere 101 325 Pa = 14.69595 psi.
const ATMOSPHERE_PSI = 101325 / 6894.757;

type Action<Data> = (previous: FormResult<Data> | undefined, data: FormData) => Promise<FormResult<Data>>;

async function run<Data>(action: Action<Data>, form: Fields): Promise<FormResult<Data>> {
  return action(undefined, nestedFormData(form));
}

async function ok<Data>(action: Action<Data>, form: Fields): Promise<Data> {
  const result = await run(action, form);
  expect(result.httpStatus, JSON.stringify(result.error)).toBe(200);
  expect(result.data).toBeDefined();
  return result.data as Data;
}

/** 400, with an error on the named field (Conform's name, as the form's input carries it). */
async function refused<Data>(action: Action<Data>, form: Fields, field: string) {
  const result = await run(action, form);
  expect(result.httpStatus, field).toBe(400);
  expect(Object.keys(result.error ?? {}), field).toContain(field);
  expect(result.error?.[field]?.join(" ").length, field).toBeGreaterThan(0);
  return result;
}

beforeEach(async () => {
  await resetDatabase();
  await actAs("machinist");
});

describe("setLengthUnitAction", () => {
  it("remembers the unit for the signed-in user", async () => {
    const id = await actAs("tuner");
    expect((await setLengthUnitAction(undefined, formData({ lengthUnit: "mm" }))).httpStatus).toBe(200);
    const [row] = await testDb.select({ unit: schema.users.lengthUnit }).from(schema.users).where(eq(schema.users.id, id!));
    expect(row?.unit).toBe("mm");
  });

  it("names the field for a unit it does not know", async () => {
    const result = await setLengthUnitAction(undefined, formData({ lengthUnit: "cubits" }));
    expect(result.httpStatus).toBe(400);
    expect(Object.keys(result.error ?? {})).toContain("lengthUnit");
  });
});

describe("tapDrillAction", () => {
  it("gives #43 for 4-40 at 75 % and keeps the entered values", async () => {
    const result = await run(tapDrillAction, TAP_DRILL_FORM);
    expect(result.httpStatus).toBe(200);
    expect(result.data?.drill.label).toBe("#43"); // handbook tap-drill table: 4-40 -> #43
    // (0.112 - 0.089) / (1.299038 x 0.025) x 100 = 70.82 %
    expect(result.data?.engagementPct).toBeCloseTo(70.82, 1);
    expect(result.data?.closeClearance.label).toBe("#32"); // shop tap-drill charts: #4 close fit #32 (from memory)
    expect(result.initialValue).toMatchObject({ thread: "4-40", engagement: "75" });
  });

  it("names the field that is wrong", async () => {
    await refused(tapDrillAction, { thread: "", engagement: "75" }, "thread");
    await refused(tapDrillAction, { thread: "4-41", engagement: "75" }, "thread");
    await refused(tapDrillAction, { thread: "4-40", engagement: "0" }, "engagement");
    await refused(tapDrillAction, { thread: "4-40", engagement: "lots" }, "engagement");
    // ASME B1.1: a drill at the basic minor diameter D - 1.082532 P gives 1.082532 / 1.299038 = 83.3 %
    await refused(tapDrillAction, { thread: "4-40", engagement: "100" }, "engagement");
    await refused(tapDrillAction, { thread: "4-40", engagement: "84" }, "engagement");
  });
});

describe("passagePlugAction", () => {
  it("plugs a 0.087 in passage with 4-40 and a #43 drill", async () => {
    const plug = await ok(passagePlugAction, PASSAGE_PLUG_FORM);
    // #3-48 (0.099 in): the drills that clean up 0.087 in (#43 0.089 and up) give at most
    // (0.099 - 0.089) / (1.299038 / 48) = 37 %, under the 60 % band; #4-40 with #43 gives 70.8 %.
    expect(plug.thread.label).toBe("#4-40 UNC");
    expect(plug.drill.label).toBe("#43");
    // Tap depth 1.5 x 0.112 = 0.168 in; drill depth 0.168 + 3 x 0.025 = 0.243 in.
    expect(plug.tapDepth.in).toBeCloseTo(0.168, 6);
    expect(plug.drillDepth.in).toBeCloseTo(0.243, 6);
    // Wall left: 0.060 - (0.112 - 0.087) / 2 = 0.0475 in.
    expect(plug.remainingWall.in).toBeCloseTo(0.0475, 6);
    // Set screw no longer than 0.168 - 0.025 = 0.143 in: of the stocked 1/8 and 5/32 in, 1/8 in.
    expect(plug.setScrew?.label).toBe("#4-40 UNC x 1/8 in");
    expect(plug.warnings).toEqual([]);
  });

  it("answers 422 when no thread in the tables plugs the passage", async () => {
    // A 0.500 in passage: the largest Unified thread, 1/2-20, needs a drill of at most
    // 0.500 - 0.6 x 1.299038 / 20 = 0.4610 in for 60 % engagement (ASME B1.1 sizes), so none cleans it up.
    const result = await run(passagePlugAction, withFields(PASSAGE_PLUG_FORM, { "passage.value": "0.500", "passage.unit": "in" }));
    expect(result.httpStatus).toBe(422);
    expect(result.data).toBeUndefined();
    expect(result.error?.[""]?.join(" ")).toMatch(/0\.5000 in passage.*too large/);
  });

  it("names the field that is wrong", async () => {
    await refused(passagePlugAction, withFields(PASSAGE_PLUG_FORM, { engagement: "90" }), "engagement");
    await refused(passagePlugAction, withFields(PASSAGE_PLUG_FORM, { "passage.value": "" }), "passage.value");
    await refused(passagePlugAction, withFields(PASSAGE_PLUG_FORM, { "passage.unit": "furlong" }), "passage.unit");
    await refused(passagePlugAction, withFields(PASSAGE_PLUG_FORM, { "wall.value": "-1" }), "wall.value");
    await refused(passagePlugAction, withFields(PASSAGE_PLUG_FORM, { threadSystem: "whitworth" }), "threadSystem");
  });
});

describe("restrictionAction", () => {
  it("finds two #52 holes for the area of two #52 holes", async () => {
    // ASME B94.11M: #52 = 0.0635 in; 2 x pi/4 x 0.0635^2 = 0.0063338 in2
    const result = await ok(restrictionAction, RESTRICTION_FORM);
    expect(result.candidates[0]).toMatchObject({ count: 2, drill: { label: "#52" }, fits: true, valveLimited: false });
    expect(Math.abs(result.candidates[0]!.errorPct)).toBeLessThan(0.01);
  });

  it("turns an AFR change into a target area over the main jets", async () => {
    const result = await ok(restrictionAction, {
      ...RESTRICTION_FORM,
      targetKind: "afr",
      afrBefore: "13.0",
      afrAfter: "12.0",
      mainJet: { value: "0.080", unit: "in" },
      mainJetCount: "2",
    });
    // Extra fuel 13.0 / 12.0 - 1 = 8.333 %; main jets 2 x pi/4 x 0.080^2 = 0.0100531 in2;
    // target 0.0833333 x 0.0100531 = 0.00083776 in2.
    expect(result.enrichmentPct).toBeCloseTo(8.333, 2);
    expect(result.target.in2).toBeCloseTo(0.00083776, 7);
  });

  it("names the field that is wrong", async () => {
    await refused(restrictionAction, withFields(RESTRICTION_FORM, { "targetArea.value": "" }), "targetArea.value");
    await refused(restrictionAction, withFields(RESTRICTION_FORM, { maxHoles: "5" }), "maxHoles");
    await refused(restrictionAction, withFields(RESTRICTION_FORM, { "channelLength.value": "0" }), "channelLength.value");
    await refused(restrictionAction, { ...RESTRICTION_FORM, targetKind: "afr", afrBefore: "12", afrAfter: "13", mainJet: { value: "0.08", unit: "in" }, mainJetCount: "2" }, "afrAfter");
    await refused(restrictionAction, { ...RESTRICTION_FORM, targetKind: "percent", percent: "10" }, "mainJet.value");
  });
});

describe("grindPlanAction", () => {
  it("plans the depth in equal light passes with clay checks", async () => {
    const plan = await ok(grindPlanAction, GRIND_FORM);
    // 0.060 + 0.020 - 0.010 = 0.070 in; 0.070 / 0.015 = 4.67 -> 5 passes of 0.014 in;
    // clay after every 2nd pass and the last: passes 2, 4 and 5.
    expect(plan.ok).toBe(true);
    expect(plan.depth.in).toBeCloseTo(0.07, 9);
    expect(plan.passes).toHaveLength(5);
    expect(plan.passes[0]!.depth.in).toBeCloseTo(0.014, 9);
    expect(plan.passes.filter((p) => p.clayCheck).map((p) => p.pass)).toEqual([2, 4, 5]);
    // Wall left 0.250 - 0.070 = 0.180 in.
    expect(plan.remainingWall.in).toBeCloseTo(0.18, 9);
  });

  it("says stop when the wall cannot spare the depth", async () => {
    // Spare 0.150 - 0.120 = 0.030 in < 0.070 in.
    const plan = await ok(grindPlanAction, withFields(GRIND_FORM, { "wall.value": "0.150" }));
    expect(plan.ok).toBe(false);
    expect(plan.stopReason).toMatch(/do not grind/);
  });

  it("names the field that is wrong", async () => {
    await refused(grindPlanAction, withFields(GRIND_FORM, { "perPass.value": "0" }), "perPass.value");
    await refused(grindPlanAction, withFields(GRIND_FORM, { "clayGap.value": "" }), "clayGap.value");
    await refused(grindPlanAction, withFields(GRIND_FORM, { clayEvery: "1.5" }), "clayEvery");
  });
});

describe("pickupTubeAction", () => {
  it("adds the runs, the bend's arc and the swage", async () => {
    const tube = await ok(pickupTubeAction, PICKUP_TUBE_FORM);
    // 1.0 + 0.75 + 0.5 x pi/2 + 0.25 = 1.75 + 0.785398 + 0.25 = 2.785398 in
    expect(tube.cutLength.in).toBeCloseTo(2.785398, 5);
    // Reach rearward 1.0 + 0.5 (the bend's radius) + 0.3125 / 2 = 1.65625 in; down 0.5 + 0.75 + 0.15625 = 1.40625 in.
    expect(tube.reachRearward.in).toBeCloseTo(1.65625, 5);
    expect(tube.reachDownward.in).toBeCloseTo(1.40625, 5);
    expect(tube.fitsBowl).toBe(true);
  });

  it("says the tube does not fit when it reaches past the room the bowl leaves", async () => {
    // Reach 1.65625 in rearward and 1.40625 in down (worked above): 1.6 in of room rearward is exceeded,
    // 1.5 in downward is not.
    const tube = await ok(
      pickupTubeAction,
      withFields(PICKUP_TUBE_FORM, { "maxRearward.value": "1.6", "maxDownward.value": "1.5" }),
    );
    expect(tube.fitsBowl).toBe(false);
    expect(tube.exceeds).toEqual(["rearward"]);
    const roomy = await ok(pickupTubeAction, withFields(PICKUP_TUBE_FORM, { "maxRearward.value": "1.7", "maxDownward.value": "1.5" }));
    expect(roomy.fitsBowl).toBe(true);
  });

  it("names the field that is wrong", async () => {
    await refused(pickupTubeAction, withFields(PICKUP_TUBE_FORM, { "maxDownward.value": "-1" }), "maxDownward.value");
    await refused(pickupTubeAction, withFields(PICKUP_TUBE_FORM, { bendAngle: "200" }), "bendAngle");
    await refused(pickupTubeAction, withFields(PICKUP_TUBE_FORM, { "thirdRun.value": "0.5" }), "secondBendAngle");
    // A bend tighter than the tube's own radius is refused by the computation, on the radius.
    await refused(pickupTubeAction, withFields(PICKUP_TUBE_FORM, { "radius.value": "0.1" }), "radius.value");
  });
});

describe("stagingAction", () => {
  it("charts a lean zone under boost when only the vacuum valve enriches", async () => {
    // Charge at the ambient temperature, one target: needed area grows as sqrt(P_abs / P_atm) under boost.
    // At 10 psi the mixture ratio is 1 / sqrt((14.69595 + 10) / 14.69595) = 1 / sqrt(1.680454) = 0.77142.
    const result = await ok(stagingAction, {
      ...STAGING_FORM,
      valves: [{ kind: "vacuum", side: "primary", opening: { value: "6.5", unit: "inHg" }, area: { value: "0.0020", unit: "in²" } }],
      targetPeak: "12.5",
      peakBoost: { value: "10", unit: "psi" },
      chargeTemperature: { value: "77", unit: "°F" },
    });
    const peak = result.chart.points.at(-1)!;
    expect(peak.psi).toBeCloseTo(10, 3);
    expect(peak.full.ratio).toBeCloseTo(1 / Math.sqrt((ATMOSPHERE_PSI + 10) / ATMOSPHERE_PSI), 4);
    expect(result.chart.zones.some((z) => z.kind === "lean" && z.mode === "full" && z.toPsi === 10)).toBe(true);
    // The chart starts at 20 inHg of vacuum: 20 x 3386.389 / 6894.757 = 9.8231 psi below the atmosphere.
    expect(result.chart.fromPsi).toBeCloseTo(-9.8231, 3);
    expect(result.chart.valves).toMatchObject([{ mark: "1", kind: "vacuum", openingText: "6.5 inHg vacuum" }]);
    // Under vacuum the valve is shut and only the mains meter: lean from the start of the chart up to the
    // valve's rating, 6.5 x 3386.389 / 6894.757 = 3.1925 psi below the atmosphere (NIST SP 811 factors).
    const underVacuum = result.chart.zones.find((z) => z.mode === "part" && z.kind === "lean" && z.fromPsi < 0);
    expect(underVacuum?.fromPsi).toBeCloseTo(-9.8231, 3);
    expect(underVacuum?.toPsi).toBeCloseTo(-3.1925, 3);
  });

  it("balances the sides stage by stage", async () => {
    const result = await ok(stagingAction, STAGING_FORM);
    // Mains: primary 2 x pi/4 x 0.076^2 = 0.0090729 in2. Stages: vacuum (primary 0.0020), 3 psi (primary 0.0015),
    // 8 psi (secondary 0.0030): primary share after the last = 0.0035 / 0.0065 = 53.8 %;
    // primary enrichment 0.0035 / 0.0090729 = 38.58 %.
    const last = result.balance.stages.at(-1)!;
    expect(result.balance.stages.map((s) => s.marks)).toEqual([["1"], ["2"], ["3"]]);
    expect(last.primarySharePct).toBeCloseTo(53.846, 2);
    expect(last.primaryEnrichmentPct).toBeCloseTo(38.58, 1);
    expect(result.balance.secondaryFirst).toBe(false);
  });

  it("proposes boost-valve setpoints within the boost range", async () => {
    const result = await ok(stagingAction, { ...STAGING_FORM, command: "propose", proposeValves: "2" });
    expect(result.proposal?.valves).toHaveLength(2);
    for (const valve of result.proposal!.valves) {
      expect(valve.setpointPsi).toBeGreaterThan(0);
      expect(valve.setpointPsi).toBeLessThanOrEqual(12);
    }
    // The vacuum valve stays; the two proposed valves follow it on the chart.
    expect(result.chart.valves.map((v) => v.mark)).toEqual(["1", "2", "3"]);
    expect(result.proposal!.valves.map((v) => v.side)).toEqual(["primary", "secondary"]);
  });

  it("names the field that is wrong", async () => {
    await refused(stagingAction, withFields(STAGING_FORM, { "primaryJet.value": "" }), "primaryJet.value");
    await refused(stagingAction, withFields(STAGING_FORM, { "valves.1.opening.value": "-3" }), "valves[1].opening.value");
    await refused(stagingAction, withFields(STAGING_FORM, { "valves.1.opening.unit": "inHg" }), "valves[1].opening.unit");
    await refused(stagingAction, withFields(STAGING_FORM, { targetScale: "lambda" }), "targetAtmosphere");
    await refused(stagingAction, withFields(STAGING_FORM, { proposeValves: "9" }), "proposeValves");
    const cooler = await run(stagingAction, withFields(STAGING_FORM, { "chargeTemperature.value": "40" }));
    expect(cooler.httpStatus).toBe(400);
    expect(Object.keys(cooler.error ?? {})).toContain("chargeTemperature.value");
  });
});

describe("every calculator refuses absurd figures, naming the field", () => {
  /** Dotted names of the form's number boxes: `value` halves of quantities and the plain numbers. */
  function numberBoxes(form: Fields, prefix = ""): string[] {
    return Object.entries(form).flatMap(([key, value]) => {
      const name = prefix ? `${prefix}.${key}` : key;
      if (value !== null && typeof value === "object") return numberBoxes(value as Fields, name);
      if (typeof value === "string" && (key === "value" || /^-?\d*\.?\d*$/.test(value))) return [name];
      return [];
    });
  }
  const forms = [
    ["tapDrillAction", tapDrillAction, TAP_DRILL_FORM],
    ["passagePlugAction", passagePlugAction, PASSAGE_PLUG_FORM],
    ["restrictionAction", restrictionAction, { ...RESTRICTION_FORM, afrBefore: "13", afrAfter: "12", percent: "10" }],
    ["grindPlanAction", grindPlanAction, GRIND_FORM],
    ["pickupTubeAction", pickupTubeAction, PICKUP_TUBE_FORM],
    ["stagingAction", stagingAction, STAGING_FORM],
  ] as const;

  for (const [name, action, form] of forms) {
    it(`${name}: 1e308, 5e-324, Infinity and NaN in every number box`, async () => {
      const boxes = numberBoxes(form as Fields);
      expect(boxes.length).toBeGreaterThan(0);
      for (const box of boxes) {
        for (const figure of ["1e308", "5e-324", "Infinity", "NaN", "-1e308"]) {
          const result = await run(action as Action<unknown>, withFields(form as Fields, { [box]: figure }));
          expect(result.httpStatus, `${box} = ${figure}`).toBe(400);
          // Conform names list items with brackets: valves.0.opening.value is valves[0].opening.value
          expect(Object.keys(result.error ?? {}), `${box} = ${figure}`).toContain(box.replace(/\.(\d+)/g, "[$1]"));
        }
      }
    });
  }

  it("says to check the unit for a length no carburetor job needs", async () => {
    // 50 in of passage diameter is beyond the 40 in any calculator takes (our own limit)
    const result = await refused(passagePlugAction, withFields(PASSAGE_PLUG_FORM, { "passage.value": "50" }), "passage.value");
    expect(result.error?.["passage.value"]?.join(" ")).toMatch(/check the unit/);
    // 0.0002 mm is under the 0.001 mm a shop measures
    await refused(grindPlanAction, withFields(GRIND_FORM, { "perPass.value": "0.0002", "perPass.unit": "mm" }), "perPass.value");
  });

  it("refuses a depth per pass that would take more than 100 passes, on that field", async () => {
    // 0.060 + 0.020 - 0.010 = 0.070 in to remove; at 0.0005 in a pass that is 140 passes (limit 100, our own)
    const result = await refused(grindPlanAction, withFields(GRIND_FORM, { "perPass.value": "0.0005" }), "perPass.value");
    expect(result.error?.["perPass.value"]?.join(" ")).toMatch(/140 passes/);
  });
});
