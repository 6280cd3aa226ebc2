"use client";

import { Button } from "@/components/ui/button";

/** Opens the browser's print dialog; the print stylesheet hides everything marked no-print. */
export function PrintButton({ label = "Print" }: { label?: string }) {
  return (
    <Button variant="secondary" className="no-print" onClick={() => window.print()}>
      {label}
    </Button>
  );
}
