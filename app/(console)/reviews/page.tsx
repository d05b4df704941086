import type { Metadata } from "next";
import Link from "next/link";
import { ReviewQueue } from "@/components/profiles/review-queue";
import { StateBadge } from "@/components/profiles/state-badge";
import { DataTable, PageHeader, Td } from "@/components/ui/surface";
import { listMyOpenRevisions } from "@/db/queries/reviews";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Reviews" };

export default async function ReviewsPage() {
  const user = await requirePageUser("reviews:decide");
  const mine = await listMyOpenRevisions({ authorId: user.id });
  return (
    <>
      <PageHeader title="Reviews" intro="Submitted profile changes wait here until reviewers other than their author approve them or send them back." />
      <ReviewQueue />
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
