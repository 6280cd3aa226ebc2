import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getJob } from "@/db/jobs";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { parseIdParam } from "@/lib/http/route-params";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { RevisionNotice } from "../revision-notice";
import { updateJobAction } from "./actions";
import { jobFormValues } from "./form-values";
import { JobFieldsEditor } from "./job-fields-form";

export const metadata: Metadata = { title: "Engine and fuel" };

export default async function EditJobPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireRole(OFFICE_ROLES, `/jobs/${id}/edit`);
  const parsed = parseIdParam(id);
  if (!parsed.ok) notFound();
  const record = await getJob(user, parsed.id);
  if (!record) notFound();
  return (
    <>
      <PageHeader kicker={`Job ${record.job.number} · ${record.customer.name}`} title="Engine and fuel" />
      <div className="flex flex-col gap-6">
        <RevisionNotice record={record} formId="job-fields" />
        <Sheet>
          <JobFieldsEditor action={updateJobAction.bind(null, record.job.id)} defaultValue={jobFormValues(record.job, user.lengthUnit)} cancelHref={`/jobs/${record.job.id}`} />
        </Sheet>
      </div>
    </>
  );
}
