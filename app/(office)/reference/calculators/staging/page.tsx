import type { Metadata } from "next";
import { Sheet } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { StagingForm } from "./staging-form";

export const metadata: Metadata = { title: "Staging" };

export default async function StagingCalculatorPage() {
  const user = await requireRole(ALL_ROLES, "/reference/calculators/staging");
  const { pressurizedBowls, general } = SAFETY_CAUTIONS;
  return (
    <div className="flex flex-col gap-6">
      <SafetyNote signal={pressurizedBowls.signal} title={pressurizedBowls.title}>
        {pressurizedBowls.text} Set and check each boost valve&apos;s opening pressure on the bench with regulated air.
      </SafetyNote>
      <Sheet title="Staging: metering area from vacuum to peak boost">
        <StagingForm unit={user.lengthUnit} />
      </Sheet>
      <SafetyNote signal={general.signal} title={general.title}>
        {general.text}
      </SafetyNote>
    </div>
  );
}
