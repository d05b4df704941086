import type { Metadata } from "next";
import Link from "next/link";
import { EmptyState, PageHeader, Panel } from "@/components/ui/surface";
import { getOverviewCounts, listSites } from "@/db/queries/fleet";
import { listMyOpenRevisions, listReviewQueue } from "@/db/queries/reviews";
import { StateBadge } from "@/components/profiles/state-badge";
import { hasPermission } from "@/lib/auth/permissions";
import { requirePageUser } from "@/lib/auth/guard";
import { ROLE_SUMMARIES } from "@/lib/auth/permissions";
import { navFor } from "@/lib/nav";
import { formatLocalTime } from "@/lib/time/local-time";

export const metadata: Metadata = { title: "Overview" };

export default async function OverviewPage() {
  const user = await requirePageUser("dashboard:read");
  const [counts, sites, queue, mine] = await Promise.all([
    getOverviewCounts(),
    listSites(),
    hasPermission(user.role, "reviews:decide") ? listReviewQueue({ reviewerId: user.id }) : Promise.resolve([]),
    hasPermission(user.role, "profiles:edit") ? listMyOpenRevisions({ authorId: user.id }) : Promise.resolve([]),
  ]);
  const now = new Date();
  const areas = navFor(user.role).filter((n) => n.href !== "/");
  return (
    <>
      <PageHeader title={`Good to see you, ${user.name.split(" ")[0]}`} intro={ROLE_SUMMARIES[user.role]} />
      <div className="grid gap-4 sm:grid-cols-3">
        <Stat label="Sites" value={counts.sites} href="/sites" />
        <Stat label="Door models" value={counts.doorModels} href="/profiles" />
        <Stat label="People with access" value={counts.people} href={hasPermission(user.role, "users:manage") ? "/admin/users" : undefined} />
      </div>
      {(queue.length > 0 || mine.length > 0) && (
        <Panel className="mt-6">
          <h2 className="mb-3 text-lg font-semibold">Waiting for you</h2>
          <ul className="space-y-2 text-sm">
            {queue.map((q) => (
              <li key={`q${q.revisionId}`}>
                Review <Link href={`/reviews/${q.revisionId}`}>{q.profileName} r{q.number}</Link> by {q.authorName ?? "—"}: {q.message}
              </li>
            ))}
            {mine.map((m) => (
              <li key={`m${m.revisionId}`}>
                Your <Link href={`/profiles/${m.profileId}`}>{m.profileName} r{m.number}</Link> <StateBadge state={m.state} />
              </li>
            ))}
          </ul>
        </Panel>
      )}
      <div className="mt-6 grid gap-6 lg:grid-cols-2">
        <Panel>
          <h2 className="mb-3 text-lg font-semibold">Local time at each site</h2>
          {sites.length === 0 ? (
            <EmptyState title="No sites yet">A technician adds the farms where doors are installed.</EmptyState>
          ) : (
            <ul className="divide-y divide-loam-100 dark:divide-loam-800">
              {sites.map((s) => (
                <li key={s.id} className="flex justify-between py-2 text-sm">
                  <span>{s.name}</span>
                  <span className="font-mono tabular-nums">{formatLocalTime(now, s.timeZone)}</span>
                </li>
              ))}
            </ul>
          )}
        </Panel>
        <Panel>
          <h2 className="mb-3 text-lg font-semibold">Your areas</h2>
          <ul className="space-y-2">
            {areas.map((a) => (
              <li key={a.href}>
                <Link href={a.href} className="font-medium">
                  {a.label}
                </Link>
                <span className="text-sm text-loam-600 dark:text-loam-400"> — {a.description}</span>
              </li>
            ))}
          </ul>
        </Panel>
      </div>
    </>
  );
}

function Stat({ label, value, href }: { label: string; value: number; href?: string }) {
  const body = (
    <>
      <p className="text-sm text-loam-600 dark:text-loam-400">{label}</p>
      <p className="mt-1 text-3xl font-semibold tabular-nums">{value}</p>
    </>
  );
  return (
    <Panel className="p-4">
      {href ? (
        <Link href={href} className="block text-inherit no-underline hover:no-underline dark:text-inherit">
          {body}
        </Link>
      ) : (
        body
      )}
    </Panel>
  );
}
