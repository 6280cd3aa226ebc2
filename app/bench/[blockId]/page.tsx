import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { getBenchView, type BenchView } from "@/db/bench";
import { SafetyNote } from "@/components/ui/safety-note";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { benchPath } from "@/lib/bench/url";
import { JOB_STATE_LABELS } from "@/db/job-states";
import { shopTimeZone } from "@/lib/server/env";
import { MAX_PHOTO_BYTES } from "@/lib/server/images";
import { SAFETY_CAUTIONS, type HazardTopic } from "@/lib/safety/cautions";
import { BenchSignOut } from "../bench-sign-out";
import { OperationCard } from "./operation-card";
import { BENCH_STATES } from "./operation-terms";

export const metadata: Metadata = { title: "Bench" };

const paramsSchema = z.object({ blockId: z.uuid() });
const querySchema = z.object({ revision: z.coerce.number().int().positive().optional() });

function sideName(side: "primary" | "secondary"): string {
  return side === "primary" ? "Primary" : "Secondary";
}

/** One block in one revision, as a traveler's QR code opens it on a phone: the operations as a checklist. */
export default async function BenchPage({
  params,
  searchParams,
}: {
  params: Promise<{ blockId: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const route = paramsSchema.safeParse(await params);
  const query = querySchema.safeParse(await searchParams);
  if (!route.success || !query.success) notFound();
  const { blockId } = route.data;
  const { revision } = query.data;
  const user = await requireRole(ALL_ROLES, revision ? benchPath(blockId, revision) : `/bench/${blockId}`);
  const view = await getBenchView(user, blockId, revision);
  if (!view) notFound();

  const superseded = view.revision.status === "superseded" || view.revision.number !== view.currentRevision;
  const onTheBench = view.job.state === "released" || view.job.state === "machining";
  const canSign = !superseded && onTheBench;
  const signed = view.operations.filter((op) => op.signOff).length;
  const total = view.operations.length;
  const timeZone = shopTimeZone();

  return (
    <>
      <header className="sticky top-0 z-10 bg-ink text-white" data-testid="bench-top-bar">
        <div className="mx-auto flex max-w-xl items-center gap-3 px-4 py-2">
          <p className="min-w-0 flex-1 text-sm leading-tight">
            <span className="numeric block text-base font-bold">{view.job.number}</span>
            <span className="font-semibold">{sideName(view.block.side)} block</span> · Rev {view.revision.number}
            {superseded ? <strong className="ml-1.5 rounded-sm bg-fault px-1 text-xs tracking-wider text-white">SUPERSEDED</strong> : null}
          </p>
          <p className="min-w-0 truncate text-right text-sm leading-tight" data-testid="signed-in-user">
            <span className="block font-semibold">{user.name}</span>
            <span className="text-xs uppercase tracking-wider opacity-80">{user.role}</span>
          </p>
          <BenchSignOut />
        </div>
      </header>

      <main className="mx-auto flex max-w-xl flex-col gap-5 px-4 pt-4 pb-16">
        {superseded ? <SupersededWarning view={view} /> : null}
        {!superseded && view.job.state === "held" ? <HoldNotice view={view} /> : null}

        <section aria-labelledby="bench-title" className="flex flex-col gap-1 border-b-4 border-ink pb-4">
          <p className="text-sm font-semibold uppercase tracking-[0.14em] text-graphite">
            Job <span className="numeric">{view.job.number}</span>
          </p>
          <h1 id="bench-title" className="text-3xl font-bold leading-tight">
            {sideName(view.block.side)} block
          </h1>
          <p className="text-lg font-semibold">{view.job.customer}</p>
          <p className="text-graphite">{view.job.carburetor}</p>
          {view.job.tuner ? <p className="text-graphite">Tuner: {view.job.tuner}</p> : null}
          <p className="mt-1 text-base">
            Revision <strong className="numeric">{view.revision.number}</strong>
            {superseded ? (
              <strong className="ml-2 rounded-sm border-2 border-fault px-1.5 text-fault">SUPERSEDED</strong>
            ) : (
              <span className="ml-2 text-graphite">(current)</span>
            )}
          </p>
        </section>

        <JobStateStrip state={view.job.state} />

        <section aria-label="Progress" className="flex flex-col gap-2">
          <p className="text-xl font-bold" data-testid="bench-progress">
            {signed} of {total} operations signed
          </p>
          <div className="h-4 overflow-hidden rounded-full border-2 border-ink bg-white" aria-hidden>
            <div className="h-full bg-accent" style={{ width: `${total ? (signed / total) * 100 : 0}%` }} />
          </div>
          {!superseded && !onTheBench ? (
            <p className="rounded-[var(--radius-sheet)] border-2 border-ink px-3 py-2 font-medium">
              {view.job.state === "verified" || view.job.state === "delivered"
                ? "This job is finished at the bench: nothing left to sign."
                : `This job is ${view.job.state}: the bench signs only released work.`}
            </p>
          ) : null}
        </section>

        <ol className="flex flex-col gap-5" aria-label="Operations">
          {view.operations.map((op) => (
            <li key={op.id}>
              <OperationCard
                blockId={view.block.id}
                operation={op}
                caution={op.caution && op.caution in SAFETY_CAUTIONS ? SAFETY_CAUTIONS[op.caution as HazardTopic] : null}
                photoIds={view.photos.filter((p) => p.operationId === op.id).map((p) => p.id)}
                canSign={canSign}
                maxPhotoBytes={MAX_PHOTO_BYTES}
                timeZone={timeZone}
                canAmend={!superseded && view.job.state === "machining" && (user.role === "admin" || op.signOff?.byId === user.id)}
              />
            </li>
          ))}
        </ol>

        <BlockPhotos photos={view.photos} />

        <SafetyNote signal={SAFETY_CAUTIONS.general.signal} title={SAFETY_CAUTIONS.general.title} layout="stacked">
          {SAFETY_CAUTIONS.general.text}
        </SafetyNote>
      </main>
    </>
  );
}

/** The tuner is revising the plan mid-machining: the record so far stays, and nothing more is signed for now. */
function HoldNotice({ view }: { view: BenchView }) {
  return (
    <div role="alert" className="-mx-4 flex flex-col gap-2 border-y-8 border-ink bg-caution px-4 py-5 text-ink" data-testid="hold-notice">
      <p className="text-2xl font-extrabold leading-tight">Revision {view.revision.number} is on hold — stop work on this block</p>
      <p className="text-base">
        {view.job.tuner || "The tuner"} is revising the plan. What is signed stays in the record; nothing more is signed until the next revision is released.
      </p>
    </div>
  );
}

function SupersededWarning({ view }: { view: BenchView }) {
  return (
    <div role="alert" className="-mx-4 flex flex-col gap-3 border-y-8 border-ink bg-fault px-4 py-5 text-white" data-testid="superseded-warning">
      <p className="text-2xl font-extrabold leading-tight">
        Revision {view.revision.number} is superseded — do not work from this traveler
      </p>
      <p className="text-base">
        The plan changed after this traveler was printed. Put the paper aside and work from revision {view.currentRevision}.
      </p>
      <Link
        href={benchPath(view.block.id, view.currentRevision)}
        className="flex min-h-16 items-center justify-center rounded-[var(--radius-sheet)] border-4 border-white bg-white px-4 text-center text-xl font-bold text-ink"
      >
        Open revision {view.currentRevision} (current)
      </Link>
    </div>
  );
}

function JobStateStrip({ state }: { state: BenchView["job"]["state"] }) {
  const onStrip = (BENCH_STATES as readonly string[]).includes(state);
  return (
    <section aria-label="Job state" className="flex flex-col gap-1">
      <ol className="grid grid-cols-3 gap-1 text-center text-sm font-semibold">
        {BENCH_STATES.map((s, i) => {
          const reached = onStrip ? BENCH_STATES.indexOf(state as (typeof BENCH_STATES)[number]) >= i : state === "delivered";
          const current = s === state;
          return (
            <li
              key={s}
              aria-current={current ? "step" : undefined}
              className={`flex min-h-11 items-center justify-center rounded-[var(--radius-sheet)] border-2 px-1 uppercase tracking-wider ${
                current ? "border-ink bg-ink text-white" : reached ? "border-ink bg-white text-ink" : "border-rule-strong bg-white text-pencil"
              }`}
            >
              {current ? "▶ " : reached ? "✓ " : ""}
              {s}
            </li>
          );
        })}
      </ol>
      <p className="text-sm text-graphite" data-testid="job-state">
        Job is <strong className="text-ink">{state}</strong>: {JOB_STATE_LABELS[state].meaning}.
      </p>
    </section>
  );
}

function BlockPhotos({ photos }: { photos: BenchView["photos"] }) {
  return (
    <section aria-labelledby="photos-title" className="flex flex-col gap-3 border-t-4 border-ink pt-4">
      <h2 id="photos-title" className="text-xl font-bold">
        Photos of this block
      </h2>
      {photos.length === 0 ? (
        <p className="text-graphite">No photos yet. Add one from an operation above.</p>
      ) : (
        <ul className="grid grid-cols-3 gap-2" data-testid="block-photos">
          {photos.map((photo) => (
            <li key={photo.id}>
              <a href={`/api/photos/${photo.id}`} className="block aspect-square overflow-hidden rounded-[var(--radius-sheet)] border-2 border-ink bg-paper">
                {/* eslint-disable-next-line @next/next/no-img-element -- served by our own route, already a thumbnail */}
                <img src={`/api/photos/${photo.id}?size=thumb`} alt="Block photo" className="h-full w-full object-cover" loading="lazy" />
              </a>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
