import type { Metadata } from "next";
import { Sheet } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { RestrictionForm } from "./restriction-form";

export const metadata: Metadata = { title: "Restriction holes" };

export default async function RestrictionCalculatorPage() {
  const user = await requireRole(ALL_ROLES, "/reference/calculators/restriction");
  const general = SAFETY_CAUTIONS.general;
  return (
    <div className="flex flex-col gap-6">
      <Sheet title="Restriction holes for a power-valve channel">
        <RestrictionForm unit={user.lengthUnit} />
      </Sheet>
      <SafetyNote signal={general.signal} title={general.title}>
        {general.text}
      </SafetyNote>
    </div>
  );
}
