// The shop's restriction limits on the drill rack page: an admin saves them through the action, everyone in
// the office reads them with the defaults filled in, and what is saved is what the solver keeps to.
import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { saveShopLimitsAction } from "@/app/(office)/shop/drills/actions";
import { getShopSettings } from "@/db/shop-settings";
import * as schema from "@/db/schema";
import { ALL_DRILLS } from "@/lib/engineering/drills";
import { solveHoleLayout } from "@/lib/engineering/hole-layout";
import { restrictionDrillLimits } from "@/lib/engineering/restriction-limits";
import { actAs, formData, resetDatabase, testDb } from "./support/database";

beforeEach(resetDatabase);

// inch = 0.0254 m exactly (NIST SP 811, B.8).
const M_PER_IN = 0.0254;

const save = (fields: { smallest?: string; largest?: string; web?: string; unit?: string }) =>
  saveShopLimitsAction(
    undefined,
    formData({
      smallestRestrictionDrill: fields.smallest ?? "",
      largestRestrictionDrill: fields.largest ?? "",
      "minWeb.value": fields.web ?? "",
      "minWeb.unit": fields.unit ?? "in",
    }),
  );

async function savedRows() {
  const settings = await testDb.select().from(schema.shopSettings);
  const audit = await testDb.select().from(schema.auditEvents).where(eq(schema.auditEvents.action, "shop-settings.update"));
  return { settings, audit };
}

describe("getShopSettings", () => {
  it("answers the defaults before the shop has set anything", async () => {
    const settings = await getShopSettings();
    // Common practice, no published source: #70 to 1/8, 0.020 in of web.
    expect(settings.smallestRestrictionDrill).toBe("#70");
    expect(settings.largestRestrictionDrill).toBe("1/8");
    expect(settings.minWebM / M_PER_IN).toBeCloseTo(0.02, 12);
    expect(settings.isDefault).toEqual({ smallestRestrictionDrill: true, largestRestrictionDrill: true, minWebM: true });
  });
});

describe("saveShopLimitsAction", () => {
  it("saves an admin's limits with an audit line, and the solver keeps to them", async () => {
    const adminId = await actAs("admin");
    const result = await save({ smallest: "#60", largest: "3/32", web: "0.030", unit: "in" });
    expect(result.httpStatus).toBe(200);
    const settings = await getShopSettings();
    expect(settings).toMatchObject({ smallestRestrictionDrill: "#60", largestRestrictionDrill: "3/32" });
    expect(settings.minWebM / M_PER_IN).toBeCloseTo(0.03, 12);
    expect(settings.isDefault).toEqual({ smallestRestrictionDrill: false, largestRestrictionDrill: false, minWebM: false });
    const { audit } = await savedRows();
    expect(audit).toHaveLength(1);
    expect(audit[0]?.actorId).toBe(adminId);

    // ASME B94.11M: #60 = 0.0400 in, 3/32 = 0.09375 in. A tiny target gets one #60 hole, a huge one 4 x 3/32.
    const limits = restrictionDrillLimits({
      system: "inch",
      smallestDrillLabel: settings.smallestRestrictionDrill,
      largestDrillLabel: settings.largestRestrictionDrill,
    });
    const tiny = solveHoleLayout({ targetEffectiveAreaM2: 1e-8, drills: ALL_DRILLS, maxHoles: 4, limits, minWebM: settings.minWebM });
    expect(tiny.candidates[0]?.drill.label).toBe("#60");
    expect(tiny.limitedBy).toBe("smallest-drill");
    const huge = solveHoleLayout({ targetEffectiveAreaM2: 1e-4, drills: ALL_DRILLS, maxHoles: 4, limits, minWebM: settings.minWebM });
    expect(`${huge.candidates[0]?.count}x${huge.candidates[0]?.drill.label}`).toBe("4x3/32");
  });

  it("takes the least web in millimetres and returns a limit to its default when the box is emptied", async () => {
    await actAs("admin");
    expect((await save({ smallest: "0.75 mm", web: "0.5", unit: "mm" })).httpStatus).toBe(200);
    let settings = await getShopSettings();
    // 0.5 mm = 0.0005 m.
    expect(settings.minWebM).toBeCloseTo(0.0005, 12);
    expect(settings.smallestRestrictionDrill).toBe("0.75 mm");
    expect(settings.isDefault.largestRestrictionDrill).toBe(true);
    expect((await save({})).httpStatus).toBe(200);
    settings = await getShopSettings();
    expect(settings.isDefault).toEqual({ smallestRestrictionDrill: true, largestRestrictionDrill: true, minWebM: true });
    const { settings: rows, audit } = await savedRows();
    expect(rows).toHaveLength(1);
    expect(audit).toHaveLength(2);
  });

  it("answers 400 naming the field for a drill that is not standard, a smallest above the largest and a negative web, saving nothing", async () => {
    await actAs("admin");
    const unknown = await save({ smallest: "#99" });
    expect(unknown.httpStatus).toBe(400);
    expect(Object.keys(unknown.error ?? {})).toEqual(["smallestRestrictionDrill"]);
    expect(unknown.error?.smallestRestrictionDrill?.[0]).toMatch(/smallest restriction drill/);
    const unknownLargest = await save({ largest: "1/8 banana" });
    expect(Object.keys(unknownLargest.error ?? {})).toEqual(["largestRestrictionDrill"]);
    const crossed = await save({ smallest: "1/8", largest: "#70" });
    expect(crossed.httpStatus).toBe(400);
    expect(crossed.error?.smallestRestrictionDrill?.[0]).toBe("The smallest restriction drill (1/8) must not be larger than the largest (#70).");
    // ASME B94.11M: 5/32 = 0.15625 in, above the default largest drill, 1/8.
    const aboveDefault = await save({ smallest: "5/32" });
    expect(aboveDefault.httpStatus).toBe(400);
    expect(Object.keys(aboveDefault.error ?? {})).toEqual(["smallestRestrictionDrill"]);
    const negative = await save({ web: "-0.01" });
    expect(negative.httpStatus).toBe(400);
    expect(Object.keys(negative.error ?? {})).toEqual(["minWeb.value"]);
    expect(await savedRows()).toEqual({ settings: [], audit: [] });
  });

  it("lets only an admin change the limits, refusing before it reads the form", async () => {
    for (const [actor, status] of [
      ["anonymous", 401],
      ["machinist", 403],
      ["tuner", 403],
    ] as const) {
      await actAs(actor);
      expect((await save({ smallest: "#60" })).httpStatus, actor).toBe(status);
      const badForm = await save({ smallest: "#99" });
      expect(badForm.httpStatus, `${actor}, bad form`).toBe(status);
      expect(Object.keys(badForm.error ?? {}), `${actor}, bad form`).toEqual([""]);
    }
    expect(await savedRows()).toEqual({ settings: [], audit: [] });
  });
});
