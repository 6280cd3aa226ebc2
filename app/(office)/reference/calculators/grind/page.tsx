import type { Metadata } from "next";
import { Sheet } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { GrindForm } from "./grind-form";

export const metadata: Metadata = { title: "Clearance grind" };

export default async function GrindCalculatorPage() {
  const user = await requireRole(ALL_ROLES, "/reference/calculators/grind");
  const { grinding, general } = SAFETY_CAUTIONS;
  return (
    <div className="flex flex-col gap-6">
      <SafetyNote signal={grinding.signal} title={grinding.title}>
        {grinding.text}
      </SafetyNote>
      <Sheet title="Clearance grind of the boss">
        <GrindForm unit={user.lengthUnit} />
      </Sheet>
      <SafetyNote signal={general.signal} title={general.title}>
        {general.text}
      </SafetyNote>
    </div>
  );
}
