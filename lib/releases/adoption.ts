import { adoptionByDay, listControllersOfModel, targetCovers, type ReleaseRow } from "@/db/queries/releases";
import { inStage } from "@/lib/fleet/stage";
import { contentHash } from "@/lib/profiles/canonical";
import { effectiveFor } from "./service";

/** For one release: controllers in its target, in its current stage, and running what it serves them. */
export async function adoptionOf(release: ReleaseRow) {
  const all = (await listControllersOfModel({ doorModelId: release.doorModelId })).filter((c) => targetCovers(release, c));
  const staged = all.filter((c) => inStage(c.serial, release.percent));
  let running = 0;
  const hashes = new Set<string>();
  const byKey = new Map<string, string>();
  for (const c of staged) {
    // Controllers at one site without an overlay of their own share one configuration.
    const key = `${c.siteId}:${release.overlayRevisionIds[`serial:${c.serial}`] ? c.serial : ""}`;
    const hash = byKey.get(key) ?? contentHash((await effectiveFor(release, c)).values);
    byKey.set(key, hash);
    hashes.add(hash);
    if (c.runningHash === hash) running++;
  }
  const history = await adoptionByDay({ controllerIds: staged.map((c) => c.id), hashes: [...hashes], since: release.createdAt });
  return { target: all.length, staged: staged.length, running, history };
}
