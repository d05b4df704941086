import { withdrawRevision } from "@/db/queries/reviews";
import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle } from "@/lib/http/route";

type Ctx = { params: Promise<{ revisionId: string }> };

/** The author takes a revision back out of review. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "profiles:edit");
  const revisionId = idParam((await ctx.params).revisionId, "revision");
  await withdrawRevision({ actorId: actor.id, revisionId });
  return Response.json({ ok: true });
});
