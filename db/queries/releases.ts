import { and, desc, eq, gte, inArray, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { checkIns, configGeneration, controllers, doorModels, profileRevisions, profiles, releases } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { recordAudit } from "./audit";

export type ReleaseRow = typeof releases.$inferSelect;
export type ReleaseTarget = { kind: "door_model" } | { kind: "site"; siteId: number } | { kind: "controllers"; serials: string[] };

/** Whether a release's target covers a controller (its stage is decided separately). */
export function targetCovers(r: Pick<ReleaseRow, "doorModelId" | "targetKind" | "targetSiteId" | "targetSerials">, c: { serial: string; doorModelId: number; siteId: number }): boolean {
  if (r.doorModelId !== c.doorModelId) return false;
  if (r.targetKind === "door_model") return true;
  if (r.targetKind === "site") return r.targetSiteId === c.siteId;
  return (r.targetSerials ?? []).includes(c.serial);
}

/** Releases still in force (active or paused) for a door model, newest first. */
export async function listLiveReleases({ doorModelId }: { doorModelId: number }): Promise<ReleaseRow[]> {
  return db
    .select()
    .from(releases)
    .where(and(eq(releases.doorModelId, doorModelId), inArray(releases.state, ["active", "paused"])))
    .orderBy(desc(releases.id));
}

/** Every release, newest first. */
export async function listReleases({ limit = 100 }: { limit?: number } = {}) {
  return db
    .select({ release: releases, profileName: profiles.name, revisionNumber: profileRevisions.number })
    .from(releases)
    .innerJoin(profileRevisions, eq(profileRevisions.id, releases.baseRevisionId))
    .innerJoin(profiles, eq(profiles.id, profileRevisions.profileId))
    .orderBy(desc(releases.id))
    .limit(limit);
}

/** One release, or null. */
export async function getRelease({ releaseId }: { releaseId: number }): Promise<ReleaseRow | null> {
  const [row] = await db.select().from(releases).where(eq(releases.id, releaseId)).limit(1);
  return row ?? null;
}

/** Controllers of a door model, for release checks and adoption counts. */
export async function listControllersOfModel({ doorModelId }: { doorModelId: number }) {
  return db
    .select({ id: controllers.id, serial: controllers.serial, siteId: controllers.siteId, doorModelId: controllers.doorModelId, runningHash: controllers.runningHash, parameterSetVersion: controllers.parameterSetVersion })
    .from(controllers)
    .where(eq(controllers.doorModelId, doorModelId));
}

/** Moves the configuration generation on, inside the transaction that changes releases (see configGeneration). */
export async function bumpConfigGeneration(tx: Tx) {
  await tx
    .insert(configGeneration)
    .values({ id: 1, generation: 1 })
    .onDuplicateKeyUpdate({ set: { generation: sql`${configGeneration.generation} + 1` } });
}

function sameTarget(r: ReleaseRow, t: ReleaseTarget): boolean {
  if (r.targetKind !== t.kind) return false;
  if (t.kind === "site") return r.targetSiteId === t.siteId;
  if (t.kind === "controllers") return [...(r.targetSerials ?? [])].sort().join(",") === [...t.serials].sort().join(",");
  return true;
}

/**
 * Creates a release with its audit event in one transaction. The door model's row is locked, so two
 * admins releasing the same revision to the same target at once get one release and one 409.
 */
export async function insertRelease(input: {
  actorId: string;
  baseRevisionId: number;
  doorModelId: number;
  overlayRevisionIds: Record<string, number>;
  target: ReleaseTarget;
  percent: number;
  note?: string | null;
}) {
  return db.transaction(async (tx) => {
    await tx.select({ id: doorModels.id }).from(doorModels).where(eq(doorModels.id, input.doorModelId)).for("update");
    const live = await tx
      .select()
      .from(releases)
      .where(and(eq(releases.doorModelId, input.doorModelId), eq(releases.baseRevisionId, input.baseRevisionId), inArray(releases.state, ["active", "paused"])));
    const twin = live.find((r) => sameTarget(r, input.target));
    if (twin) {
      throw new AppError("conflict", `Release ${twin.id} already puts this revision on this target (${twin.percent} %, ${twin.state}); widen or resume it instead.`);
    }
    const [row] = await tx
      .insert(releases)
      .values({
        baseRevisionId: input.baseRevisionId,
        doorModelId: input.doorModelId,
        overlayRevisionIds: input.overlayRevisionIds,
        targetKind: input.target.kind,
        targetSiteId: input.target.kind === "site" ? input.target.siteId : null,
        targetSerials: input.target.kind === "controllers" ? input.target.serials : null,
        percent: input.percent,
        note: input.note ?? null,
        createdBy: input.actorId,
      })
      .$returningId();
    await recordAudit({ actorId: input.actorId, action: "release.created", subjectType: "release", subjectId: String(row!.id), detail: { baseRevisionId: input.baseRevisionId, percent: input.percent, target: input.target.kind } }, tx);
    await bumpConfigGeneration(tx);
    return { releaseId: row!.id };
  });
}

/** Changes a release's share or state in a transaction; the row is locked so two admins get one outcome each. */
export async function updateRelease({ actorId, releaseId, change }: { actorId: string; releaseId: number; change: { percent?: number; state?: "active" | "paused" | "rolled_back" } }) {
  return db.transaction(async (tx) => {
    const [r] = await tx.select().from(releases).where(eq(releases.id, releaseId)).for("update");
    if (!r) throw new AppError("not_found", "No such release.");
    if (r.state === "rolled_back") throw new AppError("conflict", "This release was rolled back; release the revision again instead.");
    if (change.percent !== undefined && change.percent < r.percent) {
      throw new AppError("conflict", `A release only widens: it is at ${r.percent} %. Roll it back to take it away.`, { issues: [{ path: "/percent", message: `must be at least ${r.percent}` }] });
    }
    await tx.update(releases).set(change).where(eq(releases.id, releaseId));
    await bumpConfigGeneration(tx);
    await recordAudit({ actorId, action: change.state === "rolled_back" ? "release.rolled_back" : change.state ? `release.${change.state === "paused" ? "paused" : "resumed"}` : "release.widened", subjectType: "release", subjectId: String(releaseId), detail: { from: { percent: r.percent, state: r.state }, to: change } }, tx);
    return { ...r, ...change };
  });
}

/**
 * The newest approved overlay revisions of a door model: keyed by site id for site overlays and
 * by "serial:<serial>" for controller overlays.
 */
export async function approvedOverlaysOf({ doorModelId }: { doorModelId: number }): Promise<Record<string, number>> {
  const rows = await db
    .select({ layer: profiles.layer, siteId: profiles.siteId, serial: profiles.controllerSerial, revisionId: profileRevisions.id, number: profileRevisions.number })
    .from(profiles)
    .innerJoin(profileRevisions, eq(profileRevisions.profileId, profiles.id))
    .where(and(inArray(profiles.layer, ["site", "controller"]), eq(profiles.doorModelId, doorModelId), eq(profileRevisions.state, "approved")))
    .orderBy(desc(profileRevisions.number));
  const out: Record<string, number> = {};
  for (const r of rows) {
    const key = r.layer === "site" ? (r.siteId ? String(r.siteId) : null) : r.serial ? `serial:${r.serial}` : null;
    if (key && out[key] === undefined) out[key] = r.revisionId;
  }
  return out;
}

/** Per day since `since`: how many of `controllerIds` reported one of `hashes` applied (for adoption over time). */
export async function adoptionByDay({ controllerIds, hashes, since }: { controllerIds: number[]; hashes: string[]; since: Date }) {
  if (!controllerIds.length || !hashes.length) return [];
  const rows = await db
    .select({ day: sql<string>`DATE(${checkIns.receivedAt})`, n: sql<number>`COUNT(DISTINCT ${checkIns.controllerId})` })
    .from(checkIns)
    .where(and(inArray(checkIns.controllerId, controllerIds), inArray(checkIns.appliedHash, hashes), gte(checkIns.receivedAt, since)))
    .groupBy(sql`DATE(${checkIns.receivedAt})`)
    .orderBy(sql`DATE(${checkIns.receivedAt})`);
  return rows.map((r) => ({ day: String(r.day).slice(0, 10), controllers: Number(r.n) }));
}
