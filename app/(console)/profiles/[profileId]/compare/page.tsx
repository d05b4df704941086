import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ComparisonView } from "@/components/profiles/comparison-view";
import { Notice, PageHeader } from "@/components/ui/surface";
import { getProfile, getRevisions } from "@/db/queries/profiles";
import { requirePageUser } from "@/lib/auth/guard";
import { compareDocuments } from "@/lib/reviews/compare";
import type { ParamsVersion } from "@/lib/profiles/schemas";

export const metadata: Metadata = { title: "Compare revisions" };

export default async function ComparePage({ params, searchParams }: { params: Promise<{ profileId: string }>; searchParams: Promise<{ from?: string; to?: string }> }) {
  await requirePageUser("profiles:read");
  const profileId = Number((await params).profileId);
  const { from, to } = await searchParams;
  const ids = [Number(from), Number(to)];
  if (!Number.isSafeInteger(profileId) || ids.some((n) => !Number.isSafeInteger(n) || n <= 0)) notFound();
  const profile = await getProfile({ profileId });
  const revisions = await getRevisions({ revisionIds: ids });
  const a = revisions.find((r) => r.id === ids[0]);
  const b = revisions.find((r) => r.id === ids[1]);
  if (!profile || !a || !b || a.profileId !== profileId || b.profileId !== profileId) notFound();
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href={`/profiles/${profileId}`}>← {profile.name}</Link>
      </p>
      <PageHeader title={`r${a.number} → r${b.number}`} intro={`${profile.name}: what changed between the two revisions.`} />
      {a.schemaVersion !== b.schemaVersion ? (
        <Notice tone="warn">These revisions use different parameter sets ({a.schemaVersion} and {b.schemaVersion}); migrate one to compare them.</Notice>
      ) : (
        <ComparisonView comparison={compareDocuments(a.content, b.content, a.schemaVersion as ParamsVersion, { before: `r${a.number}`, after: `r${b.number}` })} layer={profile.layer} />
      )}
    </>
  );
}
