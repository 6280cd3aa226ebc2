import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getJob } from "@/db/jobs";
import { getRevisionSnapshot } from "@/db/revisions";
import { ALL_ROLES, requireRole } from "@/lib/auth/session";
import { parseIdParam } from "@/lib/http/route-params";
import { snapshotPlan } from "@/lib/jobs/plan";
import { formatDateTime } from "@/lib/format/dates";
import { shopTimeZone } from "@/lib/server/env";
import { PageHeader, Sheet, Tag } from "@/components/ui/sheet";
import { EngineSummary, type EngineFacts } from "../../_plan/engine-summary";
import { PlanView } from "../../_plan/plan-view";

export const metadata: Metadata = { title: "Revision" };

/** One approved revision as it was approved: read-only, and unmistakably marked when superseded. */
export default async function RevisionPage({ params }: { params: Promise<{ id: string; number: string }> }) {
  const { id, number } = await params;
  const user = await requireRole(ALL_ROLES, `/jobs/${id}/revisions/${number}`);
  const parsed = parseIdParam(id);
  const revisionNumber = Number(number);
  if (!parsed.ok || !Number.isInteger(revisionNumber) || revisionNumber < 1) notFound();
  const record = await getJob(user, parsed.id);
  if (!record) notFound();
  const revision = await getRevisionSnapshot(parsed.id, revisionNumber);
  const listed = record.revisions.find((r) => r.number === revisionNumber);
  if (!revision || !listed) notFound();
  // Everything below is the revision's own record, names included: a later rename does not reach it.
  const { snapshot, names } = revision;
  const superseded = revision.status === "superseded";
  const current = record.revisions.find((r) => r.status === "current");
  return (
    <>
      <PageHeader
        kicker={`Job ${record.job.number} · ${names.customer}`}
        title={
          <span className="flex flex-wrap items-center gap-3">
            <span>Revision {revisionNumber}</span>
            {superseded ? <Tag tone="fault">superseded</Tag> : <Tag tone="accent">current</Tag>}
          </span>
        }
        actions={
          <Link href={`/jobs/${record.job.id}`} className="font-semibold text-accent underline">
            Back to the job
          </Link>
        }
      />
      {superseded ? (
        <div role="alert" data-testid="superseded-banner" className="sticky top-0 z-10 mb-6 border-4 border-fault bg-fault-soft px-5 py-4 text-fault shadow-md">
          <p className="text-2xl font-black uppercase tracking-[0.2em]">Superseded</p>
          <p className="mt-1 text-sm font-semibold">
            Do not work from this revision.{" "}
            {current ? (
              <>
                Revision {current.number} replaced it.{" "}
                <Link href={`/jobs/${record.job.id}/revisions/${current.number}`} className="underline">
                  Open revision {current.number}
                </Link>
                .
              </>
            ) : (
              "The job is being revised; a new revision has not been approved yet."
            )}
          </p>
        </div>
      ) : null}
      <div className="mb-6 grid gap-6 lg:grid-cols-[1fr_24rem]">
        <Sheet title="Engine and fuel as approved">
          <EngineSummary job={snapshot.job as unknown as EngineFacts} unit={user.lengthUnit} />
        </Sheet>
        <Sheet title="Approval">
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="text-graphite">Customer</dt>
            <dd className="font-semibold">{names.customer}</dd>
            <dt className="text-graphite">Tuner</dt>
            <dd className="font-semibold">{names.tuner}</dd>
            <dt className="text-graphite">Carburetor</dt>
            <dd className="font-semibold">{String(snapshot.job.carburetor ?? "")}</dd>
            <dt className="text-graphite">Approved by</dt>
            <dd className="font-semibold">{names.approvedBy}</dd>
            <dt className="text-graphite">Approved at</dt>
            <dd className="numeric">{formatDateTime(listed.approvedAt, shopTimeZone())}</dd>
            <dt className="text-graphite">Released at</dt>
            <dd className="numeric">{listed.releasedAt ? formatDateTime(listed.releasedAt, shopTimeZone()) : "not released"}</dd>
            {names.releasedBy ? (
              <>
                <dt className="text-graphite">Released by</dt>
                <dd className="font-semibold">{names.releasedBy}</dd>
              </>
            ) : null}
          </dl>
        </Sheet>
      </div>
      <PlanView blocks={snapshot.blocks} plan={snapshotPlan(snapshot)} unit={user.lengthUnit} />
    </>
  );
}
