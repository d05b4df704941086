// Which schedules run at each site: the effective configuration released to its controllers, or,
// for door models with nothing released there yet, the approved base (with the site's approved overlay).

export type ScheduleSource = { kind: "release"; releaseId: number } | { kind: "approved"; doorModelName: string } | { kind: "none"; doorModelName: string };

export type ScheduleGroup = { key: string; source: ScheduleSource; controllers: number; values: Record<string, unknown> | null };

export type SiteSchedules<S> = { site: S; groups: ScheduleGroup[] };

type ControllerAt = { siteId: number; doorModelId: number; doorModelName: string; assignedHash: string | null };

/**
 * Groups each site's controllers by the configuration they are assigned (by hash), or by door model
 * where none is; sites without controllers come back with no groups. Largest group first.
 */
export function siteSchedules<S extends { id: number }>(input: {
  sites: readonly S[];
  controllers: readonly ControllerAt[];
  released: ReadonlyMap<string, { values: Record<string, unknown>; releaseId: number }>;
  approved: (doorModelId: number, siteId: number) => Record<string, unknown> | null;
}): SiteSchedules<S>[] {
  const bySite = new Map<number, Map<string, ScheduleGroup>>();
  for (const c of input.controllers) {
    let groups = bySite.get(c.siteId);
    if (!groups) bySite.set(c.siteId, (groups = new Map()));
    const hit = c.assignedHash ? input.released.get(c.assignedHash) : undefined;
    const key = hit ? `h:${c.assignedHash}` : `m:${c.doorModelId}`;
    const group = groups.get(key);
    if (group) {
      group.controllers++;
      continue;
    }
    if (hit) {
      groups.set(key, { key, source: { kind: "release", releaseId: hit.releaseId }, controllers: 1, values: hit.values });
    } else {
      const values = input.approved(c.doorModelId, c.siteId);
      groups.set(key, { key, source: values ? { kind: "approved", doorModelName: c.doorModelName } : { kind: "none", doorModelName: c.doorModelName }, controllers: 1, values });
    }
  }
  return input.sites.map((site) => ({
    site,
    groups: [...(bySite.get(site.id)?.values() ?? [])].sort((a, b) => b.controllers - a.controllers || a.key.localeCompare(b.key)),
  }));
}
