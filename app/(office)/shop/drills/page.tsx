import type { Metadata } from "next";
import { listStockedLabels } from "@/db/drill-stock";
import { getLogSettings, getShopSettings } from "@/db/shop-settings";
import { DEFAULT_BIN_WIDTH_PA } from "@/lib/engineering/log-bins";
import { DEFAULT_FULL_THROTTLE_ABOVE_PCT } from "@/lib/engineering/steady-readings";
import { LogSettings, type LogSettingsValues } from "./log-settings-form";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { fixed } from "@/lib/format/display";
import { ALL_DRILLS, findDrill } from "@/lib/engineering/drills";
import {
  DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL,
  DEFAULT_MIN_WEB_M,
  DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL,
} from "@/lib/engineering/restriction-limits";
import type { DrillSystem } from "@/lib/engineering/types";
import { M_PER_IN, M_PER_MM, PA_PER_PSI } from "@/lib/engineering/unit-factors";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { DrillRack, type RackGroup } from "./drill-rack";
import { ShopLimits, type ShopLimitsValues } from "./limits-form";
import { RACK_SYSTEMS } from "./schema";

export const metadata: Metadata = { title: "Drill rack" };

const TITLES: Record<DrillSystem, string> = {
  number: "Number drills",
  letter: "Letter drills",
  fraction: "Fractional drills",
  metric: "Metric drills",
};

export default async function DrillRackPage() {
  const user = await requireRole(OFFICE_ROLES, "/shop/drills");
  const [stocked, settings, logs] = await Promise.all([
    listStockedLabels(),
    getShopSettings(),
    getLogSettings({ fullThrottleAbovePct: DEFAULT_FULL_THROTTLE_ABOVE_PCT, binWidthPa: DEFAULT_BIN_WIDTH_PA }),
  ]);
  const psiText = (pa: number) => `${fixed(pa / PA_PER_PSI, 2)} psi`;
  const logValues: LogSettingsValues = {
    fullThrottleAbovePct: {
      shown: `${logs.fullThrottleAbovePct} %`,
      stored: logs.isDefault.fullThrottleAbovePct ? "" : String(logs.fullThrottleAbovePct),
      isDefault: logs.isDefault.fullThrottleAbovePct,
    },
    binWidth: {
      shown: psiText(logs.binWidthPa),
      stored: logs.isDefault.binWidthPa ? "" : String(Number((logs.binWidthPa / PA_PER_PSI).toPrecision(6))),
      isDefault: logs.isDefault.binWidthPa,
    },
    defaults: { fullThrottleAbovePct: `${DEFAULT_FULL_THROTTLE_ABOVE_PCT} %`, binWidth: psiText(DEFAULT_BIN_WIDTH_PA) },
  };
  const number = (lengthM: number) => (user.lengthUnit === "mm" ? fixed(lengthM / M_PER_MM, 3) : fixed(lengthM / M_PER_IN, 4));
  const size = (diameterM: number) => `${number(diameterM)} ${user.lengthUnit}`;
  const drillShown = (label: string) => {
    const drill = findDrill(label);
    return drill ? `${label} (${size(drill.diameterM)})` : label;
  };
  const limits: ShopLimitsValues = {
    smallestRestrictionDrill: {
      shown: drillShown(settings.smallestRestrictionDrill),
      isDefault: settings.isDefault.smallestRestrictionDrill,
      stored: settings.isDefault.smallestRestrictionDrill ? "" : settings.smallestRestrictionDrill,
    },
    largestRestrictionDrill: {
      shown: drillShown(settings.largestRestrictionDrill),
      isDefault: settings.isDefault.largestRestrictionDrill,
      stored: settings.isDefault.largestRestrictionDrill ? "" : settings.largestRestrictionDrill,
    },
    minWeb: {
      shown: size(settings.minWebM),
      isDefault: settings.isDefault.minWebM,
      // Six significant figures, so saving the form again does not round a web typed in the other unit.
      stored: settings.isDefault.minWebM ? "" : String(Number((settings.minWebM / (user.lengthUnit === "mm" ? M_PER_MM : M_PER_IN)).toPrecision(6))),
    },
    defaults: {
      smallestRestrictionDrill: drillShown(DEFAULT_SMALLEST_RESTRICTION_DRILL_LABEL),
      largestRestrictionDrill: drillShown(DEFAULT_LARGEST_RESTRICTION_DRILL_LABEL),
      minWeb: size(DEFAULT_MIN_WEB_M),
    },
  };
  const groups: RackGroup[] = RACK_SYSTEMS.map((system) => {
    const drills = ALL_DRILLS.filter((d) => d.system === system);
    const smallest = drills[0]?.label ?? "";
    const largest = drills[drills.length - 1]?.label ?? "";
    return {
      system,
      title: TITLES[system],
      range: `${smallest} – ${largest}${system === "fraction" ? " in" : ""}`,
      drills: drills.map((d) => ({ label: d.label, size: size(d.diameterM) })),
    };
  });
  return (
    <>
      <PageHeader kicker="Shop" title="Drill rack" />
      <p className="mb-6 max-w-3xl text-sm text-graphite">
        The drills the shop has on hand. The planner picks restriction holes from these every time it solves a job, unless the
        job is set to use every standard drill. Sizes are nominal, smallest first in each series.
      </p>
      <Sheet title="Restriction limits" className="mb-6">
        <p className="mb-4 max-w-3xl text-sm text-graphite">
          The planner drills channel restrictions only with drills from the smallest to the largest size here, of the job&apos;s
          drill system, and keeps the least web of metal between neighbouring holes. When a target lies beyond these limits the
          plan says so instead of offering a layout the shop would not drill.
        </p>
        <ShopLimits
          values={limits}
          groups={groups.map((g) => ({ title: g.title, drills: g.drills }))}
          unit={user.lengthUnit}
          canEdit={user.role === "admin"}
        />
      </Sheet>
      <Sheet title="Dyno log reading" className="mb-6">
        <p className="mb-4 max-w-3xl text-sm text-graphite">
          How air-fuel logs are read: readings with the throttle opened beyond the threshold count as full throttle, the rest as
          part throttle; readings are grouped by manifold pressure in bins of this width.
        </p>
        <LogSettings values={logValues} canEdit={user.role === "admin"} />
      </Sheet>
      <DrillRack groups={groups} stocked={[...stocked]} canEdit={user.role === "admin"} />
    </>
  );
}
