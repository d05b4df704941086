import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle } from "@/lib/http/route";
import { draftOverlayFromRun } from "@/lib/releases/calibration";

type Ctx = { params: Promise<{ runId: string }> };

/** Turns a run's suggestion into a draft controller overlay (technicians and admins); an engineer then submits it. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "calibrations:upload");
  const runId = idParam((await ctx.params).runId, "calibration run");
  return Response.json(await draftOverlayFromRun({ actor, runId }), { status: 201 });
});
