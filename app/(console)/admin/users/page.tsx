import type { Metadata } from "next";
import { buttonClass } from "@/components/ui/button";
import { DataTable, PageHeader, Panel } from "@/components/ui/surface";
import { listUsers, type UserStatus } from "@/db/queries/users";
import { requirePageUser } from "@/lib/auth/guard";
import { ROLE_LABELS, ROLE_SUMMARIES, ROLES } from "@/lib/auth/permissions";
import { InviteForm } from "./invite-form";
import { UserRow } from "./user-row";

export const metadata: Metadata = { title: "People" };

const PAGE_SIZE = 50;
const STATUSES: { value: "" | UserStatus; label: string }[] = [
  { value: "", label: "Everyone" },
  { value: "active", label: "Active" },
  { value: "invited", label: "Invited" },
  { value: "deactivated", label: "Deactivated" },
];

export default async function UsersPage({ searchParams }: { searchParams: Promise<{ q?: string; status?: string }> }) {
  const me = await requirePageUser("users:manage");
  const params = await searchParams;
  const q = typeof params.q === "string" ? params.q.trim().toLowerCase().slice(0, 100) : "";
  const status = STATUSES.some((s) => s.value === params.status) ? (params.status as UserStatus) : "";
  const all = await listUsers();
  const matching = all.filter(
    (u) => (!status || u.status === status) && (!q || u.name.toLowerCase().includes(q) || u.email.toLowerCase().includes(q)),
  );
  const shown = matching.slice(0, PAGE_SIZE);
  return (
    <>
      <PageHeader title="People" intro="Who can sign in to Roostline and what each may do. Accounts are by invitation only." />
      <div className="mb-6 grid gap-6 lg:grid-cols-2">
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
      <form method="get" className="mb-3 flex flex-wrap items-end gap-3" aria-label="Find people">
        <div>
          <label htmlFor="people-q" className="mb-1 block text-sm font-medium">
            Name or e-mail
          </label>
          <input id="people-q" name="q" defaultValue={q} className="rounded-md border border-loam-200 bg-white px-3 py-1.5 text-sm dark:border-loam-800 dark:bg-loam-900" />
        </div>
        <div>
          <label htmlFor="people-status" className="mb-1 block text-sm font-medium">
            Status
          </label>
          <select id="people-status" name="status" defaultValue={status} className="rounded-md border border-loam-200 bg-white px-3 py-1.5 text-sm dark:border-loam-800 dark:bg-loam-900">
            {STATUSES.map((s) => (
              <option key={s.value} value={s.value}>
                {s.label}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className={buttonClass("secondary")}>
          Show
        </button>
        <p className="text-sm text-loam-600 dark:text-loam-400" role="status">
          {matching.length > shown.length ? `Showing the first ${shown.length} of ${matching.length}; narrow the search to see others.` : `${matching.length} of ${all.length} people`}
        </p>
      </form>
      <DataTable caption="People" headers={["Person", "Status", "Role", "Access"]}>
        {shown.map((u) => (
          <UserRow key={u.id} id={u.id} name={u.name} email={u.email} role={u.role} status={u.status} isSelf={u.id === me.id} />
        ))}
      </DataTable>
    </>
  );
}
