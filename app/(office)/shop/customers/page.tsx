import type { Metadata } from "next";
import Link from "next/link";
import { getCustomer, listCustomersWithJobCounts } from "@/db/customers";
import { OFFICE_ROLES, requireRole } from "@/lib/auth/session";
import { Button } from "@/components/ui/button";
import { Input } from "@/components/ui/field";
import { PageHeader, Sheet } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { CustomerForm } from "./customer-form";

export const metadata: Metadata = { title: "Customers" };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function single(value: string | string[] | undefined): string | undefined {
  return Array.isArray(value) ? value[0] : value;
}

export default async function CustomersPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await requireRole(OFFICE_ROLES, "/shop/customers");
  const params = await searchParams;
  const q = (single(params.q) ?? "").trim().slice(0, 100);
  const editId = single(params.edit);
  const [rows, editing] = await Promise.all([
    listCustomersWithJobCounts(q || undefined),
    editId && UUID.test(editId) ? getCustomer(editId) : Promise.resolve(undefined),
  ]);
  const here = (extra: Record<string, string>) => {
    const search = new URLSearchParams({ ...(q ? { q } : {}), ...extra }).toString();
    return search ? `/shop/customers?${search}` : "/shop/customers";
  };
  return (
    <>
      <PageHeader kicker="Shop" title="Customers" />
      <div className="grid items-start gap-6 lg:grid-cols-[1fr_22rem]">
        <Sheet title={q ? `${rows.length} ${rows.length === 1 ? "customer matches" : "customers match"} “${q}”` : `${rows.length} customers`}>
          <form method="get" action="/shop/customers" role="search" aria-label="Find customers" className="mb-4 flex flex-wrap items-end gap-2">
            <label className="flex min-w-64 flex-1 flex-col gap-1 text-sm font-semibold">
              Search
              <Input type="search" name="q" defaultValue={q} placeholder="name, e-mail or phone" maxLength={100} className="font-normal" />
            </label>
            <Button type="submit" variant="secondary">
              Search
            </Button>
            {q ? (
              <Link href="/shop/customers" className="px-2 py-2 text-sm font-semibold text-accent hover:underline">
                Show all
              </Link>
            ) : null}
          </form>
          <Table>
            <thead>
              <tr>
                <Th>Name</Th>
                <Th>E-mail</Th>
                <Th>Phone</Th>
                <Th numeric>Jobs</Th>
                <Th>
                  <span className="sr-only">Edit</span>
                </Th>
              </tr>
            </thead>
            <tbody>
              {rows.length === 0 ? (
                <tr>
                  <Td colSpan={5} className="py-8 text-center text-graphite">
                    {q ? `No customer matches “${q}”.` : "No customers yet: add the first one here, or with a new job."}
                  </Td>
                </tr>
              ) : (
                rows.map((customer) => (
                  <tr key={customer.id} data-testid={`customer-row-${customer.name}`} className={customer.id === editing?.id ? "bg-accent-soft/60" : undefined}>
                    <Td className="font-medium">
                      <Link href={`/shop/customers/${customer.id}`} className="text-accent-strong hover:underline">
                        {customer.name}
                      </Link>
                      {customer.notes ? <span className="block max-w-md truncate text-xs font-normal text-pencil">{customer.notes}</span> : null}
                    </Td>
                    <Td className="text-graphite">{customer.email ?? <span className="text-pencil">–</span>}</Td>
                    <Td className="numeric text-graphite">{customer.phone ?? <span className="text-pencil">–</span>}</Td>
                    <Td className="whitespace-nowrap text-right">
                      {customer.jobCount > 0 ? (
                        <Link href={`/jobs?customer=${customer.id}`} className="font-semibold text-accent-strong hover:underline">
                          <span className="numeric">{customer.jobCount}</span> {customer.jobCount === 1 ? "job" : "jobs"} →
                        </Link>
                      ) : (
                        <span className="text-pencil">
                          <span className="numeric">0</span> jobs
                        </span>
                      )}
                    </Td>
                    <Td className="text-right">
                      <Link href={here({ edit: customer.id })} className="text-sm font-semibold text-accent hover:underline" aria-label={`Edit ${customer.name}`}>
                        Edit
                      </Link>
                    </Td>
                  </tr>
                ))
              )}
            </tbody>
          </Table>
        </Sheet>
        {editing ? (
          <Sheet title={`Edit ${editing.name}`}>
            <CustomerForm
              key={editing.id}
              customer={{ customerId: editing.id, name: editing.name, email: editing.email, phone: editing.phone, notes: editing.notes }}
            />
          </Sheet>
        ) : (
          <Sheet title="Add a customer">
            <CustomerForm />
          </Sheet>
        )}
      </div>
    </>
  );
}
