import { z } from "zod";
import { recordCheckIn } from "@/db/queries/controllers";
import { requireController, requireOwnSerial } from "@/lib/auth/device";
import { handle, readJson } from "@/lib/http/route";

type Ctx = { params: Promise<{ serial: string }> };

const count = (what: string) => z.number({ error: `must be a number of ${what}` }).int(`must be a whole number of ${what}`).min(0, `cannot be negative`).max(4_294_967_295);

const checkInSchema = z
  .object({
    appliedHash: z.string().regex(/^[0-9a-f]{64}$/, "must be the 64-character content hash applied").nullable(),
    refusedReason: z.string().trim().min(1).max(500).nullable().optional(),
    firmwareVersion: z.string().max(32, "must be at most 32 characters").regex(/^\d+\.\d+\.\d+([-+][0-9A-Za-z.-]+)?$/, "must be a version such as 1.4.2"),
    uptimeS: count("seconds"),
    counters: z.object({
      doorCycles: count("cycles"),
      lastOpenCounts: count("counts").nullable(),
      lastCloseCounts: count("counts").nullable(),
      lastTravelMs: count("milliseconds").nullable(),
      stallEvents: count("events"),
      timeFixAgeS: count("seconds").nullable(),
    }),
  })
  .strict()
  .refine((v) => v.appliedHash !== null || !!v.refusedReason, { path: ["refusedReason"], message: "Say why, when no configuration was applied" });

/** A controller reports what it applied (or why it refused) and its counters. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const controller = await requireController(request);
  requireOwnSerial(controller, (await ctx.params).serial);
  const body = await readJson(request, checkInSchema);
  await recordCheckIn({
    controllerId: controller.id,
    input: { appliedHash: body.appliedHash, refusedReason: body.refusedReason ?? null, firmwareVersion: body.firmwareVersion, uptimeS: body.uptimeS, ...body.counters },
  });
  return Response.json({ ok: true }, { status: 201 });
});
