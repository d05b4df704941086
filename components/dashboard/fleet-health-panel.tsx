import Link from "next/link";
import { Suspense } from "react";
import { EmptyState } from "@/components/ui/surface";
import { listTimeFixLost } from "@/db/queries/dashboard";
import { checkInIntervalOf, classifyNotSeen, DEFAULT_CHECK_IN_INTERVAL_S, firstOf, listDrift, MISSED_INTERVALS, TIME_FIX_LIMIT_S } from "@/lib/dashboard/fleet-health";
import { formatDuration } from "@/lib/dashboard/format";
import { STALL_WINDOW_DAYS } from "@/lib/dashboard/stall-increase";
import { loadFleet, weeklyStalls } from "./fleet-data";
import { HealthCard } from "./health-card";
import { DashPanel } from "./parts";

const LIST = 10;

/** Controllers gone quiet, without a time fix, running something other than assigned, or stalling this week. */
export async function FleetHealthPanel({ now }: { now: Date }) {
  const [{ rows, released }, timeFix] = await Promise.all([loadFleet(), listTimeFixLost({ thresholdS: TIME_FIX_LIMIT_S, limit: LIST })]);
  if (rows.length === 0) {
    return (
      <DashPanel id="fleet-health" title="Fleet health">
        <EmptyState title="No controllers yet" action={<Link href="/controllers">Go to Controllers</Link>}>
          A technician registers each controller with its serial, site and door model. Once installed, it checks in every {formatDuration(DEFAULT_CHECK_IN_INTERVAL_S)} or so, and this panel shows the ones that need a look.
        </EmptyState>
      </DashPanel>
    );
  }
  const seen = classifyNotSeen(
    rows.map((r) => ({ serial: r.serial, siteName: r.siteName, lastSeenAt: r.lastSeenAt, intervalS: checkInIntervalOf(r.assignedHash ? released.get(r.assignedHash)?.values : null) })),
    now,
  );
  const quiet = firstOf(seen.overdue, LIST);
  const drift = listDrift(rows);
  const drifting = firstOf(drift, LIST);
  return (
    <DashPanel id="fleet-health" title="Fleet health" intro={`${rows.length} ${rows.length === 1 ? "controller" : "controllers"} registered.`} link={{ href: "/controllers", label: "All controllers" }}>
      <div className="grid gap-3 sm:grid-cols-2 xl:grid-cols-4">
        <HealthCard
          id="health-not-seen"
          title="Not seen"
          count={seen.overdue.length}
          unit="controllers"
          rule={`No check-in for more than ${MISSED_INTERVALS} of its check-in intervals (from its released configuration; ${formatDuration(DEFAULT_CHECK_IN_INTERVAL_S)}, the schema default, where nothing is released).`}
          items={quiet.shown.map((n) => ({ serial: n.serial, siteName: n.siteName, detail: <span title={`every ${formatDuration(n.intervalS)}`}>{formatDuration(n.silentS)}</span> }))}
          more={quiet.more}
          calm="Every installed controller checked in on time."
          extra={seen.neverSeen > 0 ? `${seen.neverSeen} registered ${seen.neverSeen === 1 ? "controller has" : "controllers have"} never checked in: not yet installed, or no network link.` : undefined}
        />
        <HealthCard
          id="health-time-fix"
          title="Time fix lost"
          count={timeFix.total}
          unit="controllers"
          rule={`Newest check-in reports no good time fix for over ${formatDuration(TIME_FIX_LIMIT_S)}: long-wave signals usually come in at night, so a whole day without one means a missed night (common practice).`}
          items={timeFix.rows.map((t) => ({ serial: t.serial, siteName: t.siteName, detail: formatDuration(t.timeFixAgeS) }))}
          more={timeFix.total - timeFix.rows.length}
          calm="Every clock had a fix within the last day."
          extra={timeFix.noFix > 0 ? `${timeFix.noFix} more ${timeFix.noFix === 1 ? "reports" : "report"} no fix at all: expected only for a clock on its real-time clock alone.` : undefined}
        />
        <HealthCard
          id="health-drift"
          title="Drift"
          count={drift.length}
          unit="controllers"
          rule="Running a configuration other than the one its release assigns: it has not polled since, or it refused the new one (its check-ins say why)."
          items={drifting.shown.map((d) => ({ serial: d.serial, siteName: d.siteName, detail: d.reason === "other" ? "runs another" : "not reported yet" }))}
          more={drifting.more}
          calm="Every controller runs what it is assigned."
        />
        {/* The week's stalls read the most rows; the other figures do not wait for them. */}
        <Suspense fallback={<CardSkeleton title={STALLS_TITLE} />}>
          <StallsCard now={now} />
        </Suspense>
      </div>
    </DashPanel>
  );
}

const STALLS_TITLE = `Stalls, last ${STALL_WINDOW_DAYS} days`;

async function StallsCard({ now }: { now: Date }) {
  const stalls = await weeklyStalls(now, LIST);
  return (
    <HealthCard
      id="health-stalls"
      title={STALLS_TITLE}
      count={stalls.events}
      unit="stall events"
      rule={`Increase of each controller's stall counter over its check-ins of the last ${STALL_WINDOW_DAYS} days; a counter that restarted after a reboot counts from zero. Stall detection is a second line of defence, not a guarantee: look at the door.`}
      items={stalls.rows.map((s) => ({ serial: s.serial, siteName: s.siteName, detail: `${s.increase} ${s.increase === 1 ? "stall" : "stalls"}` }))}
      more={stalls.total - stalls.rows.length}
      calm="No stall reported this week."
    />
  );
}

function CardSkeleton({ title }: { title: string }) {
  return (
    <section className="min-w-0 rounded-md border border-loam-200 p-4 dark:border-loam-800">
      <h3 className="text-sm font-semibold">{title}</h3>
      <div aria-hidden className="mt-3 h-4 w-2/3 animate-pulse rounded bg-loam-100 dark:bg-loam-800" />
    </section>
  );
}
