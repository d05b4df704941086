import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ComparisonView } from "@/components/profiles/comparison-view";
import { ReviewActions } from "@/components/profiles/review-actions";
import { StateBadge } from "@/components/profiles/state-badge";
import { Badge, Notice, PageHeader, Panel } from "@/components/ui/surface";
import { getProfile, getRevision, latestApprovedRevision } from "@/db/queries/profiles";
import { listAcknowledgements, listComments, listDecisions } from "@/db/queries/reviews";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission } from "@/lib/auth/permissions";
import { compareDocuments } from "@/lib/reviews/compare";
import { evaluateProfileContent } from "@/lib/reviews/workflow";
import { parameterInfo } from "@/lib/profiles/parameter-info";
import type { ParamsVersion } from "@/lib/profiles/schemas";

export const metadata: Metadata = { title: "Review" };

export default async function ReviewPage({ params }: { params: Promise<{ revisionId: string }> }) {
  const user = await requirePageUser("profiles:read");
  const id = Number((await params).revisionId);
  if (!Number.isSafeInteger(id) || id <= 0) notFound();
  const revision = await getRevision({ revisionId: id });
  if (!revision) notFound();
  const profile = (await getProfile({ profileId: revision.profileId }))!;
  const version = revision.schemaVersion as ParamsVersion;
  const approved = await latestApprovedRevision({ profileId: profile.id });
  const against = approved && approved.id !== revision.id ? approved : null;
  const [checks, decisions, comments, acks] = await Promise.all([
    evaluateProfileContent({ profile, version, content: revision.content }),
    listDecisions({ revisionId: id }),
    listComments({ revisionId: id }),
    listAcknowledgements({ revisionId: id }),
  ]);
  const comparison = compareDocuments(against?.content ?? {}, revision.content, version, { before: against ? `r${against.number} (approved)` : "nothing approved yet", after: `r${revision.number}` });
  const canDecide = hasPermission(user.role, "reviews:decide") && revision.state === "in_review" && revision.authorId !== user.id && !decisions.some((d) => d.reviewerId === user.id);
  const canComment = hasPermission(user.role, "reviews:comment");
  const approvals = decisions.filter((d) => d.decision === "approve" && d.contentHash === revision.contentHash).length;
  const paths = parameterInfo(version)
    .filter((p, i, all) => all.findIndex((q) => q.path === p.path) === i)
    .map((p) => ({ path: p.path, label: `${p.title}${p.unit ? ` (${p.unit})` : ""} — ${p.path}` }));
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/reviews">← Reviews</Link> · <Link href={`/profiles/${profile.id}`}>{profile.name}</Link>
      </p>
      <PageHeader
        title={`r${revision.number}: ${revision.message}`}
        intro={
          <>
            {profile.name} by {revision.authorName ?? "—"} · <StateBadge state={revision.state} /> · {approvals} of {revision.requiredApprovals} approvals
            {revision.safetyRelevant ? " · changes safety-relevant parameters" : ""}
          </>
        }
      />
      {revision.authorId === user.id && revision.state === "in_review" && <Notice tone="info">You wrote this revision, so another reviewer decides on it.</Notice>}
      <div className="mt-4 grid gap-6 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="space-y-6">
          <Panel>
            <h2 className="mb-1 text-lg font-semibold">Changes {against ? `since approved r${against.number}` : "(nothing approved before)"}</h2>
            <p className="mb-3 text-sm text-loam-600 dark:text-loam-400">Rows on a straw background are safety-relevant. Stall, close travel and timeout values decide whether a door stops on a bird or a hand: check them against the door.</p>
            <ComparisonView comparison={comparison} layer={profile.layer} comments={comments} />
          </Panel>
          <Panel>
            <h2 className="mb-2 text-lg font-semibold">Checks</h2>
            {checks.schemaIssues.length === 0 && checks.findings.length === 0 && <p className="text-sm">The schema and every safety rule pass.</p>}
            <ul className="space-y-2 text-sm">
              {checks.schemaIssues.map((i) => (
                <li key={i.path + i.message}>
                  <Badge tone="bad">schema</Badge> <code className="font-mono text-xs">{i.path || "(document)"}</code> {i.message}
                </li>
              ))}
              {checks.findings.map((f) => {
                const ack = acks.find((a) => a.ruleId === f.ruleId);
                return (
                  <li key={f.ruleId + f.message}>
                    <Badge tone={f.severity === "error" ? "bad" : "warn"}>{f.severity}</Badge> <span className="font-mono text-xs">{f.ruleId}</span> {f.message}
                    {ack && <span className="mt-1 block text-loam-600 dark:text-loam-400">Author&apos;s reason: “{ack.reason}”</span>}
                  </li>
                );
              })}
            </ul>
          </Panel>
        </div>
        <aside className="space-y-4">
          <Panel>
            <h2 className="mb-2 font-semibold">Decisions</h2>
            {decisions.length === 0 ? (
              <p className="text-sm text-loam-600 dark:text-loam-400">None yet.</p>
            ) : (
              <ul className="space-y-2 text-sm">
                {decisions.map((d) => (
                  <li key={d.id}>
                    <Badge tone={d.decision === "approve" ? "good" : "warn"}>{d.decision === "approve" ? "Approved" : "Sent back"}</Badge> {d.reviewerName}
                    {d.comment && <span className="block text-loam-600 dark:text-loam-400">“{d.comment}”</span>}
                  </li>
                ))}
              </ul>
            )}
          </Panel>
          {(canDecide || canComment) && (
            <Panel>
              <ReviewActions revisionId={id} contentHash={revision.contentHash} canDecide={canDecide} canComment={canComment} paths={paths} safetyRelevant={revision.safetyRelevant === 1} />
            </Panel>
          )}
        </aside>
      </div>
    </>
  );
}
