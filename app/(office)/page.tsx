import Link from "next/link";
import { requireRole, ALL_ROLES } from "@/lib/auth/session";
import { navigationFor } from "@/components/navigation";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_CAUTIONS } from "@/lib/safety/cautions";
import type { UserRole } from "@/db/schema";

const NEXT_STEP: Record<UserRole, { title: string; text: string }> = {
  admin: {
    title: "Keep the shop in order",
    text: "Add the people who plan and machine and set their roles, keep the customer list, and keep the drill rack true to what is on hand: the planner drills only from it.",
  },
  tuner: {
    title: "Plan the next conversion",
    text: "Open a new job from Jobs for the engine, fuel and boost, then size restriction holes, plug threads and grinds with the calculators.",
  },
  machinist: {
    title: "Work from the traveler",
    text: "Scan the QR code on a block's traveler with your phone to open its operations. The reference charts are here for the drill and tap sizes.",
  },
};

export default async function HomePage() {
  const user = await requireRole(ALL_ROLES, "/");
  const next = NEXT_STEP[user.role];
  return (
    <>
      <PageHeader kicker={`Signed in as ${user.role}`} title={`Good to see you, ${user.name.split(" ")[0]}`} />
      <div className="grid gap-6 lg:grid-cols-[1fr_24rem]">
        <div className="flex flex-col gap-6">
          <Sheet title={next.title}>
            <p className="text-graphite">{next.text}</p>
            <ul className="mt-4 grid gap-3 sm:grid-cols-2">
              {navigationFor(user.role).map((place) => (
                <li key={place.href}>
                  <Link
                    href={place.href}
                    className="block h-full rounded-[var(--radius-sheet)] border border-rule-strong bg-white p-4 hover:border-accent hover:bg-accent-soft"
                  >
                    <span className="font-semibold text-accent-strong">{place.label} →</span>
                    <span className="mt-1 block text-sm text-graphite">{place.purpose}</span>
                  </Link>
                </li>
              ))}
            </ul>
          </Sheet>
        </div>
        <div className="flex flex-col gap-3" aria-label="Safety">
          {ALL_CAUTIONS.map((caution) => (
            <SafetyNote key={caution.topic} signal={caution.signal} title={caution.title}>
              {caution.text}
            </SafetyNote>
          ))}
        </div>
      </div>
    </>
  );
}
