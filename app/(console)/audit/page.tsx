import type { Metadata } from "next";
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
};

function describe(detail: Record<string, unknown> | null): string {
  if (!detail) return "";
  return Object.entries(detail)
    .map(([k, v]) => `${k}: ${String(v)}`)
    .join(", ");
}

export default async function AuditPage() {
  await requirePageUser("audit:read");
  const events = await listAuditEvents({ limit: 200 });
  return (
    <>
      <PageHeader title="Audit" intro="Every change to people, profiles and releases, with who made it. Entries are written with the change itself and never edited." />
      {events.length === 0 ? (
        <EmptyState title="No changes recorded yet">Changes appear here as soon as someone invites a colleague, edits a profile or approves a release.</EmptyState>
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
