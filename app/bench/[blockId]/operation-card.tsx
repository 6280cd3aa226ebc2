"use client";

import type { BenchOperation } from "@/db/bench";
import type { SafetyCaution } from "@/lib/safety/cautions";
import { OperationWork, PlannedReadings } from "./_components/operation-work";
import { SignedSummary } from "./_components/signed-summary";
import { SignOffForm, useSignOffForm } from "./_components/sign-off-form";

/**
 * One operation of the traveler as a card: what to do, with what, the hazard, the readings to take and
 * the Done button. Once signed it folds down to who signed, when, and what was measured.
 */
export function OperationCard({
  blockId,
  operation,
  caution,
  photoIds,
  canSign,
  maxPhotoBytes,
  timeZone,
  canAmend,
}: {
  blockId: string;
  operation: BenchOperation;
  caution: SafetyCaution | null;
  photoIds: string[];
  canSign: boolean;
  maxPhotoBytes: number;
  /** The shop's time zone, from the server page: sign-off times print in it. */
  timeZone: string;
  /** Whether this viewer may correct the readings once signed (the signer or an admin, in machining). */
  canAmend: boolean;
}) {
  // Kept here rather than in the form: the summary shows the server's answer once the card turns signed.
  const signOff = useSignOffForm(operation);
  const signed = operation.signOff !== null;
  const titleId = `op-${operation.id}-title`;
  return (
    <article
      aria-labelledby={titleId}
      data-testid="operation-card"
      data-operation-id={operation.id}
      data-signed={signed ? "yes" : "no"}
      className={`overflow-hidden rounded-[var(--radius-sheet)] border-2 ${signed ? "border-rule-strong bg-paper" : "border-ink bg-white"}`}
    >
      <header className="flex items-start gap-3 border-b-2 border-ink px-4 py-3">
        <span className="numeric text-4xl leading-none font-bold" aria-label={`Operation ${operation.number}`}>
          {operation.number}
        </span>
        <h2 id={titleId} className="flex-1 pt-0.5 text-lg leading-snug font-bold">
          <span className="sr-only">Operation {operation.number}: </span>
          {operation.title}
        </h2>
        {signed ? (
          <span className="rounded-full border-2 border-ink px-2 py-0.5 text-xs font-bold uppercase tracking-wider">✓ Signed</span>
        ) : null}
      </header>
      {signed ? (
        <SignedSummary operation={operation} caution={caution} photoIds={photoIds} lastResult={signOff.lastResult} timeZone={timeZone} canAmend={canAmend} />
      ) : (
        <div className="flex flex-col gap-4 px-4 py-4">
          <OperationWork operation={operation} caution={caution} />
          {canSign ? (
            <SignOffForm
              blockId={blockId}
              operation={operation}
              photoIds={photoIds}
              maxPhotoBytes={maxPhotoBytes}
              state={signOff}
            />
          ) : (
            <PlannedReadings planned={operation.planned} />
          )}
        </div>
      )}
    </article>
  );
}
