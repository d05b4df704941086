// The overview page's reads. Each concern is one query that aggregates in the database, so the
// page costs the same few round trips with ten controllers or ten thousand.
import { and, asc, desc, eq, gte, inArray, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "@/db/client";
import { checkIns, controllers, doorModels, profileRevisions, profiles, releases, reviewDecisions, sites, users } from "@/db/schema";
import type { ReleaseRow } from "./releases";

export type ControllerFigure = { serial: string; siteName: string };

export type TimeFixLost = {
  rows: (ControllerFigure & { timeFixAgeS: number; reportedAt: Date })[];
  /** Controllers whose newest check-in reports a fix older than the threshold. */
  total: number;
  /** Controllers whose newest check-in reports no fix at all (expected for a clock on its real-time clock alone). */
  noFix: number;
};

/**
 * Controllers whose newest check-in reports a time fix older than `thresholdS`, oldest fix first,
 * with the counts over the whole fleet.
 */
export async function listTimeFixLost({ thresholdS, limit = 10 }: { thresholdS: number; limit?: number }): Promise<TimeFixLost> {
  const latest = alias(checkIns, "latest");
  const newest = alias(checkIns, "newest");
  // The newest check-in of each controller: one backward dive into (controller_id, received_at) each.
  const newestId = sql`(SELECT ${newest.id} FROM ${checkIns} AS newest WHERE ${newest.controllerId} = ${controllers.id} ORDER BY ${newest.receivedAt} DESC, ${newest.id} DESC LIMIT 1)`;
  const rows = await db
    .select({
      serial: controllers.serial,
      siteName: sites.name,
      timeFixAgeS: latest.timeFixAgeS,
      reportedAt: latest.receivedAt,
      total: sql<string | number>`SUM(${latest.timeFixAgeS} > ${thresholdS}) OVER ()`,
      noFix: sql<string | number>`SUM(${latest.timeFixAgeS} IS NULL) OVER ()`,
    })
    .from(controllers)
    .innerJoin(sites, eq(sites.id, controllers.siteId))
    .innerJoin(latest, eq(latest.id, newestId))
    .orderBy(desc(latest.timeFixAgeS), asc(controllers.serial))
    .limit(limit);
  const first = rows[0];
  return {
    // The window counts cover every controller; of the listed rows keep only those over the threshold.
    rows: rows.flatMap((r) => (r.timeFixAgeS !== null && r.timeFixAgeS > thresholdS ? [{ serial: r.serial, siteName: r.siteName, timeFixAgeS: r.timeFixAgeS, reportedAt: r.reportedAt }] : [])),
    total: Number(first?.total ?? 0),
    noFix: Number(first?.noFix ?? 0),
  };
}

export type WeeklyStalls = {
  rows: (ControllerFigure & { increase: number })[];
  /** Controllers with at least one stall since `since`. */
  total: number;
  /** Stall events since `since`, over the fleet. */
  events: number;
};

/**
 * Stall events per controller since `since`: the increase of the running stallEvents counter over its
 * check-ins in that time, a drop counting as a restart from zero (the rule of
 * lib/dashboard/stall-increase.ts counterIncrease). Most stalls first.
 */
export async function listWeeklyStalls({ since, limit = 10 }: { since: Date; limit?: number }): Promise<WeeklyStalls> {
  const ci = alias(checkIns, "ci");
  // Signed, so a restart's drop does not overflow the unsigned column's arithmetic.
  const value = sql<number>`CAST(${ci.stallEvents} AS SIGNED)`;
  const readings = db
    .select({
      controllerId: ci.controllerId,
      value: value.as("value"),
      prev: sql<number | null>`LAG(${value}) OVER (PARTITION BY ${ci.controllerId} ORDER BY ${ci.receivedAt}, ${ci.id})`.as("prev"),
    })
    .from(ci)
    .where(gte(ci.receivedAt, since))
    .as("readings");
  const perController = db
    .select({
      controllerId: readings.controllerId,
      increase: sql<number>`SUM(CASE WHEN ${readings.prev} IS NULL THEN 0 WHEN ${readings.value} >= ${readings.prev} THEN ${readings.value} - ${readings.prev} ELSE ${readings.value} END)`.as("increase"),
    })
    .from(readings)
    .groupBy(readings.controllerId)
    .as("per_controller");
  const rows = await db
    .select({
      serial: controllers.serial,
      siteName: sites.name,
      increase: perController.increase,
      total: sql<string | number>`COUNT(*) OVER ()`,
      events: sql<string | number>`SUM(${perController.increase}) OVER ()`,
    })
    .from(perController)
    .innerJoin(controllers, eq(controllers.id, perController.controllerId))
    .innerJoin(sites, eq(sites.id, controllers.siteId))
    .where(sql`${perController.increase} > 0`)
    .orderBy(desc(perController.increase), asc(controllers.serial))
    .limit(limit);
  const first = rows[0];
  return {
    rows: rows.map((r) => ({ serial: r.serial, siteName: r.siteName, increase: Number(r.increase) })),
    total: Number(first?.total ?? 0),
    events: Number(first?.events ?? 0),
  };
}

export type LiveRelease = { release: ReleaseRow; profileName: string; revisionNumber: number; doorModelName: string; siteName: string | null };

/** Releases in force (active or paused) across every door model, newest first, with names for display. */
export async function listLiveReleaseSummaries(): Promise<LiveRelease[]> {
  return db
    .select({ release: releases, profileName: profiles.name, revisionNumber: profileRevisions.number, doorModelName: doorModels.name, siteName: sites.name })
    .from(releases)
    .innerJoin(profileRevisions, eq(profileRevisions.id, releases.baseRevisionId))
    .innerJoin(profiles, eq(profiles.id, profileRevisions.profileId))
    .innerJoin(doorModels, eq(doorModels.id, releases.doorModelId))
    .leftJoin(sites, eq(sites.id, releases.targetSiteId))
    .where(inArray(releases.state, ["active", "paused"]))
    .orderBy(desc(releases.id));
}

export type ApprovedLayer = { layer: "base" | "site"; doorModelId: number | null; siteId: number | null; revisionId: number; content: Record<string, unknown> };

/**
 * The newest approved revision of each door model's base and of each (door model, site) overlay:
 * what a release made now would carry.
 */
export async function listApprovedLayers(): Promise<ApprovedLayer[]> {
  const ranked = db
    .select({
      layer: profiles.layer,
      doorModelId: profiles.doorModelId,
      siteId: profiles.siteId,
      revisionId: profileRevisions.id,
      content: profileRevisions.content,
      rank: sql<number>`ROW_NUMBER() OVER (PARTITION BY ${profiles.layer}, ${profiles.doorModelId}, ${profiles.siteId} ORDER BY ${profileRevisions.number} DESC, ${profileRevisions.id} DESC)`.as("layer_rank"),
    })
    .from(profileRevisions)
    .innerJoin(profiles, eq(profiles.id, profileRevisions.profileId))
    .where(and(inArray(profiles.layer, ["base", "site"]), eq(profileRevisions.state, "approved")))
    .as("ranked");
  const rows = await db.select({ layer: ranked.layer, doorModelId: ranked.doorModelId, siteId: ranked.siteId, revisionId: ranked.revisionId, content: ranked.content }).from(ranked).where(eq(ranked.rank, 1));
  return rows.map((r) => ({ ...r, layer: r.layer as "base" | "site", content: (typeof r.content === "string" ? JSON.parse(r.content) : r.content) as Record<string, unknown> }));
}

/** The newest request for changes on each of these revisions, with the reviewer's name and comment. */
export async function listChangeRequests({ revisionIds }: { revisionIds: number[] }) {
  if (!revisionIds.length) return new Map<number, { reviewerName: string | null; comment: string | null; createdAt: Date }>();
  const rows = await db
    .select({ revisionId: reviewDecisions.revisionId, reviewerName: users.name, comment: reviewDecisions.comment, createdAt: reviewDecisions.createdAt })
    .from(reviewDecisions)
    .leftJoin(users, eq(users.id, reviewDecisions.reviewerId))
    .where(and(inArray(reviewDecisions.revisionId, revisionIds), eq(reviewDecisions.decision, "request_changes")))
    .orderBy(desc(reviewDecisions.id));
  const out = new Map<number, { reviewerName: string | null; comment: string | null; createdAt: Date }>();
  for (const r of rows) if (!out.has(r.revisionId)) out.set(r.revisionId, { reviewerName: r.reviewerName, comment: r.comment, createdAt: r.createdAt });
  return out;
}
