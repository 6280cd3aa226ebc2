"use client";

import Link from "next/link";
import { usePathname } from "next/navigation";
import type { ReferencePlace } from "../places";

/** The calculators as a row of tabs; the current one is marked for eyes and for screen readers. */
export function CalculatorTabs({ places }: { places: ReferencePlace[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Calculators" className="no-print -mt-3 mb-6 flex flex-wrap gap-1 border-b border-rule-strong">
      {places.map((place) => {
        const current = pathname === place.href;
        return (
          <Link
            key={place.href}
            href={place.href}
            aria-current={current ? "page" : undefined}
            className={`-mb-px rounded-t-[var(--radius-sheet)] border px-4 py-2 text-sm font-semibold ${
              current ? "border-rule-strong border-b-sheet bg-sheet text-ink" : "border-transparent text-graphite hover:text-accent-strong"
            }`}
          >
            {place.title}
          </Link>
        );
      })}
    </nav>
  );
}
