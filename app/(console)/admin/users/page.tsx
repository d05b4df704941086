import type { Metadata } from "next";
import { DataTable, PageHeader, Panel } from "@/components/ui/surface";
import { listUsers } from "@/db/queries/users";
import { requirePageUser } from "@/lib/auth/guard";
import { ROLE_LABELS, ROLE_SUMMARIES, ROLES } from "@/lib/auth/permissions";
import { InviteForm } from "./invite-form";
import { UserRow } from "./user-row";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage() {
  const me = await requirePageUser("users:manage");
  const users = await listUsers();
  return (
    <>
      <PageHeader title="People" intro="Who can sign in to Roostline and what each may do. Accounts are by invitation only." />
      <div className="grid gap-6 xl:grid-cols-[1fr_22rem]">
        <DataTable caption="People" headers={["Person", "Status", "Role", "Access"]}>
          {users.map((u) => (
            <UserRow key={u.id} id={u.id} name={u.name} email={u.email} role={u.role} status={u.status} isSelf={u.id === me.id} />
          ))}
        </DataTable>
        <div className="space-y-6">
          <Panel>
            <h2 className="mb-3 text-lg font-semibold">Invite a colleague</h2>
            <InviteForm />
          </Panel>
          <Panel>
            <h2 className="mb-2 text-lg font-semibold">Roles</h2>
            <dl className="space-y-2 text-sm">
              {ROLES.map((r) => (
                <div key={r}>
                  <dt className="font-medium">{ROLE_LABELS[r]}</dt>
                  <dd className="text-loam-600 dark:text-loam-400">{ROLE_SUMMARIES[r]}</dd>
                </div>
              ))}
            </dl>
          </Panel>
        </div>
      </div>
    </>
  );
}
