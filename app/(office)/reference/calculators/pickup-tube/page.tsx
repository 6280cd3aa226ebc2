import type { Metadata } from "next";
import { Sheet } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { PickupTubeForm } from "./pickup-tube-form";

export const metadata: Metadata = { title: "Pickup tube" };

export default async function PickupTubeCalculatorPage() {
  const user = await requireRole(ALL_ROLES, "/reference/calculators/pickup-tube");
  const general = SAFETY_CAUTIONS.general;
  return (
    <div className="flex flex-col gap-6">
      <Sheet title="Pickup extension for the secondary power valve">
        <PickupTubeForm unit={user.lengthUnit} />
      </Sheet>
      <SafetyNote signal={general.signal} title={general.title}>
        {general.text}
      </SafetyNote>
    </div>
  );
}
