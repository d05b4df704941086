import { listControllersOfModel, targetCovers, type ReleaseRow } from "@/db/queries/releases";
import { inStage } from "@/lib/fleet/stage";
import { contentHash } from "@/lib/profiles/canonical";
import { effectiveFor } from "./service";

/** For one release: controllers in its target, in its current stage, and running what it serves them. */
export async function adoptionOf(release: ReleaseRow) {
  const all = (await listControllersOfModel({ doorModelId: release.doorModelId })).filter((c) => targetCovers(release, c));
  const staged = all.filter((c) => inStage(c.serial, release.percent));
  let running = 0;
  for (const c of staged) {
    const eff = await effectiveFor(release, c);
    if (c.runningHash === contentHash(eff.values)) running++;
  }
  return { target: all.length, staged: staged.length, running };
}
