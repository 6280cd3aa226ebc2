import type { Metadata } from "next";
import { listCustomers } from "@/db/customers";
import { listTuners } from "@/db/users";
import { ALL_ROLES, OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { shopTimeZone } from "@/lib/server/env";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { JobsTable } from "./jobs-table";

export const metadata: Metadata = { title: "Jobs" };

/** The office's list of work. Rows come from GET /api/jobs (paged and sorted there); the filter choices from here. */
export default async function JobsPage() {
  const user = await requireRole(ALL_ROLES, "/jobs");
  const [customers, tuners] = await Promise.all([listCustomers(), listTuners({ activeOnly: false })]);
  const plans = OFFICE_ROLES.includes(user.role);
  return (
    <>
      <PageHeader
        kicker={plans ? "Office" : "Shop floor"}
        title="Jobs"
        actions={plans ? <ButtonLink href="/jobs/new">New job</ButtonLink> : null}
      />
      <Sheet>
        <JobsTable customers={customers.map(({ id, name }) => ({ id, name }))} tuners={tuners} shopFloorOnly={!plans} timeZone={shopTimeZone()} />
      </Sheet>
    </>
  );
}
