import type { Metadata } from "next";
import { EmptyState, PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Reviews" };

export default async function ReviewsPage() {
  await requirePageUser("reviews:decide");
  return (
    <>
      <PageHeader title="Reviews" intro="Submitted profile changes wait here until a reviewer other than their author approves them or sends them back." />
      <EmptyState title="Nothing waits for you">
        When an engineer submits a change, it appears here with its comparison against the current revision, its schema check and its safety findings.
      </EmptyState>
    </>
  );
}
