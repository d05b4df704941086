import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle, readJson } from "@/lib/http/route";
import { decideOnRevision, decisionSchema } from "@/lib/reviews/workflow";

type Ctx = { params: Promise<{ revisionId: string }> };

/** Approves or requests changes: `{ decision, contentHash, comment? }`, bound to the hash reviewed. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "reviews:decide");
  const revisionId = idParam((await ctx.params).revisionId, "revision");
  const input = await readJson(request, decisionSchema);
  return Response.json(await decideOnRevision({ actor, revisionId, input }));
});
