import type { Metadata } from "next";
import { listUsers } from "@/db/users";
import { requireRole } from "@/lib/auth/session";
import { PageHeader, Sheet, Tag } from "@/components/ui/sheet";
import { Table, Td, Th } from "@/components/ui/table";
import { CreateUserForm } from "./create-user-form";
import { UserRowControls } from "./user-row-controls";

export const metadata: Metadata = { title: "Users and roles" };

export default async function UsersPage() {
  const me = await requireRole(["admin"], "/shop/users");
  const users = await listUsers();
  return (
    <>
      <PageHeader kicker="Shop" title="Users and roles" />
      <div className="grid gap-6 lg:grid-cols-[1fr_22rem]">
        <Sheet title={`${users.length} accounts`}>
          <Table>
            <thead>
              <tr>
                <Th>Name</Th>
                <Th>E-mail</Th>
                <Th>State</Th>
                <Th>Role and access</Th>
              </tr>
            </thead>
            <tbody>
              {users.map((user) => (
                <tr key={user.id} data-testid={`user-row-${user.email}`}>
                  <Td className="font-medium">
                    {user.name}
                    {user.id === me.id ? <span className="ml-2 text-xs text-pencil">(you)</span> : null}
                  </Td>
                  <Td className="text-graphite">{user.email}</Td>
                  <Td>{user.active ? <Tag tone="accent">active</Tag> : <Tag tone="muted">deactivated</Tag>}</Td>
                  <Td>
                    <UserRowControls user={{ id: user.id, name: user.name, role: user.role, active: user.active }} />
                  </Td>
                </tr>
              ))}
            </tbody>
          </Table>
        </Sheet>
        <Sheet title="Add a user">
          <CreateUserForm />
        </Sheet>
      </div>
    </>
  );
}
