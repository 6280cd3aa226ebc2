import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getCustomer } from "@/db/customers";
import { listCustomerJobs } from "@/db/deliveries";
import { JOB_STATE_LABELS } from "@/db/job-states";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { formatDateTime } from "@/lib/format/dates";
import { shopTimeZone } from "@/lib/server/env";
import { PageHeader, Sheet, Tag } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";

export const metadata: Metadata = { title: "Customer" };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** One customer: contact details, and every job with its hand-over and conversion record. */
export default async function CustomerPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  await requireRole(OFFICE_ROLES, `/shop/customers/${id}`);
  const customer = UUID.test(id) ? await getCustomer(id) : undefined;
  if (!customer) notFound();
  const jobs = await listCustomerJobs(customer.id);
  const zone = shopTimeZone();
  return (
    <>
      <PageHeader
        kicker="Customer"
        title={customer.name}
        actions={
          <Link href={`/shop/customers?edit=${customer.id}`} className="inline-flex min-h-10 items-center px-3 text-sm font-semibold text-accent hover:underline">
            Edit details
          </Link>
        }
      />
      <div className="grid items-start gap-6 lg:grid-cols-[1fr_20rem]">
        <Sheet title={`${jobs.length} ${jobs.length === 1 ? "job" : "jobs"}`}>
          <Table>
            <thead>
              <tr>
                <Th>Job</Th>
                <Th>State</Th>
                <Th>Handed over</Th>
                <Th>Conversion record</Th>
              </tr>
            </thead>
            <tbody>
              {jobs.length === 0 ? (
                <tr>
                  <Td colSpan={4} className="py-8 text-center text-graphite">
                    No jobs for {customer.name} yet.
                  </Td>
                </tr>
              ) : (
                jobs.map((job) => (
                  <tr key={job.id} data-testid={`customer-job-${job.number}`}>
                    <Td>
                      <Link href={`/jobs/${job.id}`} className="numeric font-semibold text-accent-strong hover:underline">
                        {job.number}
                      </Link>
                      <span className="block text-xs text-pencil">{job.carburetor}</span>
                    </Td>
                    <Td>
                      <Tag tone={job.state === "delivered" ? "muted" : "plain"}>{JOB_STATE_LABELS[job.state].label}</Tag>
                    </Td>
                    <Td className="text-sm">
                      {job.deliveries.length ? (
                        job.deliveries.map((d) => (
                          <span key={d.revision} className="block">
                            to {d.handedTo}
                            <span className="block text-xs text-pencil">{formatDateTime(d.deliveredAt, zone)}</span>
                          </span>
                        ))
                      ) : (
                        <span className="text-pencil">not yet</span>
                      )}
                    </Td>
                    <Td className="text-sm">
                      {job.deliveries.length ? (
                        job.deliveries.map((d) => (
                          <span key={d.revision} className="block">
                            <a href={`/api/jobs/${job.id}/conversion-record?revision=${d.revision}`} className="font-semibold text-accent hover:underline" download>
                              Revision {d.revision} record (PDF)
                            </a>
                            <span className="block text-xs text-pencil">
                              {d.recordMailedTo ? `mailed to ${d.recordMailedTo}` : "not mailed: no e-mail address on file"}
                            </span>
                          </span>
                        ))
                      ) : (
                        <span className="text-pencil">made at delivery</span>
                      )}
                    </Td>
                  </tr>
                ))
              )}
            </tbody>
          </Table>
        </Sheet>
        <Sheet title="Contact">
          <dl className="grid gap-2 text-sm">
            <dt className="font-semibold">E-mail</dt>
            <dd className="text-graphite">{customer.email ?? "none on file: records are not mailed"}</dd>
            <dt className="font-semibold">Phone</dt>
            <dd className="numeric text-graphite">{customer.phone ?? "–"}</dd>
            {customer.notes ? (
              <>
                <dt className="font-semibold">Notes</dt>
                <dd className="text-graphite">{customer.notes}</dd>
              </>
            ) : null}
          </dl>
        </Sheet>
      </div>
    </>
  );
}
