import Link from "next/link";
import type { ReactNode } from "react";
import { Badge, EmptyState } from "@/components/ui/surface";
import { listChangeRequests } from "@/db/queries/dashboard";
import { getProfile, getRevisions } from "@/db/queries/profiles";
import { listMyOpenRevisions, listReviewQueue } from "@/db/queries/reviews";
import type { SessionUser } from "@/lib/auth/guard";
import { hasPermission } from "@/lib/auth/permissions";
import { firstOf } from "@/lib/dashboard/fleet-health";
import { ago } from "@/lib/dashboard/format";
import { countChecks, revisionTodo, type RevisionChecks, type Todo } from "@/lib/dashboard/waiting";
import type { ParamsVersion } from "@/lib/profiles/schemas";
import { evaluateProfileContent } from "@/lib/reviews/workflow";
import { DashPanel, MoreLink, Quiet } from "./parts";

// Checking an overlay runs the safety rules over a year of sun times at its site, up to a tenth of a
// second each, so only the newest few are checked here; the others are checked on their own page.
const CHECKED = 5;

type Mine = Awaited<ReturnType<typeof listMyOpenRevisions>>[number];

async function checksOf(open: Mine[], now: Date): Promise<Map<number, RevisionChecks>> {
  const [revisions, profileList] = await Promise.all([
    getRevisions({ revisionIds: open.map((m) => m.revisionId) }),
    Promise.all([...new Set(open.map((m) => m.profileId))].map((profileId) => getProfile({ profileId }))),
  ]);
  const profiles = new Map(profileList.flatMap((p) => (p ? [[p.id, p] as const] : [])));
  const out = new Map<number, RevisionChecks>();
  await Promise.all(
    revisions.map(async (r) => {
      const profile = profiles.get(r.profileId);
      if (!profile) return;
      try {
        const evaluation = await evaluateProfileContent({ profile, version: r.schemaVersion as ParamsVersion, content: r.content, now });
        out.set(r.id, countChecks(evaluation));
      } catch {
        // A revision the checks cannot read still gets listed; its own page shows what is wrong.
      }
    }),
  );
  return out;
}

/** Reviews waiting for this person's decision and their own revisions that need a next step. */
export async function WaitingPanel({ user, now }: { user: SessionUser; now: Date }) {
  const canReview = hasPermission(user.role, "reviews:decide");
  const canEdit = hasPermission(user.role, "profiles:edit");
  const [queue, mine] = await Promise.all([canReview ? listReviewQueue({ reviewerId: user.id }) : Promise.resolve([]), canEdit ? listMyOpenRevisions({ authorId: user.id }) : Promise.resolve([])]);
  const open = mine.filter((m) => m.state !== "in_review");
  const inReview = mine.length - open.length;
  const checked = open.slice(0, CHECKED);
  const [checks, requests] = await Promise.all([checksOf(checked, now), listChangeRequests({ revisionIds: checked.filter((m) => m.state === "changes_requested").map((m) => m.revisionId) })]);
  const todos = open
    .map((m, i) => ({ m, todo: revisionTodo(m.state, i < CHECKED ? (checks.get(m.revisionId) ?? null) : null) }))
    .filter((x): x is { m: Mine; todo: Todo } => x.todo !== null)
    .sort((a, b) => a.todo.rank - b.todo.rank);
  const reviews = firstOf(queue);
  const own = firstOf(todos);

  return (
    <DashPanel id="waiting" title="Waiting for you">
      {!canReview && !canEdit ? (
        <p className="text-sm text-loam-600 dark:text-loam-400">{emptyHint(false, false, hasPermission(user.role, "calibrations:upload"), 0)}</p>
      ) : queue.length === 0 && todos.length === 0 ? (
        <EmptyState title={emptyTitle(canReview, canEdit)}>{emptyHint(canReview, canEdit, false, inReview)}</EmptyState>
      ) : (
        <div className={`grid gap-6 ${canReview && canEdit ? "lg:grid-cols-2" : ""}`}>
          {canReview && (
            <div className="min-w-0">
              <h3 className="mb-2 text-sm font-semibold uppercase tracking-wide text-loam-600 dark:text-loam-400">To review ({queue.length})</h3>
              {queue.length === 0 ? (
                <Quiet>Nothing waits for your decision.</Quiet>
              ) : (
                <ul className="divide-y divide-loam-100 dark:divide-loam-800">
                  {reviews.shown.map((q) => (
                    <li key={q.revisionId} className="flex flex-wrap items-start justify-between gap-x-3 gap-y-1 py-2">
                      <div className="min-w-0">
                        <Link href={`/reviews/${q.revisionId}`} className="font-medium">
                          {q.profileName} r{q.number}
                        </Link>
                        <p className="break-words text-sm text-loam-600 dark:text-loam-400">
                          {q.message} · by {q.authorName ?? "a former colleague"}
                          {q.submittedAt ? `, ${ago(q.submittedAt, now)}` : ""}
                        </p>
                      </div>
                      {q.safetyRelevant ? <Badge tone="warn">Safety: {q.requiredApprovals} approvals</Badge> : <Badge tone="info">Review</Badge>}
                    </li>
                  ))}
                </ul>
              )}
              <MoreLink more={reviews.more} href="/reviews" what="reviews" />
            </div>
          )}
          {canEdit && (
            <div className="min-w-0">
              <h3 className="mb-2 text-sm font-semibold uppercase tracking-wide text-loam-600 dark:text-loam-400">Your revisions ({todos.length})</h3>
              {todos.length === 0 ? (
                <Quiet>{inReview ? `None needs you: ${inReview} ${inReview === 1 ? "is" : "are"} with reviewers.` : "No open drafts."}</Quiet>
              ) : (
                <ul className="divide-y divide-loam-100 dark:divide-loam-800">
                  {own.shown.map(({ m, todo }) => {
                    const request = requests.get(m.revisionId);
                    return (
                      <li key={m.revisionId} className="flex flex-wrap items-start justify-between gap-x-3 gap-y-1 py-2">
                        <div className="min-w-0">
                          <Link href={`/profiles/${m.profileId}`} className="font-medium">
                            {m.profileName} r{m.number}
                          </Link>
                          <p className="text-sm text-loam-600 dark:text-loam-400">
                            {todo.action}
                            {request && <> · {request.reviewerName ?? "A reviewer"} asked{request.comment ? `: “${request.comment}”` : " for changes"}</>}
                          </p>
                        </div>
                        <Badge tone={todo.tone}>{todo.status}</Badge>
                      </li>
                    );
                  })}
                </ul>
              )}
              <MoreLink more={own.more} href="/profiles" what="revisions" />
              {inReview > 0 && todos.length > 0 && <p className="mt-2 text-sm text-loam-600 dark:text-loam-400">{inReview} more {inReview === 1 ? "is" : "are"} with reviewers.</p>}
            </div>
          )}
        </div>
      )}
    </DashPanel>
  );
}

function emptyTitle(canReview: boolean, canEdit: boolean): string {
  if (canReview && canEdit) return "Nothing to review or fix";
  return canReview ? "Nothing waits for your review" : "No drafts need you";
}

function emptyHint(canReview: boolean, canEdit: boolean, canCalibrate: boolean, inReview: number) {
  const parts: ReactNode[] = [];
  if (canEdit) {
    parts.push(
      inReview > 0 ? (
        <span key="e">
          {inReview} of your revisions {inReview === 1 ? "is" : "are"} with reviewers; you hear by mail when they decide. To change a door model&apos;s parameters, open it on <Link href="/profiles">Profiles</Link> and save a draft.
        </span>
      ) : (
        <span key="e">
          To change a door model&apos;s parameters, open it on <Link href="/profiles">Profiles</Link>, save a draft and submit it: its schema and safety checks show here until it goes to review.
        </span>
      ),
    );
  }
  if (canReview) parts.push(<span key="r"> When an engineer submits a revision it appears here, and you get a mail.</span>);
  if (!canReview && !canEdit) {
    parts.push(
      canCalibrate ? (
        <span key="o">
          Reviews and drafts belong to engineers and reviewers. Fleet health below lists controllers that need a visit; after work on a door, upload a calibration run from its page on <Link href="/controllers">Controllers</Link>.
        </span>
      ) : (
        <span key="o">You can read profiles, controllers and sites; engineers, reviewers and technicians make the changes. Fleet health below shows where the doors stand.</span>
      ),
    );
  }
  return <>{parts}</>;
}
