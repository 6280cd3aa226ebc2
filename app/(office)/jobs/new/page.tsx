import type { Metadata } from "next";
import { listCustomers } from "@/db/customers";
import { listTuners } from "@/db/users";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { NewJobForm } from "./new-job-form";

export const metadata: Metadata = { title: "New job" };

export default async function NewJobPage() {
  const user = await requireRole(OFFICE_ROLES, "/jobs/new");
  const [customers, tuners] = await Promise.all([
    listCustomers(),
    user.role === "admin" ? listTuners({ activeOnly: true }) : Promise.resolve([]),
  ]);
  return (
    <>
      <PageHeader kicker="Jobs" title="New job" />
      <Sheet>
        <p className="mb-6 max-w-3xl text-sm text-graphite">
          The engine, fuel and boost the conversion is planned for. Metering blocks and their enrichment stages are added on the
          job&apos;s own page once it is open.
        </p>
        <NewJobForm
          customers={customers.map(({ id, name }) => ({ id, name }))}
          tuners={tuners}
          me={{ id: user.id, name: user.name }}
          unitSystem={user.lengthUnit === "mm" ? "metric" : "imperial"}
        />
      </Sheet>
    </>
  );
}
