// The fleet as the overview sees it, loaded once per request and shared by the fleet-health and
// door-times panels: every controller's status (lib/releases/fleet-status.ts, which decides
// assignment and drift), and the effective values behind each assigned configuration hash.
import { cache } from "react";
import { listApprovedLayers, listLiveReleaseSummaries, listWeeklyStalls, type WeeklyStalls } from "@/db/queries/dashboard";
import { targetCovers } from "@/db/queries/releases";
import { stallWindowStart } from "@/lib/dashboard/stall-increase";
import { inStage } from "@/lib/fleet/stage";
import { contentHash } from "@/lib/profiles/canonical";
import { mergeLayers } from "@/lib/profiles/merge";
import { fleetStatus } from "@/lib/releases/fleet-status";
import { effectiveFor } from "@/lib/releases/service";

export type Released = { values: Record<string, unknown>; releaseId: number };

/** Live releases with their names, once per request. */
export const loadLiveReleases = cache(listLiveReleaseSummaries);

async function load() {
  const [rows, live, layers] = await Promise.all([fleetStatus(), loadLiveReleases(), listApprovedLayers()]);
  // fleetStatus gives each controller its assigned hash; to read the values behind a hash, work out
  // the configuration once per hash. Releases come newest first, as in the assignment itself, and a
  // controller whose hash is already known is skipped before its stage is hashed.
  const released = new Map<string, Released>();
  const done = new Set<string>();
  for (const { release } of live) {
    for (const c of rows) {
      if (!c.assignedHash || released.has(c.assignedHash) || c.doorModelId !== release.doorModelId) continue;
      if (!targetCovers(release, c) || !inStage(c.serial, release.percent)) continue;
      const key = `${release.id}:${c.siteId}:${release.overlayRevisionIds[`serial:${c.serial}`] ? c.serial : ""}`;
      if (done.has(key)) continue;
      done.add(key);
      const eff = await effectiveFor(release, c);
      const hash = contentHash(eff.values);
      if (!released.has(hash)) released.set(hash, { values: eff.values, releaseId: release.id });
    }
  }
  const base = new Map<number, Record<string, unknown>>();
  const overlay = new Map<string, Record<string, unknown>>();
  for (const l of layers) {
    if (l.layer === "base" && l.doorModelId !== null) base.set(l.doorModelId, l.content);
    if (l.layer === "site" && l.doorModelId !== null && l.siteId !== null) overlay.set(`${l.doorModelId}:${l.siteId}`, l.content);
  }
  /** What a release made now would give a door model at a site: its approved base ← the site's approved overlay. */
  const approved = (doorModelId: number, siteId: number): Record<string, unknown> | null => {
    const b = base.get(doorModelId);
    if (!b) return null;
    const o = overlay.get(`${doorModelId}:${siteId}`);
    return mergeLayers([{ layer: "base", values: b }, ...(o ? [{ layer: "site" as const, values: o }] : [])]).values;
  };
  return { rows, live, released, approved };
}

/** The fleet's controllers, live releases and configuration values, once per request. */
export const loadFleet = cache(load);

// The week's stall figure reads every check-in of the last seven days: millions of rows with
// 10,000 controllers. Each process keeps it for a minute, which a weekly figure does not notice,
// so many people opening the overview cost the database one such read a minute, not one each.
const STALL_MEMO_MS = 60_000;
let stallMemo: { bucket: number; limit: number; value: Promise<WeeklyStalls> } | undefined;

/** Stall events of the last seven days (the top `limit` controllers), at most a minute old. */
export function weeklyStalls(now: Date, limit: number): Promise<WeeklyStalls> {
  const bucket = Math.floor(now.getTime() / STALL_MEMO_MS);
  if (stallMemo?.bucket !== bucket || stallMemo.limit !== limit) {
    const value = listWeeklyStalls({ since: stallWindowStart(new Date(bucket * STALL_MEMO_MS)), limit });
    const memo = { bucket, limit, value };
    stallMemo = memo;
    value.catch(() => {
      if (stallMemo === memo) stallMemo = undefined;
    });
  }
  return stallMemo.value;
}
