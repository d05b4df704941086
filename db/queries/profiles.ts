import { and, asc, desc, eq, inArray, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "@/db/client";
import { doorModels, parameterSchemas, profileRevisions, profiles, sites, users } from "@/db/schema";
import { contentHash } from "@/lib/profiles/canonical";
import { SCHEMA_CATALOG, type ParamsVersion } from "@/lib/profiles/schemas";
import { AppError } from "@/lib/http/errors";
import { recordAudit } from "./audit";

export type ProfileLayer = "base" | "site" | "controller";

/** Writes the schema files' catalog into parameter_schemas (idempotent; run by the seed). */
export async function syncSchemaCatalog(): Promise<void> {
  for (const entry of SCHEMA_CATALOG) {
    const title = String(entry.schema.title ?? `Parameter set ${entry.version}`);
    await db
      .insert(parameterSchemas)
      .values({ version: entry.version, schemaId: entry.id, title, schema: entry.schema, schemaHash: contentHash(entry.schema) })
      .onDuplicateKeyUpdate({ set: { schemaId: entry.id, title, schema: entry.schema, schemaHash: contentHash(entry.schema) } });
  }
}

/** The schema versions in the database catalog. */
export async function listSchemaVersions() {
  return db.select({ version: parameterSchemas.version, title: parameterSchemas.title, schemaId: parameterSchemas.schemaId }).from(parameterSchemas).orderBy(asc(parameterSchemas.version));
}

const head = alias(profileRevisions, "head");

export type ProfileSummary = {
  id: number;
  layer: ProfileLayer;
  name: string;
  schemaVersion: ParamsVersion;
  doorModelId: number | null;
  doorModelName: string | null;
  siteId: number | null;
  siteName: string | null;
  controllerSerial: string | null;
  headRevisionId: number | null;
  headNumber: number | null;
  headState: string | null;
  headHash: string | null;
  updatedAt: Date;
};

function summarySelect() {
  return db
    .select({
      id: profiles.id,
      layer: profiles.layer,
      name: profiles.name,
      schemaVersion: profiles.schemaVersion,
      doorModelId: profiles.doorModelId,
      doorModelName: doorModels.name,
      siteId: profiles.siteId,
      siteName: sites.name,
      controllerSerial: profiles.controllerSerial,
      headRevisionId: profiles.headRevisionId,
      headNumber: head.number,
      headState: head.state,
      headHash: head.contentHash,
      updatedAt: profiles.updatedAt,
    })
    .from(profiles)
    .leftJoin(doorModels, eq(doorModels.id, profiles.doorModelId))
    .leftJoin(sites, eq(sites.id, profiles.siteId))
    .leftJoin(head, eq(head.id, profiles.headRevisionId));
}

/** Every profile with its newest revision's number and state. */
export async function listProfiles(): Promise<ProfileSummary[]> {
  const rows = await summarySelect().orderBy(asc(profiles.layer), asc(profiles.name));
  return rows as ProfileSummary[];
}

/** One profile, or null. */
export async function getProfile({ profileId }: { profileId: number }): Promise<ProfileSummary | null> {
  const [row] = await summarySelect().where(eq(profiles.id, profileId)).limit(1);
  return (row as ProfileSummary | undefined) ?? null;
}

export type RevisionRow = typeof profileRevisions.$inferSelect & { authorName: string | null };

/** One revision with its author's name, or null. */
export async function getRevision({ revisionId }: { revisionId: number }): Promise<RevisionRow | null> {
  const [row] = await db
    .select({ revision: profileRevisions, authorName: users.name })
    .from(profileRevisions)
    .leftJoin(users, eq(users.id, profileRevisions.authorId))
    .where(eq(profileRevisions.id, revisionId))
    .limit(1);
  return row ? { ...row.revision, authorName: row.authorName } : null;
}

/** A profile's revisions, newest first (without content). */
export async function listRevisions({ profileId, limit = 100 }: { profileId: number; limit?: number }) {
  return db
    .select({
      id: profileRevisions.id,
      number: profileRevisions.number,
      parentRevisionId: profileRevisions.parentRevisionId,
      state: profileRevisions.state,
      message: profileRevisions.message,
      contentHash: profileRevisions.contentHash,
      safetyRelevant: profileRevisions.safetyRelevant,
      requiredApprovals: profileRevisions.requiredApprovals,
      createdAt: profileRevisions.createdAt,
      authorName: users.name,
      authorId: profileRevisions.authorId,
    })
    .from(profileRevisions)
    .leftJoin(users, eq(users.id, profileRevisions.authorId))
    .where(eq(profileRevisions.profileId, profileId))
    .orderBy(desc(profileRevisions.number))
    .limit(limit);
}

/** The newest approved revision of a profile, or null. */
export async function latestApprovedRevision({ profileId }: { profileId: number }) {
  const [row] = await db
    .select()
    .from(profileRevisions)
    .where(and(eq(profileRevisions.profileId, profileId), eq(profileRevisions.state, "approved")))
    .orderBy(desc(profileRevisions.number))
    .limit(1);
  return row ?? null;
}

/** The base profile of a door model, or null. */
export async function findBaseProfile({ doorModelId }: { doorModelId: number }) {
  const [row] = await db.select().from(profiles).where(and(eq(profiles.layer, "base"), eq(profiles.doorModelId, doorModelId))).limit(1);
  return row ?? null;
}

export type NewProfile = {
  actorId: string;
  layer: ProfileLayer;
  name: string;
  schemaVersion: ParamsVersion;
  doorModelId: number;
  siteId?: number | null;
  controllerSerial?: string | null;
  content: Record<string, unknown>;
  message: string;
};

/** Creates a profile and its first revision (a draft) in one transaction. */
export async function createProfile(input: NewProfile): Promise<{ profileId: number; revisionId: number }> {
  return db.transaction(async (tx) => {
    // Creators of one door model's profiles queue on its row; locking the (absent) profile rows
    // instead would take gap locks that deadlock two concurrent creates.
    const [model] = await tx.select({ id: doorModels.id }).from(doorModels).where(eq(doorModels.id, input.doorModelId)).for("update");
    if (!model) throw new AppError("invalid_request", "No such door model.", { issues: [{ path: "/doorModelId", message: "No such door model" }] });
    if (input.layer === "base") {
      const [existing] = await tx.select({ id: profiles.id }).from(profiles).where(and(eq(profiles.layer, "base"), eq(profiles.doorModelId, input.doorModelId)));
      if (existing) throw new AppError("conflict", "This door model already has a base profile; edit that one.", { issues: [{ path: "/doorModelId", message: "Already has a base profile" }] });
    }
    if (input.layer === "site") {
      if (!input.siteId) throw new AppError("invalid_request", "A site overlay needs a site.", { issues: [{ path: "/siteId", message: "Choose a site" }] });
      const [site] = await tx.select({ id: sites.id }).from(sites).where(eq(sites.id, input.siteId));
      if (!site) throw new AppError("invalid_request", "No such site.", { issues: [{ path: "/siteId", message: "No such site" }] });
      const [existing] = await tx
        .select({ id: profiles.id })
        .from(profiles)
        .where(and(eq(profiles.layer, "site"), eq(profiles.doorModelId, input.doorModelId), eq(profiles.siteId, input.siteId)));
      if (existing) throw new AppError("conflict", "This site already has an overlay for this door model.", { issues: [{ path: "/siteId", message: "Already has an overlay" }] });
    }
    if (input.layer === "controller" && input.controllerSerial) {
      const [existing] = await tx
        .select({ id: profiles.id })
        .from(profiles)
        .where(and(eq(profiles.layer, "controller"), eq(profiles.doorModelId, input.doorModelId), eq(profiles.controllerSerial, input.controllerSerial)));
      if (existing) throw new AppError("conflict", "This controller already has an overlay; add a revision to it.", { issues: [{ path: "/controllerSerial", message: "Already has an overlay" }] });
    }
    const [p] = await tx
      .insert(profiles)
      .values({
        layer: input.layer,
        name: input.name,
        doorModelId: input.doorModelId,
        siteId: input.layer === "site" ? (input.siteId ?? null) : null,
        controllerSerial: input.layer === "controller" ? (input.controllerSerial ?? null) : null,
        schemaVersion: input.schemaVersion,
        createdBy: input.actorId,
      })
      .$returningId();
    const profileId = p!.id;
    const [r] = await tx
      .insert(profileRevisions)
      .values({
        profileId,
        number: 1,
        parentRevisionId: null,
        schemaVersion: input.schemaVersion,
        content: input.content,
        contentHash: contentHash(input.content),
        message: input.message,
        authorId: input.actorId,
      })
      .$returningId();
    const revisionId = r!.id;
    await tx.update(profiles).set({ headRevisionId: revisionId }).where(eq(profiles.id, profileId));
    await recordAudit({ actorId: input.actorId, action: "profile.created", subjectType: "profile", subjectId: String(profileId), detail: { revisionId, hash: contentHash(input.content) } }, tx);
    return { profileId, revisionId };
  });
}

/**
 * Saves new content on top of `parentRevisionId`. The profile row is locked, so two people saving
 * on the same parent get one new revision and one 409 — never a silent overwrite.
 */
export async function saveRevision(input: { actorId: string; profileId: number; parentRevisionId: number; content: Record<string, unknown>; message: string; schemaVersion?: ParamsVersion }) {
  return db.transaction(async (tx) => {
    const [p] = await tx.select().from(profiles).where(eq(profiles.id, input.profileId)).for("update");
    if (!p) throw new AppError("not_found", "No such profile.");
    if (p.headRevisionId !== input.parentRevisionId) {
      throw new AppError("conflict", `Someone saved a newer revision since you opened this one. Compare it with yours, then save again on top of it.`, {
        issues: [{ path: "/parentRevisionId", message: `The newest revision is ${p.headRevisionId}` }],
      });
    }
    const [parent] = await tx.select().from(profileRevisions).where(eq(profileRevisions.id, input.parentRevisionId)).for("update");
    if (!parent) throw new AppError("not_found", "No such revision.");
    const schemaVersion = input.schemaVersion ?? (p.schemaVersion as ParamsVersion);
    const hash = contentHash(input.content);
    if (hash === parent.contentHash && schemaVersion === parent.schemaVersion) {
      throw new AppError("conflict", "Nothing changed since the last revision.");
    }
    // The profile row lock above serialises savers, so MAX + 1 cannot collide.
    const [last] = await tx.select({ n: sql<number>`MAX(${profileRevisions.number})` }).from(profileRevisions).where(eq(profileRevisions.profileId, p.id));
    const [r] = await tx
      .insert(profileRevisions)
      .values({
        profileId: p.id,
        number: Number(last?.n ?? 0) + 1,
        parentRevisionId: parent.id,
        schemaVersion,
        content: input.content,
        contentHash: hash,
        message: input.message,
        authorId: input.actorId,
      })
      .$returningId();
    const revisionId = r!.id;
    // A revision still waiting for review is replaced by the newer one: its review no longer applies.
    if (["draft", "in_review", "changes_requested"].includes(parent.state)) {
      await tx.update(profileRevisions).set({ state: "superseded" }).where(eq(profileRevisions.id, parent.id));
    }
    await tx.update(profiles).set({ headRevisionId: revisionId, schemaVersion }).where(eq(profiles.id, p.id));
    await recordAudit({ actorId: input.actorId, action: "revision.saved", subjectType: "revision", subjectId: String(revisionId), detail: { profileId: p.id, beforeHash: parent.contentHash, afterHash: hash } }, tx);
    return { revisionId };
  });
}

/** Revisions by id (for comparisons), without checking visibility. */
export async function getRevisions({ revisionIds }: { revisionIds: number[] }) {
  if (!revisionIds.length) return [];
  return db.select().from(profileRevisions).where(inArray(profileRevisions.id, revisionIds));
}
