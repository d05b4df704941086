import { and, desc, eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { profileRevisions } from "@/db/schema";
import { findBaseProfile, getProfile, getRevision, saveRevision } from "@/db/queries/profiles";
import type { SessionUser } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { MigrationError, migrateOverlayV1toV2, migrateV1toV2 } from "@/lib/profiles/migrate";
import { validateParams } from "@/lib/profiles/schemas";

export const migrateSchema = z.object({
  parentRevisionId: z.coerce.number().int().positive("must be the revision you are migrating"),
});

async function newestV1BaseContent(doorModelId: number) {
  const base = await findBaseProfile({ doorModelId });
  if (!base) return null;
  const [row] = await db
    .select({ content: profileRevisions.content })
    .from(profileRevisions)
    .where(and(eq(profileRevisions.profileId, base.id), eq(profileRevisions.schemaVersion, 1)))
    .orderBy(desc(profileRevisions.number))
    .limit(1);
  return row?.content ?? null;
}

/** Moves a profile from parameter set 1 to 2 as a new draft revision (reviewed like any other change). */
export async function migrateProfileToV2({ actor, profileId, input }: { actor: SessionUser; profileId: number; input: z.infer<typeof migrateSchema> }) {
  const profile = await getProfile({ profileId });
  if (!profile) throw new AppError("not_found", "No such profile.");
  if (profile.schemaVersion !== 1) throw new AppError("conflict", `This profile already uses parameter set ${profile.schemaVersion}.`);
  const head = await getRevision({ revisionId: input.parentRevisionId });
  if (!head || head.profileId !== profileId) throw new AppError("not_found", "No such revision of this profile.");
  let content: Record<string, unknown>;
  try {
    if (profile.layer === "base") {
      content = migrateV1toV2(head.content) as unknown as Record<string, unknown>;
    } else {
      const below = profile.doorModelId ? await newestV1BaseContent(profile.doorModelId) : null;
      content = migrateOverlayV1toV2(head.content, below ? { below } : {});
    }
  } catch (err) {
    if (err instanceof MigrationError) throw new AppError("invalid_profile", `Cannot migrate: ${err.message}.`, { issues: [{ path: err.path, message: err.message }] });
    throw err;
  }
  if (profile.layer === "base") {
    const check = validateParams(2, content);
    if (!check.ok) throw new AppError("invalid_profile", "The migrated document does not pass parameter set 2.", { issues: check.issues.map((i) => ({ path: i.path, message: i.message })) });
  }
  return saveRevision({ actorId: actor.id, profileId, parentRevisionId: input.parentRevisionId, content, message: `Migrated from parameter set 1 to 2 (from r${head.number})`, schemaVersion: 2 });
}
