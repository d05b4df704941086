import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/button";
import { DataTable, EmptyState, PageHeader, Td } from "@/components/ui/surface";
import { listAuditEvents } from "@/db/queries/audit";
import { requirePageUser } from "@/lib/auth/guard";
import { formatUtc } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Audit" };

const ACTION_LABELS: Record<string, string> = {
  "user.invited": "Invited a person",
  "user.invitation_resent": "Re-sent an invitation",
  "user.role_changed": "Changed a role",
  "user.deactivated": "Deactivated a person",
  "user.reactivated": "Reactivated a person",
  "profile.created": "Created a profile",
  "revision.saved": "Saved a revision",
  "revision.submitted": "Submitted for review",
  "revision.approved": "Approved",
  "revision.changes_requested": "Sent back",
  "revision.withdrawn": "Withdrew from review",
  "revision.commented": "Commented",
  "settings.safety_approvals": "Changed approvals needed",
};

const FILTERS = [
  { value: "", label: "Everything" },
  { value: "user.", label: "People" },
  { value: "profile.", label: "Profiles created" },
  { value: "revision.", label: "Revisions and reviews" },
  { value: "settings.", label: "Settings" },
];

function describe(detail: Record<string, unknown> | null): string {
  if (!detail) return "";
  return Object.entries(detail)
    .map(([k, v]) => `${k}: ${typeof v === "string" && /^[0-9a-f]{64}$/.test(v) ? v.slice(0, 10) + "…" : String(v)}`)
    .join(", ");
}

export default async function AuditPage({ searchParams }: { searchParams: Promise<{ action?: string; actor?: string }> }) {
  await requirePageUser("audit:read");
  const params = await searchParams;
  const action = FILTERS.some((f) => f.value === params.action) ? params.action! : "";
  const actor = typeof params.actor === "string" && /^[^\s@]+@[^\s@]+$/.test(params.actor) ? params.actor.slice(0, 191) : "";
  const events = await listAuditEvents({ action: action || undefined, actorEmail: actor || undefined, limit: 200 });
  const csv = `/api/v1/audit?format=csv&limit=5000${action ? `&action=${encodeURIComponent(action)}` : ""}${actor ? `&actor=${encodeURIComponent(actor)}` : ""}`;
  return (
    <>
      <PageHeader
        title="Audit"
        intro="Every change to people, profiles and reviews, with who made it and the content hash before and after. Entries are written with the change itself and never edited."
        actions={
          <a href={csv} className={buttonClass("secondary")} download>
            Export CSV
          </a>
        }
      />
      <form method="get" className="mb-4 flex flex-wrap items-end gap-3" aria-label="Filter the audit log">
        <div>
          <label htmlFor="audit-action" className="mb-1 block text-sm font-medium">
            Show
          </label>
          <select id="audit-action" name="action" defaultValue={action} className="rounded-md border border-loam-200 bg-white px-3 py-1.5 text-sm dark:border-loam-800 dark:bg-loam-900">
            {FILTERS.map((f) => (
              <option key={f.value} value={f.value}>
                {f.label}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="audit-actor" className="mb-1 block text-sm font-medium">
            By (e-mail)
          </label>
          <input id="audit-actor" name="actor" type="email" defaultValue={actor} className="rounded-md border border-loam-200 bg-white px-3 py-1.5 text-sm dark:border-loam-800 dark:bg-loam-900" />
        </div>
        <button type="submit" className={buttonClass("secondary")}>
          Filter
        </button>
        {(action || actor) && <Link href="/audit">Clear</Link>}
      </form>
      {events.length === 0 ? (
        <EmptyState title="No changes recorded here">Changes appear as soon as someone invites a colleague, edits a profile or decides on a review.</EmptyState>
      ) : (
        <DataTable caption="Audit events" headers={["When", "Who", "What", "Subject", "Detail"]}>
          {events.map((e) => (
            <tr key={e.id}>
              <Td className="whitespace-nowrap font-mono text-xs tabular-nums">{formatUtc(e.createdAt)}</Td>
              <Td>{e.actorName ?? "(removed user)"}</Td>
              <Td>{ACTION_LABELS[e.action] ?? e.action}</Td>
              <Td className="font-mono text-xs">
                {e.subjectType} {e.subjectId.slice(0, 8)}
              </Td>
              <Td className="text-xs">{describe(e.detail)}</Td>
            </tr>
          ))}
        </DataTable>
      )}
    </>
  );
}
