import { inArray, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { checkIns } from "@/db/schema";
import { listControllers } from "@/db/queries/controllers";
import { listLiveReleases, targetCovers, type ReleaseRow } from "@/db/queries/releases";
import { inStage } from "@/lib/fleet/stage";
import { contentHash } from "@/lib/profiles/canonical";
import { effectiveFor } from "./service";

export type FleetRow = Awaited<ReturnType<typeof listControllers>>[number] & {
  assignedHash: string | null;
  drift: boolean;
  doorCycles: number | null;
  timeFixAgeS: number | null;
  stallEvents: number | null;
};

/** Every controller with what it is assigned, whether it runs that (drift), and its latest counters. */
export async function fleetStatus(): Promise<FleetRow[]> {
  const list = await listControllers();
  if (!list.length) return [];
  const latest = await db
    .select({ controllerId: checkIns.controllerId, doorCycles: checkIns.doorCycles, timeFixAgeS: checkIns.timeFixAgeS, stallEvents: checkIns.stallEvents, id: checkIns.id })
    .from(checkIns)
    // The newest check-in of each controller: one indexed MAX(id) per controller.
    .where(inArray(checkIns.id, sql`(SELECT MAX(id) FROM check_ins GROUP BY controller_id)`));
  const last = new Map<number, (typeof latest)[number]>();
  for (const r of latest) if (!last.has(r.controllerId)) last.set(r.controllerId, r);
  const releasesByModel = new Map<number, ReleaseRow[]>();
  const hashCache = new Map<string, string>();
  const out: FleetRow[] = [];
  for (const c of list) {
    if (!releasesByModel.has(c.doorModelId)) releasesByModel.set(c.doorModelId, await listLiveReleases({ doorModelId: c.doorModelId }));
    const ref = { id: c.id, serial: c.serial, doorModelId: c.doorModelId, siteId: c.siteId, parameterSetVersion: c.parameterSetVersion };
    const release = releasesByModel.get(c.doorModelId)!.find((r) => targetCovers(r, ref) && inStage(c.serial, r.percent)) ?? null;
    let assignedHash: string | null = null;
    if (release) {
      // Controllers sharing a release, site and (no) own overlay share one effective configuration.
      const own = release.overlayRevisionIds[`serial:${c.serial}`] ? c.serial : "";
      const key = `${release.id}:${c.siteId}:${own}`;
      if (!hashCache.has(key)) hashCache.set(key, contentHash((await effectiveFor(release, ref)).values));
      assignedHash = hashCache.get(key)!;
    }
    const l = last.get(c.id);
    out.push({ ...c, assignedHash, drift: !!assignedHash && assignedHash !== c.runningHash, doorCycles: l?.doorCycles ?? null, timeFixAgeS: l?.timeFixAgeS ?? null, stallEvents: l?.stallEvents ?? null });
  }
  return out;
}

