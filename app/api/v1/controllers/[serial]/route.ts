import { z } from "zod";
import { getControllerBySerial, updateController } from "@/db/queries/controllers";
import { authorize } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { handle, readJson } from "@/lib/http/route";

type Ctx = { params: Promise<{ serial: string }> };

const changeSchema = z
  .object({
    siteId: z.number().int().positive("Choose a site").optional(),
    doorModelId: z.number().int().positive("Choose a door model").optional(),
    firmwareVersion: z.string().regex(/^\d+\.\d+\.\d+$/, "must be a version such as 1.4.2").optional(),
    parameterSetVersion: z.union([z.literal(1), z.literal(2)], { error: "must be 1 or 2" }).optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: "Give at least one field to change" });

/** Moves a controller to another site or door model, or records new firmware (technicians and admins). */
export const PATCH = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "controllers:manage");
  const serial = (await ctx.params).serial;
  const change = await readJson(request, changeSchema);
  const c = await getControllerBySerial({ serial });
  if (!c) throw new AppError("not_found", "No such controller.");
  await updateController({ actorId: actor.id, controllerId: c.id, serial, change });
  return Response.json({ controller: await getControllerBySerial({ serial }) });
});
