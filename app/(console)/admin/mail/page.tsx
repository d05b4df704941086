import type { Metadata } from "next";
import Link from "next/link";
import { Badge, DataTable, EmptyState, PageHeader, Td } from "@/components/ui/surface";
import { listCapturedMails, listOutbox } from "@/db/queries/mail";
import { requirePageUser } from "@/lib/auth/guard";
import { formatUtc } from "@/lib/time/local-time";
import { RetryButton } from "./retry-button";

export const metadata: Metadata = { title: "Mail" };

const STATUS_TONE = { queued: "info", sent: "good", failed: "bad" } as const;
const KIND_LABEL = { invitation: "Invitation", password_reset: "Password reset", notice: "Notice" } as const;

export default async function MailPage() {
  await requirePageUser("mail:read");
  const [outbox, captured] = await Promise.all([listOutbox({ limit: 50 }), listCapturedMails({ limit: 50 })]);
  return (
    <>
      <PageHeader
        title="Mail"
        intro="Everything Roostline sends goes through the outbox first, so a failed delivery is visible here and retried. In development and the demo, a local SMTP stand-in captures the messages below."
      />
      <h2 className="mb-2 text-lg font-semibold">Outbox</h2>
      {outbox.length === 0 ? (
        <EmptyState title="Nothing sent yet">Invitations and password resets appear here.</EmptyState>
      ) : (
        <DataTable caption="Outbox" headers={["Queued", "To", "Kind", "Status", "Actions"]}>
          {outbox.map((m) => (
            <tr key={m.id}>
              <Td className="whitespace-nowrap font-mono text-xs tabular-nums">{formatUtc(m.createdAt)}</Td>
              <Td>{m.toAddress}</Td>
              <Td>{KIND_LABEL[m.kind]}</Td>
              <Td>
                <Badge tone={STATUS_TONE[m.status]}>{m.status === "failed" ? `failed (${m.attempts}×)` : m.status}</Badge>
                {m.lastError && <span className="mt-1 block text-xs text-ember-700 dark:text-ember-100">{m.lastError}</span>}
              </Td>
              <Td>{m.status !== "sent" && <RetryButton mailId={m.id} />}</Td>
            </tr>
          ))}
        </DataTable>
      )}
      <h2 className="mb-2 mt-8 text-lg font-semibold">Captured by the local stand-in</h2>
      {captured.length === 0 ? (
        <EmptyState title="No captured messages">Invite someone from People; the message shows up here within a second.</EmptyState>
      ) : (
        <DataTable caption="Captured messages" headers={["Received", "To", "Subject"]}>
          {captured.map((m) => (
            <tr key={m.id}>
              <Td className="whitespace-nowrap font-mono text-xs tabular-nums">{formatUtc(m.receivedAt)}</Td>
              <Td>{m.envelopeTo}</Td>
              <Td>
                <Link href={`/admin/mail/${m.id}`}>{m.subject}</Link>
              </Td>
            </tr>
          ))}
        </DataTable>
      )}
    </>
  );
}
