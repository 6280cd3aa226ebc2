import "server-only";
import type { ConversionPlan } from "@/lib/engineering/conversion-plan";
import { SafetyNote } from "@/components/ui/safety-note";
import { SAFETY_CAUTIONS, type HazardTopic } from "@/lib/safety/cautions";

// Strongest signal first: DANGER, then WARNING, then CAUTION.
const ORDER: HazardTopic[] = ["fuel", "pressurizedBowls", "grinding", "drilling"];

/** The safety notes for the hazards this plan's operations call for, once each. */
export function PlanSafety({ plan }: { plan: ConversionPlan }) {
  const topics = new Set<HazardTopic>(plan.blocks.flatMap((b) => b.operations.map((op) => op.caution)));
  return (
    <div aria-label="Safety for this plan" className="grid gap-3 lg:grid-cols-2">
      {ORDER.filter((t) => topics.has(t)).map((topic) => {
        const caution = SAFETY_CAUTIONS[topic];
        return (
          <SafetyNote key={topic} signal={caution.signal} title={caution.title}>
            {caution.text}
          </SafetyNote>
        );
      })}
      <SafetyNote signal={SAFETY_CAUTIONS.general.signal} title={SAFETY_CAUTIONS.general.title}>
        {SAFETY_CAUTIONS.general.text}
      </SafetyNote>
    </div>
  );
}
