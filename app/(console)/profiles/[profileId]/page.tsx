import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { ReleasePanel } from "@/components/fleet/release-panel";
import { EffectiveTable } from "@/components/profiles/effective-table";
import { listSites } from "@/db/queries/fleet";
import { latestApprovedRevision } from "@/db/queries/profiles";
import { MigrateButton } from "@/components/profiles/migrate-button";
import { RevisionWorkspace } from "@/components/profiles/revision-workspace";
import { StateBadge } from "@/components/profiles/state-badge";
import { Badge, DataTable, Notice, PageHeader, Panel, Td } from "@/components/ui/surface";
import { getProfile, getRevision, listRevisions } from "@/db/queries/profiles";
import { listComments, listDecisions } from "@/db/queries/reviews";
import { requirePageUser } from "@/lib/auth/guard";
import { hasPermission } from "@/lib/auth/permissions";
import { loadEditingContext } from "@/lib/reviews/workflow";
import { formatUtc } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Profile" };

const LAYER_LABEL = { base: "Base profile", site: "Site overlay", controller: "Controller overlay" } as const;

export default async function ProfilePage({ params }: { params: Promise<{ profileId: string }> }) {
  const user = await requirePageUser("profiles:read");
  const id = Number((await params).profileId);
  if (!Number.isSafeInteger(id) || id <= 0) notFound();
  const profile = await getProfile({ profileId: id });
  if (!profile || !profile.headRevisionId) notFound();
  const [head, revisions, context] = await Promise.all([getRevision({ revisionId: profile.headRevisionId }), listRevisions({ profileId: id }), loadEditingContext(profile)]);
  if (!head) notFound();
  const [decisions, comments] = await Promise.all([listDecisions({ revisionId: head.id }), listComments({ revisionId: head.id })]);
  const canEdit = hasPermission(user.role, "profiles:edit");
  const canRelease = hasPermission(user.role, "releases:manage") && profile.layer === "base";
  const [approved, siteList] = canRelease ? await Promise.all([latestApprovedRevision({ profileId: id }), listSites()]) : [null, []];
  const previous = revisions.find((r) => r.number < head.number);
  const safetyContext = {
    ...(context.doorModel ? { doorModel: context.doorModel } : {}),
    ...(context.site ? { site: { latitude: context.site.latitude, longitude: context.site.longitude, timeZone: context.site.timeZone } } : {}),
  };
  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/profiles">← Profiles</Link>
      </p>
      <PageHeader
        title={profile.name}
        intro={
          <>
            {LAYER_LABEL[profile.layer]} for {profile.doorModelName ?? "a door model"}
            {profile.siteName ? ` at ${profile.siteName}` : ""} · parameter set {profile.schemaVersion} · newest revision r{head.number} <StateBadge state={head.state} />
          </>
        }
        actions={
          <>
            <a className="text-sm" href={`/api/v1/revisions/${head.id}?download=1`} download>
              Download r{head.number} as JSON
            </a>
            {previous && (
              <Link className="text-sm" href={`/profiles/${id}/compare?from=${previous.id}&to=${head.id}`}>
                Compare with r{previous.number}
              </Link>
            )}
          </>
        }
      />
      {profile.layer !== "base" && !context.base && <Notice tone="warn">This door model has no base profile yet, so the overlay cannot be checked. Create the base first.</Notice>}
      {profile.layer !== "base" && context.base && !context.base.approved && (
        <Notice tone="warn">The base profile has no approved revision yet; the checks below use its newest draft.</Notice>
      )}
      {canEdit && profile.schemaVersion === 1 && (
        <div className="mb-4">
          <MigrateButton profileId={id} revisionId={head.id} />
        </div>
      )}
      <div className="mt-4 grid grid-cols-[minmax(0,1fr)] gap-6 2xl:grid-cols-[minmax(0,1fr)_22rem]">
        <RevisionWorkspace
          profileId={id}
          revisionId={head.id}
          revisionNumber={head.number}
          state={head.state}
          version={head.schemaVersion as 1 | 2}
          layer={profile.layer}
          initialText={JSON.stringify(head.content, null, 2)}
          baseValues={context.base?.content}
          safetyContext={safetyContext}
          canEdit={canEdit}
        />
        <aside className="space-y-4">
          {canRelease && approved && (
            <Panel>
              <ReleasePanel revisionId={approved.id} revisionNumber={approved.number} sites={siteList.map((s) => ({ value: String(s.id), label: s.name }))} />
            </Panel>
          )}
          <Panel>
            <h2 className="mb-2 font-semibold">Review of r{head.number}</h2>
            {head.state === "in_review" && (
              <p className="text-sm">
                Needs {head.requiredApprovals} approval{head.requiredApprovals > 1 ? "s" : ""}
                {head.safetyRelevant ? " (it changes safety-relevant parameters)" : ""}. <Link href={`/reviews/${head.id}`}>Open the review</Link>
              </p>
            )}
            {decisions.length === 0 && comments.length === 0 && <p className="text-sm text-loam-600 dark:text-loam-400">No decisions or comments yet.</p>}
            <ul className="space-y-2 text-sm">
              {decisions.map((d) => (
                <li key={`d${d.id}`}>
                  <Badge tone={d.decision === "approve" ? "good" : "warn"}>{d.decision === "approve" ? "Approved" : "Changes asked"}</Badge> {d.reviewerName}
                  {d.comment && <span className="block text-loam-600 dark:text-loam-400">“{d.comment}”</span>}
                </li>
              ))}
              {comments.map((c) => (
                <li key={`c${c.id}`}>
                  <code className="font-mono text-xs">{c.path}</code> — {c.authorName}: {c.body}
                </li>
              ))}
            </ul>
          </Panel>
          {profile.layer !== "base" && context.base && context.base.schemaVersion === head.schemaVersion && (
            <Panel>
              <h2 className="mb-1 font-semibold">Effective at {profile.siteName ?? "this site"}</h2>
              <p className="mb-2 text-xs text-loam-600 dark:text-loam-400">The base profile&apos;s {context.base.approved ? "approved" : "newest"} revision with this overlay&apos;s r{head.number} on top.</p>
              <EffectiveTable version={head.schemaVersion as 1 | 2} layers={[{ layer: "base", values: context.base.content }, { layer: profile.layer, values: head.content }]} />
            </Panel>
          )}
          <Panel>
            <h2 className="mb-2 font-semibold">Revisions</h2>
            <DataTable caption="Revisions" headers={["#", "State", "By", "What"]}>
              {revisions.map((r) => (
                <tr key={r.id}>
                  <Td className="tabular-nums">r{r.number}</Td>
                  <Td>
                    <StateBadge state={r.state} />
                  </Td>
                  <Td>{r.authorName ?? "—"}</Td>
                  <Td>
                    {r.message}
                    <span className="block font-mono text-xs text-loam-600 dark:text-loam-400">
                      {formatUtc(r.createdAt)} · {r.contentHash.slice(0, 10)}
                    </span>
                    {r.id !== head.id && (
                      <Link className="text-xs" href={`/profiles/${id}/compare?from=${r.id}&to=${head.id}`}>
                        compare with r{head.number}
                      </Link>
                    )}
                  </Td>
                </tr>
              ))}
            </DataTable>
          </Panel>
        </aside>
      </div>
    </>
  );
}
