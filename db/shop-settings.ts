import "server-only";
import { eq } from "drizzle-orm";
import {
  DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL,
  DEFAULT_MIN_WEB_M,
  DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL,
  restrictionDrillLimits,
} from "@/lib/engineering/restriction-limits";
import { recordAudit } from "./audit";
import { getDb } from "./client";
import { shopSettings } from "./schema";

// The shop's restriction limits: one row (id 1); a missing row or an empty column means the default of
// lib/engineering/restriction-limits.

const SETTINGS_ID = 1;

/** What the shop set, null where it keeps the default. */
export interface ShopSettingsInput {
  smallestRestrictionDrill: string | null;
  largestRestrictionDrill: string | null;
  minWebM: number | null;
}

/** The values in force, defaults applied, and which of them are the defaults. */
export interface ShopSettingsView {
  smallestRestrictionDrill: string;
  largestRestrictionDrill: string;
  minWebM: number;
  isDefault: { smallestRestrictionDrill: boolean; largestRestrictionDrill: boolean; minWebM: boolean };
}

function view(stored: ShopSettingsInput): ShopSettingsView {
  return {
    smallestRestrictionDrill: stored.smallestRestrictionDrill ?? DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL,
    largestRestrictionDrill: stored.largestRestrictionDrill ?? DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL,
    minWebM: stored.minWebM ?? DEFAULT_MIN_WEB_M,
    isDefault: {
      smallestRestrictionDrill: stored.smallestRestrictionDrill === null,
      largestRestrictionDrill: stored.largestRestrictionDrill === null,
      minWebM: stored.minWebM === null,
    },
  };
}

const columns = {
  smallestRestrictionDrill: shopSettings.minRestrictionDrillLabel,
  largestRestrictionDrill: shopSettings.maxRestrictionDrillLabel,
  minWebM: shopSettings.minWebM,
};

export async function getShopSettings(): Promise<ShopSettingsView> {
  const [row] = await getDb().select(columns).from(shopSettings).where(eq(shopSettings.id, SETTINGS_ID));
  return view(row ?? { smallestRestrictionDrill: null, largestRestrictionDrill: null, minWebM: null });
}

/**
 * Saves the shop's limits with an audit line of before and after, in one transaction. Throws a RangeError
 * naming the setting for a label that is no standard drill or a smallest drill above the largest (the form
 * refuses both first).
 */
export async function updateShopSettings(actorId: string, input: ShopSettingsInput): Promise<ShopSettingsView> {
  const after = view(input);
  restrictionDrillLimits({ smallestDrillLabel: after.smallestRestrictionDrill, largestDrillLabel: after.largestRestrictionDrill });
  if (!(input.minWebM === null || (Number.isFinite(input.minWebM) && input.minWebM >= 0))) {
    throw new RangeError(`minWebM must be zero or a positive number, got ${input.minWebM}`);
  }
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select(columns).from(shopSettings).where(eq(shopSettings.id, SETTINGS_ID)).for("update");
    const values = {
      minRestrictionDrillLabel: input.smallestRestrictionDrill,
      maxRestrictionDrillLabel: input.largestRestrictionDrill,
      minWebM: input.minWebM,
      updatedAt: new Date(),
    };
    await tx
      .insert(shopSettings)
      .values({ id: SETTINGS_ID, ...values })
      .onConflictDoUpdate({ target: shopSettings.id, set: values });
    await recordAudit(tx, actorId, "shop-settings.update", String(SETTINGS_ID), { before: before ?? null, after: input }, "shop-settings");
    return after;
  });
}

/** Dyno-log reading: full throttle above this throttle opening, and the manifold-pressure bin width. */
export interface LogSettings {
  fullThrottleAbovePct: number;
  binWidthPa: number;
  isDefault: { fullThrottleAbovePct: boolean; binWidthPa: boolean };
}

export async function getLogSettings(defaults: { fullThrottleAbovePct: number; binWidthPa: number }): Promise<LogSettings> {
  const [row] = await getDb()
    .select({ fullThrottleAbovePct: shopSettings.fullThrottleAbovePct, binWidthPa: shopSettings.logBinWidthPa })
    .from(shopSettings)
    .where(eq(shopSettings.id, SETTINGS_ID));
  return {
    fullThrottleAbovePct: row?.fullThrottleAbovePct ?? defaults.fullThrottleAbovePct,
    binWidthPa: row?.binWidthPa ?? defaults.binWidthPa,
    isDefault: { fullThrottleAbovePct: row?.fullThrottleAbovePct == null, binWidthPa: row?.binWidthPa == null },
  };
}

/** Saves the dyno-log settings (null: the default), with an audit line of before and after. */
export async function updateLogSettings(actorId: string, input: { fullThrottleAbovePct: number | null; binWidthPa: number | null }): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [before] = await tx
      .select({ fullThrottleAbovePct: shopSettings.fullThrottleAbovePct, binWidthPa: shopSettings.logBinWidthPa })
      .from(shopSettings)
      .where(eq(shopSettings.id, SETTINGS_ID))
      .for("update");
    const values = { fullThrottleAbovePct: input.fullThrottleAbovePct, logBinWidthPa: input.binWidthPa, updatedAt: new Date() };
    await tx
      .insert(shopSettings)
      .values({ id: SETTINGS_ID, ...values })
      .onConflictDoUpdate({ target: shopSettings.id, set: values });
    await recordAudit(tx, actorId, "shop-settings.logs", String(SETTINGS_ID), { before: before ?? null, after: input }, "shop-settings");
  });
}
