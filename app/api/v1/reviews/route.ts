import { listReviewQueue } from "@/db/queries/reviews";
import { authorize } from "@/lib/auth/guard";
import { handle } from "@/lib/http/route";

/** Revisions waiting for the calling reviewer. */
export const GET = handle(async (request) => {
  const actor = await authorize(request.headers, "reviews:decide");
  return Response.json({ queue: await listReviewQueue({ reviewerId: actor.id }) }, { headers: { "cache-control": "no-store" } });
});
