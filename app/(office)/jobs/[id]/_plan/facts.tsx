import type { ReactNode } from "react";

/** Label / value rows; values in the monospace face, right-aligned, so figures line up down the column. */
export function Facts({ label, children }: { label: string; children: ReactNode }) {
  return (
    <dl aria-label={label} className="grid grid-cols-[minmax(9rem,auto)_1fr] text-sm">
      {children}
    </dl>
  );
}

export function Fact({ label, children, plain = false }: { label: ReactNode; children: ReactNode; plain?: boolean }) {
  return (
    <>
      <dt className="border-b border-rule py-1.5 pr-4 text-graphite">{label}</dt>
      <dd className={`border-b border-rule py-1.5 text-right ${plain ? "" : "numeric"}`}>{children}</dd>
    </>
  );
}
