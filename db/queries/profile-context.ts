import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { doorModels, sites } from "@/db/schema";
import { findBaseProfile, getRevision, latestApprovedRevision } from "./profiles";

/** The door model's drive train as the safety rules want it. */
export async function getDoorModelForSafety({ doorModelId }: { doorModelId: number }) {
  const [m] = await db.select().from(doorModels).where(eq(doorModels.id, doorModelId));
  if (!m) return null;
  return {
    name: m.name,
    doorTravelMm: m.doorTravelMm,
    spoolDiameterMm: m.spoolDiameterMm,
    cordDiameterMm: m.cordDiameterMm,
    gearboxRatio: m.gearboxRatio,
    encoderPulsesPerRev: m.encoderPulsesPerRev,
    encoderDecoding: m.encoderDecoding,
    motorNoLoadRpm: m.motorNoLoadRpm,
  };
}

/** A site's position and zone, or null. */
export async function getSiteForSafety({ siteId }: { siteId: number }) {
  const [s] = await db.select({ name: sites.name, latitude: sites.latitude, longitude: sites.longitude, timeZone: sites.timeZone }).from(sites).where(eq(sites.id, siteId));
  return s ?? null;
}

/**
 * The content an overlay of this door model sits on: the base profile's newest approved revision,
 * or its newest revision when none is approved yet (flagged so the page can say so).
 */
export async function getBaseContent({ doorModelId }: { doorModelId: number }) {
  const base = await findBaseProfile({ doorModelId });
  if (!base) return null;
  const approved = await latestApprovedRevision({ profileId: base.id });
  if (approved) return { profileId: base.id, revisionId: approved.id, content: approved.content, schemaVersion: approved.schemaVersion, approved: true };
  const head = base.headRevisionId ? await getRevision({ revisionId: base.headRevisionId }) : null;
  return head ? { profileId: base.id, revisionId: head.id, content: head.content, schemaVersion: head.schemaVersion, approved: false } : null;
}
