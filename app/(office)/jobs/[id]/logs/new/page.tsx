import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getJob } from "@/db/jobs";
import { LOGGABLE_STATES } from "@/lib/tuning/logs";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { parseIdParam } from "@/lib/http/route-params";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { LogUpload } from "../_components/log-upload";
import { TypedReadings } from "../_components/typed-readings";

export const metadata: Metadata = { title: "Read an air-fuel log" };

export default async function NewLogPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireRole(OFFICE_ROLES, `/jobs/${id}/logs/new`);
  const parsed = parseIdParam(id);
  if (!parsed.ok) notFound();
  const record = await getJob(user, parsed.id);
  if (!record) notFound();
  const { job } = record;
  const onEngine = LOGGABLE_STATES.includes(job.state) && job.currentRevision > 0;
  return (
    <>
      <PageHeader
        kicker={`Job ${job.number}`}
        title="Read an air-fuel log"
        actions={
          <ButtonLink href={`/jobs/${job.id}`} variant="secondary">
            Back to the job
          </ButtonLink>
        }
      />
      <Sheet title="A log file">
        {onEngine ? (
          <LogUpload jobId={job.id} revision={job.currentRevision} />
        ) : (
          <p className="text-sm text-graphite">
            This job is {job.state}: a log is read against a released revision, the one on the engine. Release the plan first.
          </p>
        )}
      </Sheet>
      {onEngine ? (
        <Sheet title="Or type a few readings" className="mt-6">
          <TypedReadings jobId={job.id} />
        </Sheet>
      ) : null}
    </>
  );
}
