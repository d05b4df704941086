import { getProfile, listRevisions } from "@/db/queries/profiles";
import { authorize } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { idParam } from "@/lib/http/params";
import { handle } from "@/lib/http/route";

type Ctx = { params: Promise<{ profileId: string }> };

/** One profile with its revisions (newest first, without content). */
export const GET = handle<Ctx>(async (request, ctx) => {
  await authorize(request.headers, "profiles:read");
  const profileId = idParam((await ctx.params).profileId, "profile");
  const profile = await getProfile({ profileId });
  if (!profile) throw new AppError("not_found", "No such profile.");
  return Response.json({ profile, revisions: await listRevisions({ profileId }) }, { headers: { "cache-control": "no-store" } });
});
