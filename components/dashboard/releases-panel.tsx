import Link from "next/link";
import { Badge } from "@/components/ui/surface";
import type { LiveRelease } from "@/db/queries/dashboard";
import { firstOf } from "@/lib/dashboard/fleet-health";
import { adoptionProgress } from "@/lib/dashboard/format";
import { adoptionOf } from "@/lib/releases/adoption";
import { loadLiveReleases } from "./fleet-data";
import { DashPanel, MoreLink } from "./parts";
import { ProgressBar } from "./progress-bar";

function targetText(r: LiveRelease): string {
  const t = r.release;
  if (t.targetKind === "door_model") return `every ${r.doorModelName}`;
  if (t.targetKind === "site") return `${r.doorModelName} at ${r.siteName ?? "a removed site"}`;
  const n = t.targetSerials?.length ?? 0;
  return `${n} listed ${n === 1 ? "controller" : "controllers"}`;
}

/** Active and paused releases with how far each has got: controllers running it out of those in its stage. */
export async function ReleasesPanel() {
  const live = await loadLiveReleases();
  const list = firstOf(live, 10);
  const adoption = await Promise.all(list.shown.map((r) => adoptionOf(r.release)));
  return (
    <DashPanel id="releases-in-progress" title="Releases in progress" link={{ href: "/releases", label: "All releases" }}>
      {live.length === 0 ? (
        <p className="text-sm text-loam-600 dark:text-loam-400">
          Nothing is being released. An admin releases an approved base revision from its profile page, first to a share of its controllers; its progress shows here.
        </p>
      ) : (
        <ul className="space-y-4">
          {list.shown.map((r, i) => {
            const a = adoption[i]!;
            const progress = adoptionProgress(a);
            const label = `Release #${r.release.id}, ${r.profileName} r${r.revisionNumber}`;
            return (
              <li key={r.release.id}>
                <div className="mb-1 flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
                  <Link href="/releases" className="font-medium">
                    {label}
                  </Link>
                  <Badge tone={r.release.state === "active" ? "good" : "warn"}>{r.release.state === "active" ? "Active" : "Paused"}</Badge>
                </div>
                <ProgressBar label={`${label}: controllers running it`} progress={progress} tone={r.release.state === "active" ? "good" : "warn"} />
                <p className="mt-1 text-sm text-loam-600 dark:text-loam-400">
                  {progress.text} · stage {r.release.percent} % of {targetText(r)} ({a.target} in target)
                </p>
              </li>
            );
          })}
        </ul>
      )}
      <MoreLink more={list.more} href="/releases" what="releases" />
    </DashPanel>
  );
}
