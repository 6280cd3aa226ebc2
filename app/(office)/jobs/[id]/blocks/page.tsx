import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getJob } from "@/db/jobs";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { parseIdParam } from "@/lib/http/route-params";
import { PageHeader } from "@/components/ui/sheet";
import { RevisionNotice } from "../revision-notice";
import { saveBlocksAction } from "./actions";
import { BlocksEditor } from "./blocks-form";
import { blocksFormValues } from "./form-values";

export const metadata: Metadata = { title: "Blocks and stages" };

export default async function JobBlocksPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await requireRole(OFFICE_ROLES, `/jobs/${id}/blocks`);
  const parsed = parseIdParam(id);
  if (!parsed.ok) notFound();
  const record = await getJob(user, parsed.id);
  if (!record) notFound();
  return (
    <>
      <PageHeader kicker={`Job ${record.job.number} · ${record.customer.name}`} title="Metering blocks and stages" />
      <div className="flex flex-col gap-6">
        <RevisionNotice record={record} formId="job-blocks" />
        <BlocksEditor
          action={saveBlocksAction.bind(null, record.job.id)}
          defaultValue={blocksFormValues(record.blocks, user.lengthUnit)}
          unit={user.lengthUnit}
          cancelHref={`/jobs/${record.job.id}`}
        />
      </div>
    </>
  );
}
