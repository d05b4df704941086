import type { Metadata } from "next";
import Link from "next/link";
import { StateBadge } from "@/components/profiles/state-badge";
import { Badge, DataTable, EmptyState, PageHeader, Td } from "@/components/ui/surface";
import { listMyOpenRevisions, listReviewQueue } from "@/db/queries/reviews";
import { requirePageUser } from "@/lib/auth/guard";
import { formatUtc } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Reviews" };

export default async function ReviewsPage() {
  const user = await requirePageUser("reviews:decide");
  const [queue, mine] = await Promise.all([listReviewQueue({ reviewerId: user.id }), listMyOpenRevisions({ authorId: user.id })]);
  return (
    <>
      <PageHeader title="Reviews" intro="Submitted profile changes wait here until reviewers other than their author approve them or send them back." />
      {queue.length === 0 ? (
        <EmptyState title="Nothing waits for you">When an engineer submits a change, it appears here with its comparison, its schema check and its safety findings.</EmptyState>
      ) : (
        <DataTable caption="Waiting for your review" headers={["Change", "Profile", "By", "Submitted", "Needs"]}>
          {queue.map((q) => (
            <tr key={q.revisionId}>
              <Td>
                <Link href={`/reviews/${q.revisionId}`} className="font-medium">
                  r{q.number}: {q.message}
                </Link>
              </Td>
              <Td>{q.profileName}</Td>
              <Td>{q.authorName ?? "—"}</Td>
              <Td className="whitespace-nowrap font-mono text-xs">{q.submittedAt ? formatUtc(q.submittedAt) : "—"}</Td>
              <Td>
                {q.requiredApprovals} approval{q.requiredApprovals > 1 ? "s" : ""} {q.safetyRelevant ? <Badge tone="warn">safety</Badge> : null}
              </Td>
            </tr>
          ))}
        </DataTable>
      )}
      {mine.length > 0 && (
        <section className="mt-8">
          <h2 className="mb-2 text-lg font-semibold">Your own open revisions</h2>
          <DataTable caption="Your open revisions" headers={["Revision", "Profile", "State"]}>
            {mine.map((m) => (
              <tr key={m.revisionId}>
                <Td>
                  <Link href={`/profiles/${m.profileId}`}>
                    r{m.number}: {m.message}
                  </Link>
                </Td>
                <Td>{m.profileName}</Td>
                <Td>
                  <StateBadge state={m.state} />
                </Td>
              </tr>
            ))}
          </DataTable>
        </section>
      )}
    </>
  );
}
