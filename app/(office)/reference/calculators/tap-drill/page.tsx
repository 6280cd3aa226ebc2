import type { Metadata } from "next";
import { Sheet } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { PassagePlugForm } from "./passage-plug-form";
import { TapDrillForm } from "./tap-drill-form";

export const metadata: Metadata = { title: "Tap drill and plug" };

export default async function TapDrillCalculatorPage() {
  const user = await requireRole(ALL_ROLES, "/reference/calculators/tap-drill");
  const general = SAFETY_CAUTIONS.general;
  return (
    <div className="flex flex-col gap-6">
      <Sheet title="Tap drill for a thread">
        <TapDrillForm unit={user.lengthUnit} />
      </Sheet>
      <Sheet title="Plug a passage">
        <PassagePlugForm unit={user.lengthUnit} />
      </Sheet>
      <SafetyNote signal={general.signal} title={general.title}>
        {general.text}
      </SafetyNote>
    </div>
  );
}
