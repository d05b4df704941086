import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle, readJson } from "@/lib/http/route";
import { migrateProfileToV2, migrateSchema } from "@/lib/reviews/migrate-profile";

type Ctx = { params: Promise<{ profileId: string }> };

/** Migrates a version 1 profile to version 2 as a new draft: `{ parentRevisionId }` → 201 `{ revisionId }`. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "profiles:edit");
  const profileId = idParam((await ctx.params).profileId, "profile");
  const input = await readJson(request, migrateSchema);
  return Response.json(await migrateProfileToV2({ actor, profileId, input }), { status: 201 });
});
