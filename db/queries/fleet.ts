import { asc, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { doorModels, sites, users } from "@/db/schema";

export type SiteSummary = { id: number; slug: string; name: string; latitude: number; longitude: number; timeZone: string; contactName: string | null };

/** Every site, by name. */
export async function listSites(): Promise<SiteSummary[]> {
  return db
    .select({ id: sites.id, slug: sites.slug, name: sites.name, latitude: sites.latitude, longitude: sites.longitude, timeZone: sites.timeZone, contactName: sites.contactName })
    .from(sites)
    .orderBy(asc(sites.name));
}

/** Every door model with its drive train, by code. */
export async function listDoorModels() {
  return db
    .select({
      id: doorModels.id,
      code: doorModels.code,
      name: doorModels.name,
      doorWidthMm: doorModels.doorWidthMm,
      doorTravelMm: doorModels.doorTravelMm,
      spoolDiameterMm: doorModels.spoolDiameterMm,
      cordDiameterMm: doorModels.cordDiameterMm,
      gearboxRatio: doorModels.gearboxRatio,
      encoderPulsesPerRev: doorModels.encoderPulsesPerRev,
      encoderDecoding: doorModels.encoderDecoding,
      motorNoLoadRpm: doorModels.motorNoLoadRpm,
    })
    .from(doorModels)
    .orderBy(asc(doorModels.code));
}

/** Counts for the overview page, in one round trip. */
export async function getOverviewCounts() {
  const [row] = await db.select({
    sites: sql<number>`(SELECT COUNT(*) FROM ${sites})`,
    doorModels: sql<number>`(SELECT COUNT(*) FROM ${doorModels})`,
    people: sql<number>`(SELECT COUNT(*) FROM ${users} WHERE ${users.banned} IS NULL OR ${users.banned} = 0)`,
  }).from(sql`DUAL`);
  return { sites: Number(row?.sites ?? 0), doorModels: Number(row?.doorModels ?? 0), people: Number(row?.people ?? 0) };
}
