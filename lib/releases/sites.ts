import { eq } from "drizzle-orm";
import { z } from "zod";
import { db } from "@/db/client";
import { sites } from "@/db/schema";
import { recordAudit } from "@/db/queries/audit";
import { AppError } from "@/lib/http/errors";
import { isKnownTimeZone } from "@/lib/profiles/schemas";

export const siteSchema = z.object({
  slug: z.string().trim().toLowerCase().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, "use lower-case letters, digits and single hyphens, e.g. north-barn").max(64),
  name: z.string().trim().min(2, "Name the site").max(191),
  latitude: z.coerce.number({ error: "must be a number" }).min(-90, "must be at least -90").max(90, "must be at most 90"),
  longitude: z.coerce.number({ error: "must be a number" }).min(-180, "must be at least -180").max(180, "must be at most 180"),
  timeZone: z.string().trim().refine(isKnownTimeZone, "must be an IANA time zone such as Europe/London"),
  contactName: z.string().trim().max(191).optional().transform((v) => v || null),
  contactEmail: z.union([z.literal(""), z.email("must be an e-mail address").max(191, "must be at most 191 characters")]).optional().transform((v) => v || null),
});

/** Adds a site (technicians and admins). */
export async function createSite({ actorId, input }: { actorId: string; input: z.infer<typeof siteSchema> }) {
  return db.transaction(async (tx) => {
    const [dup] = await tx.select({ id: sites.id }).from(sites).where(eq(sites.slug, input.slug)).for("update");
    if (dup) throw new AppError("conflict", `A site with the short name ${input.slug} exists.`, { issues: [{ path: "/slug", message: "Already in use" }] });
    const [row] = await tx.insert(sites).values(input).$returningId();
    await recordAudit({ actorId, action: "site.created", subjectType: "site", subjectId: input.slug }, tx);
    return { siteId: row!.id };
  });
}

/** Changes a site's details; the short name stays. */
export async function updateSite({ actorId, siteId, input }: { actorId: string; siteId: number; input: Omit<z.infer<typeof siteSchema>, "slug"> }) {
  await db.transaction(async (tx) => {
    const [res] = await tx.update(sites).set(input).where(eq(sites.id, siteId));
    if (!res.affectedRows) throw new AppError("not_found", "No such site.");
    await recordAudit({ actorId, action: "site.updated", subjectType: "site", subjectId: String(siteId), detail: { latitude: input.latitude, longitude: input.longitude, timeZone: input.timeZone } }, tx);
  });
}
