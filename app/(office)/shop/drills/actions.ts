"use server";

import { revalidatePath } from "next/cache";
import { setDrillStocked, setSystemStocked } from "@/db/drill-stock";
import { updateLogSettings, updateShopSettings } from "@/db/shop-settings";
import { toSI } from "@/lib/engineering/units";
import { runFormAction, type FormResult } from "@/lib/forms/form-action";
import { drillStockSchema, drillSystemStockSchema, logSettingsSchema, shopLimitsSchema } from "./schema";

// Only an admin changes the rack and the restriction limits. The solver reads both afresh for every plan, so
// nothing else is refreshed.

export async function setDrillStockedAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: drillStockSchema,
    roles: ["admin"],
    async work({ label, stocked }, user) {
      await setDrillStocked(user.id, label, stocked);
      revalidatePath("/shop/drills");
      return stocked ? `${label} is on the rack.` : `${label} is off the rack.`;
    },
  });
}

export async function setDrillSystemStockedAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: drillSystemStockSchema,
    roles: ["admin"],
    async work({ system, stocked }, user) {
      const count = await setSystemStocked(user.id, system, stocked);
      revalidatePath("/shop/drills");
      return stocked ? `All ${count} ${system} drills are on the rack.` : `The ${system} drills are off the rack.`;
    },
  });
}

export async function saveShopLimitsAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: shopLimitsSchema,
    roles: ["admin"],
    resetForm: false,
    async work({ smallestRestrictionDrill, largestRestrictionDrill, minWeb }, user) {
      await updateShopSettings(user.id, {
        smallestRestrictionDrill: smallestRestrictionDrill ?? null,
        largestRestrictionDrill: largestRestrictionDrill ?? null,
        minWebM: minWeb === undefined ? null : toSI("length", minWeb.value, minWeb.unit),
      });
      revalidatePath("/shop/drills");
      return "Restriction limits saved. Plans solved from now on keep to them.";
    },
  });
}

export async function saveLogSettingsAction(_previous: FormResult | undefined, formData: FormData): Promise<FormResult> {
  return runFormAction(formData, {
    schema: logSettingsSchema,
    roles: ["admin"],
    resetForm: false,
    async work({ fullThrottleAbovePct, binWidth }, user) {
      await updateLogSettings(user.id, {
        fullThrottleAbovePct: fullThrottleAbovePct ?? null,
        binWidthPa: binWidth === undefined ? null : toSI("pressure", binWidth.value, binWidth.unit),
      });
      revalidatePath("/shop/drills");
      return "Log settings saved. Logs read from now on use them.";
    },
  });
}
