import { z } from "zod";
import { updateRelease } from "@/db/queries/releases";
import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle, readJson } from "@/lib/http/route";

type Ctx = { params: Promise<{ releaseId: string }> };

const changeSchema = z
  .object({
    percent: z.number().int().min(1).max(100, "At most 100 %").optional(),
    state: z.enum(["active", "paused", "rolled_back"], { error: "must be active, paused or rolled_back" }).optional(),
  })
  .strict()
  .refine((v) => v.percent !== undefined || v.state !== undefined, { message: "Give percent, state, or both" });

/** Widens, pauses, resumes or rolls back a release (admins). */
export const PATCH = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "releases:manage");
  const releaseId = idParam((await ctx.params).releaseId, "release");
  const change = await readJson(request, changeSchema);
  return Response.json({ release: await updateRelease({ actorId: actor.id, releaseId, change }) });
});
