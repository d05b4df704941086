import { z } from "zod";
import { addComment, listComments } from "@/db/queries/reviews";
import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle, readJson } from "@/lib/http/route";

type Ctx = { params: Promise<{ revisionId: string }> };

const commentSchema = z.object({
  path: z.string().regex(/^(\/[^/]+)*$/, "must be a JSON Pointer such as /stall/thresholdCps").max(255),
  body: z.string().trim().min(1, "Write the comment").max(2000, "Keep the comment under 2000 characters"),
});

/** Comments on a revision. */
export const GET = handle<Ctx>(async (request, ctx) => {
  await authorize(request.headers, "profiles:read");
  const revisionId = idParam((await ctx.params).revisionId, "revision");
  return Response.json({ comments: await listComments({ revisionId }) }, { headers: { "cache-control": "no-store" } });
});

/** Adds a comment anchored to a parameter path (reviewers and engineers). */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "reviews:comment");
  const revisionId = idParam((await ctx.params).revisionId, "revision");
  const input = await readJson(request, commentSchema);
  return Response.json(await addComment({ authorId: actor.id, revisionId, ...input }), { status: 201 });
});
