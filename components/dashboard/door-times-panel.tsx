import Link from "next/link";
import { EmptyState } from "@/components/ui/surface";
import { listSites, type SiteSummary } from "@/db/queries/fleet";
import { asV2Document, doorTimesToday, sunTimesToday, type DoorNote, type DoorTimes } from "@/lib/dashboard/door-times";
import { siteSchedules, type ScheduleGroup } from "@/lib/dashboard/site-schedules";
import { formatLocalTime } from "@/lib/time/local-time";
import { loadFleet } from "./fleet-data";
import { DashPanel } from "./parts";

const NOTE_TONE: Record<DoorNote["tone"], string> = {
  bad: "border-ember-500 text-ember-700 dark:text-ember-100",
  warn: "border-straw-500 text-straw-700 dark:text-straw-100",
  info: "border-dusk-400 text-loam-800 dark:text-loam-100",
};

/** Today's opening and closing at each site, from the schedules its doors are given. */
export async function DoorTimesPanel({ now }: { now: Date }) {
  const [{ rows, released, approved }, sites] = await Promise.all([loadFleet(), listSites()]);
  if (sites.length === 0) {
    return (
      <DashPanel id="door-times" title="Door times today">
        <EmptyState title="No sites yet" action={<Link href="/sites">Go to Sites</Link>}>
          A technician adds each farm with its position and time zone; its doors&apos; opening and closing times then show here, worked out from its sunrise and civil dusk.
        </EmptyState>
      </DashPanel>
    );
  }
  const perSite = siteSchedules({ sites, controllers: rows, released, approved });
  return (
    <DashPanel id="door-times" title="Door times today" intro="In each site's own time, from the schedule released to its doors (or the approved base where nothing is released there yet)." link={{ href: "/sites", label: "Sites" }}>
      <ul className="grid gap-3 md:grid-cols-2">
        {perSite.map(({ site, groups }) => (
          <li key={site.id} className="min-w-0 rounded-md border border-loam-200 p-4 dark:border-loam-800">
            <SiteDay site={site} groups={groups} now={now} />
          </li>
        ))}
      </ul>
    </DashPanel>
  );
}

function SiteDay({ site, groups, now }: { site: SiteSummary; groups: ScheduleGroup[]; now: Date }) {
  const sun = sunTimesToday(site, now);
  return (
    <>
      <h3 className="font-semibold">{site.name}</h3>
      <p className="text-xs text-loam-600 dark:text-loam-400">
        {sun.date}, now {formatLocalTime(now, site.timeZone)} · {site.timeZone} · sunrise {sun.sunrise ?? "none"} · civil dusk {sun.civilDusk ?? "none"}
      </p>
      {groups.length === 0 ? (
        <p className="mt-2 text-sm text-loam-600 dark:text-loam-400">No controllers here yet.</p>
      ) : (
        <div className="mt-2 space-y-3">
          {groups.map((g) => (
            <Schedule key={g.key} site={site} group={g} now={now} />
          ))}
        </div>
      )}
    </>
  );
}

function sourceText(g: ScheduleGroup): string {
  const n = `${g.controllers} ${g.controllers === 1 ? "controller" : "controllers"}`;
  if (g.source.kind === "release") return `Release #${g.source.releaseId} · ${n}`;
  if (g.source.kind === "approved") return `Approved base of ${g.source.doorModelName}, not released here yet · ${n}`;
  return `${g.source.doorModelName}: no approved base yet · ${n}`;
}

function Schedule({ site, group, now }: { site: SiteSummary; group: ScheduleGroup; now: Date }) {
  const doc = group.values ? asV2Document(group.values) : null;
  const times: DoorTimes | null = doc ? doorTimesToday({ site, doc, now }) : null;
  return (
    <div className="border-t border-loam-100 pt-2 first:border-t-0 first:pt-0 dark:border-loam-800">
      {times ? (
        <>
          <dl className="flex flex-wrap gap-x-6 gap-y-1">
            <div>
              <dt className="text-xs text-loam-600 dark:text-loam-400">Opens</dt>
              <dd className="font-mono text-xl tabular-nums">{times.open ?? "—"}</dd>
            </div>
            <div>
              <dt className="text-xs text-loam-600 dark:text-loam-400">Closes</dt>
              <dd className="font-mono text-xl tabular-nums">{times.close ?? "—"}</dd>
            </div>
          </dl>
          <p className="mt-1 text-sm">{capitalise(times.rule)}.</p>
          {times.step && <p className="text-xs text-loam-600 dark:text-loam-400">{times.step}</p>}
          {times.notes.length > 0 && (
            <ul className="mt-2 space-y-1">
              {times.notes.map((n) => (
                <li key={n.text} className={`border-l-4 pl-2 text-xs ${NOTE_TONE[n.tone]}`}>
                  {n.text}
                </li>
              ))}
            </ul>
          )}
        </>
      ) : (
        <p className="text-sm text-loam-600 dark:text-loam-400">{group.values ? "This configuration's schedule could not be read." : "No schedule to show until the door model's base is approved."}</p>
      )}
      <p className="mt-1 text-xs text-loam-600 dark:text-loam-400">{sourceText(group)}</p>
    </div>
  );
}

const capitalise = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
