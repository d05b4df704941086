import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle, readJson } from "@/lib/http/route";
import { saveProfileRevision, saveSchema } from "@/lib/reviews/workflow";

type Ctx = { params: Promise<{ profileId: string }> };

/** Saves a new revision on top of `parentRevisionId`: 201, 400 invalid_profile, or 409 for a stale parent. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "profiles:edit");
  const profileId = idParam((await ctx.params).profileId, "profile");
  const input = await readJson(request, saveSchema);
  return Response.json(await saveProfileRevision({ actor, profileId, input }), { status: 201 });
});
