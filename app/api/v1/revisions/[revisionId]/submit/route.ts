import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle, readJson } from "@/lib/http/route";
import { submitForReview, submitSchema } from "@/lib/reviews/workflow";

type Ctx = { params: Promise<{ revisionId: string }> };

/** Submits a draft for review: `{ acknowledgements: [{ ruleId, reason }] }` for each safety warning. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "profiles:edit");
  const revisionId = idParam((await ctx.params).revisionId, "revision");
  const input = await readJson(request, submitSchema);
  return Response.json(await submitForReview({ actor, revisionId, input }));
});
