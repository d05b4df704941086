import { listCalibrationRuns } from "@/db/queries/calibrations";
import { getControllerBySerial } from "@/db/queries/controllers";
import { authorize } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { handle, readJson } from "@/lib/http/route";
import { CALIBRATION_MAX_BYTES, uploadCalibration, uploadSchema } from "@/lib/releases/calibration";

type Ctx = { params: Promise<{ serial: string }> };

/** A controller's calibration runs with their analyses. */
export const GET = handle<Ctx>(async (request, ctx) => {
  await authorize(request.headers, "controllers:read");
  const c = await getControllerBySerial({ serial: (await ctx.params).serial });
  if (!c) throw new AppError("not_found", "No such controller.");
  return Response.json({ runs: await listCalibrationRuns({ controllerId: c.id }) }, { headers: { "cache-control": "no-store" } });
});

/** Uploads a run `{ fileName, csv, stallFraction? }` (5 MiB at most): 201 with the analysis and suggestions, 400 naming bad rows. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "calibrations:upload");
  const input = await readJson(request, uploadSchema, { maxBytes: CALIBRATION_MAX_BYTES + 64 * 1024 });
  return Response.json(await uploadCalibration({ actor, serial: (await ctx.params).serial, input }), { status: 201 });
});
