import Link from "next/link";
import type { MoveWarning } from "@/lib/jobs/drill-rack-check";

/**
 * Said on the job page for as long as the revision on the bench uses a drill that has left the rack: the
 * release went ahead, so the machinist may reach for it any time.
 */
export function OffRackNotice({ revision, warnings, showRack }: { revision: number; warnings: MoveWarning[]; showRack: boolean }) {
  if (warnings.length === 0) return null;
  return (
    <section
      role="note"
      aria-label="Drills off the rack"
      data-testid="off-rack-notice"
      className="mb-6 rounded-[var(--radius-sheet)] border-2 border-fault bg-fault-soft px-4 py-3 text-sm text-fault"
    >
      <p className="font-semibold">
        Revision {revision} uses {warnings.length === 1 ? "a drill that is" : `${warnings.length} drills that are`} not on the rack.
      </p>
      <ul className="mt-1 list-disc pl-5">
        {warnings.map((warning) => (
          <li key={warning.drill}>{warning.message}</li>
        ))}
      </ul>
      {showRack ? (
        <Link href="/shop/drills" className="mt-2 inline-block font-semibold underline">
          Open the drill rack
        </Link>
      ) : null}
    </section>
  );
}
