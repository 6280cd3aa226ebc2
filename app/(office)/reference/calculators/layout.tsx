import { PageHeader } from "@/components/ui/sheet";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { LengthUnitSwitch } from "../length-unit-switch";
import { CALCULATORS } from "../places";
import { CalculatorTabs } from "./calculator-tabs";

export default async function CalculatorsLayout({ children }: { children: React.ReactNode }) {
  const user = await requireRole(ALL_ROLES, "/reference/calculators");
  return (
    <>
      <PageHeader kicker="Reference" title="Calculators" actions={<LengthUnitSwitch unit={user.lengthUnit} />} />
      <CalculatorTabs places={CALCULATORS} />
      {children}
    </>
  );
}
