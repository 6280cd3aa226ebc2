import type { Metadata } from "next";
import { requireRole, ALL_ROLES } from "@/lib/auth/session";
import { PageHeader } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_CAUTIONS } from "@/lib/safety/cautions";

export const metadata: Metadata = { title: "Safety" };

/** Every caution the shop works under, the same words the travelers and the bench pages carry. */
export default async function SafetyPage() {
  await requireRole(ALL_ROLES, "/safety");
  return (
    <>
      <PageHeader kicker="Before the work" title="Safety" />
      <div className="flex max-w-3xl flex-col gap-3">
        {ALL_CAUTIONS.map((caution) => (
          <SafetyNote key={caution.topic} signal={caution.signal} title={caution.title}>
            {caution.text}
          </SafetyNote>
        ))}
      </div>
    </>
  );
}
