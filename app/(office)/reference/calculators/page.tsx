import type { Metadata } from "next";
import Link from "next/link";
import { Sheet } from "@/components/ui/sheet";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { SAFETY_CAUTIONS } from "@/lib/safety/cautions";
import { CALCULATORS } from "../places";

export const metadata: Metadata = { title: "Calculators" };

export default async function CalculatorsPage() {
  await requireRole(ALL_ROLES, "/reference/calculators");
  const general = SAFETY_CAUTIONS.general;
  return (
    <>
      <Sheet>
        <ol className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {CALCULATORS.map((calculator, i) => (
            <li key={calculator.href}>
              <Link
                href={calculator.href}
                className="flex h-full flex-col gap-1 rounded-[var(--radius-sheet)] border border-rule-strong bg-white p-4 hover:border-accent hover:bg-accent-soft"
              >
                <span className="numeric text-xs text-pencil">{String(i + 1).padStart(2, "0")}</span>
                <span className="font-semibold text-accent-strong">{calculator.title} →</span>
                <span className="text-sm text-graphite">{calculator.purpose}</span>
              </Link>
            </li>
          ))}
        </ol>
      </Sheet>
      <div className="mt-6">
        <SafetyNote signal={general.signal} title={general.title}>
          {general.text}
        </SafetyNote>
      </div>
    </>
  );
}
