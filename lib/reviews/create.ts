import { z } from "zod";
import { createProfile } from "@/db/queries/profiles";
import type { SessionUser } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { PARAMS_VERSIONS, validateParams, type ParamsVersion } from "@/lib/profiles/schemas";
import { defaultDocument } from "@/lib/profiles/defaults";
import { withinJsonDepth } from "@/lib/http/validation";

export const createProfileSchema = z.object({
  layer: z.enum(["base", "site"], { error: "must be base or site" }),
  name: z.string().trim().min(2, "Give the profile a name").max(120, "Keep the name under 120 characters"),
  doorModelId: z.coerce.number().int().positive("Choose a door model"),
  siteId: z.coerce.number().int().positive("Choose a site").optional(),
  schemaVersion: z.coerce
    .number()
    .int()
    .refine((v) => (PARAMS_VERSIONS as readonly number[]).includes(v), `must be one of ${PARAMS_VERSIONS.join(", ")}`),
  /** Imported content; omitted → a base starts from the schema defaults, an overlay empty. */
  content: z.record(z.string(), z.unknown(), { error: "must be a JSON object" }).refine((v) => withinJsonDepth(v, 30), "must nest at most 30 levels deep").optional(),
  message: z.string().trim().max(500).optional(),
});

/** Creates a base profile or a site overlay with its first draft revision. */
export async function createProfileWithContent({ actor, input }: { actor: SessionUser; input: z.infer<typeof createProfileSchema> }) {
  const version = input.schemaVersion as ParamsVersion;
  const content = input.content ?? (input.layer === "base" ? defaultDocument(version) : {});
  if (input.layer === "base") {
    const result = validateParams(version, content);
    if (!result.ok) {
      throw new AppError("invalid_profile", `The imported profile does not match parameter set ${version} (${result.issues[0]?.path || "document"}: ${result.issues[0]?.message}).`, {
        issues: result.issues.map((i) => ({ path: i.property ? `${i.path}/${i.property}` : i.path, message: i.message })),
      });
    }
  }
  return createProfile({
    actorId: actor.id,
    layer: input.layer,
    name: input.name,
    schemaVersion: version,
    doorModelId: input.doorModelId,
    siteId: input.siteId ?? null,
    content,
    message: input.message || (input.content ? "Imported" : "Started from the schema defaults"),
  });
}
