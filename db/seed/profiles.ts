// Demo profiles for the invented scenario: one door model approved, a site overlay waiting for
// review, one base still a draft, and one door model with nothing yet.
import { eq } from "drizzle-orm";
import { db } from "@/db/client";
import { doorModels, sites, users } from "@/db/schema";
import { findBaseProfile } from "@/db/queries/profiles";
import { getDoorModelForSafety } from "@/db/queries/profile-context";
import type { SessionUser } from "@/lib/auth/guard";
import type { Role } from "@/lib/auth/permissions";
import { defaultDocument } from "@/lib/profiles/defaults";
import { expectedTravelTime, modelTravel, nominalVelocity } from "@/lib/profiles/safety/reference";
import { createProfileWithContent } from "@/lib/reviews/create";
import { decideOnRevision, evaluateProfileContent, submitForReview } from "@/lib/reviews/workflow";
import { getProfile, getRevision } from "@/db/queries/profiles";

async function person(email: string): Promise<SessionUser> {
  const [u] = await db.select({ id: users.id, name: users.name, email: users.email, role: users.role }).from(users).where(eq(users.email, email));
  if (!u) throw new Error(`demo user ${email} is missing`);
  return { ...u, role: u.role as Role };
}

/** A base document for a door model, with travel, stall and timeout worked out from its drive train. */
async function baseFor(doorModelId: number): Promise<Record<string, unknown>> {
  const model = (await getDoorModelForSafety({ doorModelId }))!;
  const ctx = { now: new Date(), doorModel: model };
  const closeTravelCounts = Math.round(modelTravel(model).counts);
  const nominal = nominalVelocity(ctx)!.nominalCps;
  const expected = expectedTravelTime(ctx, closeTravelCounts)!.ms;
  const doc = defaultDocument(2);
  return {
    ...doc,
    closeTravelCounts,
    // Hollowmere's workshop is in Bavaria: the base suits Central European sites; others get an overlay.
    timeZone: "Europe/Berlin",
    travelTimeoutMs: Math.ceil((expected * 2.5) / 1000) * 1000,
    stall: { ...(doc.stall as object), thresholdCps: Math.round(nominal * 0.5), windowMs: 100 },
  };
}

/** Acknowledges every warning of a revision with a demo reason, then submits it. */
async function submitWithReasons(author: SessionUser, revisionId: number) {
  const revision = (await getRevision({ revisionId }))!;
  const profile = (await getProfile({ profileId: revision.profileId }))!;
  const { findings } = await evaluateProfileContent({ profile, version: 2, content: revision.content });
  const acknowledgements = [...new Set(findings.filter((f) => f.severity === "warning").map((f) => f.ruleId))].map((ruleId) => ({ ruleId, reason: "Demo data: checked on the test door at the workshop." }));
  await submitForReview({ actor: author, revisionId, input: { acknowledgements } });
  return revision.contentHash;
}

export async function seedDemoProfiles(log: (line: string) => void) {
  const engineer = await person("engineer@hollowmere.example");
  const reviewers = [await person("reviewer@hollowmere.example"), await person("reviewer2@hollowmere.example")];
  const models = await db.select({ id: doorModels.id, code: doorModels.code, name: doorModels.name }).from(doorModels);
  const byCode = new Map(models.map((m) => [m.code, m]));
  const [corrie] = await db.select({ id: sites.id }).from(sites).where(eq(sites.slug, "corrie-brae"));

  const henhouse = byCode.get("HM-350");
  if (henhouse && !(await findBaseProfile({ doorModelId: henhouse.id }))) {
    const { revisionId } = await createProfileWithContent({ actor: engineer, input: { layer: "base", name: "Henhouse 350 standard", doorModelId: henhouse.id, schemaVersion: 2, content: await baseFor(henhouse.id), message: "First profile from the drive train" } });
    const hash = await submitWithReasons(engineer, revisionId);
    for (const r of reviewers) await decideOnRevision({ actor: r, revisionId, input: { decision: "approve", contentHash: hash, comment: "Matches the workshop door." } });
    log("Henhouse 350 base approved");
    if (corrie) {
      const overlay = { timeZone: "Europe/London", clock: { source: "msf", alarmAfterHoursWithoutFix: 48 }, schedule: { kind: "sun", sunriseOffsetMinutes: 30, civilDuskOffsetMinutes: 60, stepMinutes: 30 } };
      const site = await createProfileWithContent({ actor: engineer, input: { layer: "site", name: "Corrie Brae late dusk", doorModelId: henhouse.id, siteId: corrie.id, schemaVersion: 2, content: overlay, message: "Long northern dusk: close an hour after civil dusk" } });
      await submitWithReasons(engineer, site.revisionId);
      log("Corrie Brae overlay waiting for review");
    }
  }
  const hatchling = byCode.get("HM-220");
  if (hatchling && !(await findBaseProfile({ doorModelId: hatchling.id }))) {
    await createProfileWithContent({ actor: engineer, input: { layer: "base", name: "Hatchling 220 first draft", doorModelId: hatchling.id, schemaVersion: 2, content: await baseFor(hatchling.id), message: "Started from the drive train" } });
    log("Hatchling 220 base drafted");
  }
}
