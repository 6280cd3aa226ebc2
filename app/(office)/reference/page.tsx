import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { LengthUnitSwitch } from "./length-unit-switch";
import { CALCULATORS, CHARTS, type ReferencePlace } from "./places";

export const metadata: Metadata = { title: "Reference" };

function PlaceList({ places }: { places: ReferencePlace[] }) {
  return (
    <ul className="divide-y divide-rule">
      {places.map((place) => (
        <li key={place.href}>
          <Link href={place.href} className="group flex flex-col gap-0.5 py-3 hover:bg-accent-soft/50 sm:flex-row sm:items-baseline sm:gap-4">
            <span className="w-44 shrink-0 font-semibold text-accent-strong group-hover:underline">{place.title} →</span>
            <span className="text-sm text-graphite">{place.purpose}</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}

export default async function ReferencePage() {
  const user = await requireRole(ALL_ROLES, "/reference");
  const general = SAFETY_CAUTIONS.general;
  return (
    <>
      <PageHeader kicker="Reference" title="Charts and calculators" actions={<LengthUnitSwitch unit={user.lengthUnit} />} />
      <div className="grid gap-6 lg:grid-cols-2">
        <Sheet title="Charts">
          <PlaceList places={CHARTS} />
        </Sheet>
        <Sheet title="Calculators">
          <PlaceList places={CALCULATORS} />
        </Sheet>
      </div>
      <div className="mt-6">
        <SafetyNote signal={general.signal} title={general.title}>
          {general.text}
        </SafetyNote>
      </div>
    </>
  );
}
