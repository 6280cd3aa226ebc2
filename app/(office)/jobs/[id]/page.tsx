import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getJob } from "@/db/jobs";
import { listTuningLogs } from "@/db/tuning-logs";
import { ALL_ROLES, OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { RequestRefusal } from "@/db/refusal";
import { EDITING_STATES, JOB_STATE_LABELS } from "@/db/job-states";
import { parseIdParam } from "@/lib/http/route-params";
import { offRackDrills } from "@/lib/jobs/drill-rack-check";
import { shownPlanOf, type ShownPlan } from "@/lib/jobs/plan-shown";
import { shopTimeZone } from "@/lib/server/env";
import { ButtonLink, buttonClass } from "@/components/ui/button";
import { PageHeader, Sheet, Tag } from "@/components/ui/sheet";
import { BlockList } from "./_plan/block-list";
import { EngineSummary } from "./_plan/engine-summary";
import { PlanView } from "./_plan/plan-view";
import { changeStateAction, chooseLayoutAction } from "./actions";
import { LOGGABLE_STATES } from "@/lib/tuning/logs";
import { LogsPanel } from "./logs-panel";
import { OffRackNotice } from "./off-rack-notice";
import { RevisionsPanel } from "./revisions-panel";
import { TravelersPanel } from "./travelers-panel";
import { StateControls } from "./state-controls";
import { officeIdleNote, officeMoves } from "./state-moves";

export const metadata: Metadata = { title: "Job" };

type Params = { params: Promise<{ id: string }> };

export default async function JobPage({ params }: Params) {
  const { id } = await params;
  const user = await requireRole(ALL_ROLES, `/jobs/${id}`);
  const parsed = parseIdParam(id);
  if (!parsed.ok) notFound();
  const record = await getJob(user, parsed.id);
  if (!record) notFound();
  const { job } = record;
  const unit = user.lengthUnit;
  const office = OFFICE_ROLES.includes(user.role);

  // A draft is solved now, with the shop's rack; past draft the bench works from the approved revision.
  let shown: ShownPlan | undefined;
  let refusal: string | undefined;
  if (job.state !== "draft" || record.blocks.length) {
    try {
      shown = await shownPlanOf(record);
    } catch (error) {
      if (!(error instanceof RequestRefusal)) throw error;
      refusal = error.message;
    }
  }
  const editing = EDITING_STATES.includes(job.state);
  const choose = office && editing ? chooseLayoutAction.bind(null, job.id) : undefined;
  const moves = office ? officeMoves(job.state, job.currentRevision + 1, user.role) : [];
  const logs = office ? await listTuningLogs(job.id) : [];
  // While the bench works from the revision, a drill taken off the rack since approval is said on the page.
  const onTheBench = job.state === "released" || job.state === "machining";
  const offRack = onTheBench && shown?.revision ? await offRackDrills(shown.job, shown.plan) : [];

  return (
    <>
      <PageHeader
        kicker="Job"
        title={
          <span className="flex flex-wrap items-center gap-3">
            <span className="numeric">{job.number}</span>
            <span data-testid="job-state">
              <Tag tone={job.state === "held" ? "fault" : editing ? "muted" : "accent"}>{JOB_STATE_LABELS[job.state].label}</Tag>
            </span>
          </span>
        }
        actions={
          office ? (
            <>
              <ButtonLink href={`/jobs/${job.id}/edit`} variant="secondary">
                Edit engine and fuel
              </ButtonLink>
              <ButtonLink href={`/jobs/${job.id}/blocks`} variant="secondary">
                Edit blocks and stages
              </ButtonLink>
              {job.state === "delivered" ? (
                // A file, not a page: a plain link so the browser downloads it.
                <a href={`/api/jobs/${job.id}/conversion-record`} className={buttonClass("secondary")} download>
                  Conversion record (PDF)
                </a>
              ) : null}
            </>
          ) : undefined
        }
      />
      <div className="mb-6 flex flex-wrap items-start justify-between gap-4">
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-graphite">Customer</dt>
          <dd className="font-semibold">{record.customer.name}</dd>
          <dt className="text-graphite">Tuner</dt>
          <dd className="font-semibold">{record.tuner.name}</dd>
          <dt className="text-graphite">Carburetor</dt>
          <dd className="font-semibold">{job.carburetor}</dd>
          <dt className="text-graphite">State</dt>
          <dd>{JOB_STATE_LABELS[job.state].meaning}</dd>
        </dl>
        {office ? <StateControls
            action={changeStateAction.bind(null, job.id)}
            moves={moves}
            idle={officeIdleNote(job.state)}
            dangers={editing && shown ? shown.plan.warnings.filter((w) => w.level === "danger").length : 0}
          /> : null}
      </div>
      <OffRackNotice revision={job.currentRevision} warnings={offRack} showRack={office} />
      <div className="mb-8 grid gap-6 lg:grid-cols-[minmax(0,1fr)_32rem]">
        <Sheet title="Engine and fuel">
          <EngineSummary job={job} unit={unit} />
        </Sheet>
        <div className="flex flex-col gap-6">
          <RevisionsPanel jobId={job.id} revisions={record.revisions} timeZone={shopTimeZone()} />
          {office && job.currentRevision > 0 ? (
            <LogsPanel jobId={job.id} logs={logs} canRead={LOGGABLE_STATES.includes(job.state)} timeZone={shopTimeZone()} />
          ) : null}
          {job.currentRevision > 0 && record.blocks.length ? (
            <TravelersPanel revision={job.currentRevision} blocks={record.blocks.map((b) => ({ id: b.id, side: b.side }))} />
          ) : null}
        </div>
      </div>
      <section aria-labelledby="plan-heading" className="flex flex-col gap-4">
        <div className="flex flex-wrap items-baseline justify-between gap-2 border-b-2 border-ink pb-2">
          <h2 id="plan-heading" className="text-xl font-bold">
            Plan
          </h2>
          {shown ? <p className="text-sm text-graphite">{shown.source}</p> : null}
        </div>
        {shown ? (
          <PlanView blocks={shown.blocks} plan={shown.plan} unit={unit} choose={choose} />
        ) : record.blocks.length ? (
          <>
            <p role="alert" className="rounded-[var(--radius-sheet)] border border-fault bg-fault-soft px-3 py-2 text-sm text-fault">
              {refusal ?? "The plan cannot be shown."}
            </p>
            <BlockList blocks={record.blocks} unit={unit} />
          </>
        ) : (
          <Sheet>
            <p className="text-sm text-graphite">No metering blocks yet: add the primary (and secondary) block with their enrichment stages to solve the plan.</p>
            {office ? (
              <ButtonLink href={`/jobs/${job.id}/blocks`} className="mt-3">
                Add the metering blocks
              </ButtonLink>
            ) : null}
          </Sheet>
        )}
      </section>
    </>
  );
}
