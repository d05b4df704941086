import { getControllerBySerial, revokeTokens, rotateToken } from "@/db/queries/controllers";
import { authorize } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { handle } from "@/lib/http/route";

type Ctx = { params: Promise<{ serial: string }> };

async function controllerOf(ctx: Ctx) {
  const c = await getControllerBySerial({ serial: (await ctx.params).serial });
  if (!c) throw new AppError("not_found", "No such controller.");
  return c;
}

/** Issues a new token and revokes the old ones (admins); the new token is shown once. */
export const POST = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "tokens:manage");
  const c = await controllerOf(ctx);
  return Response.json(await rotateToken({ actorId: actor.id, controllerId: c.id }), { status: 201, headers: { "cache-control": "no-store" } });
});

/** Revokes every token of the controller (admins); its next request gets 401. */
export const DELETE = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "tokens:manage");
  const c = await controllerOf(ctx);
  await revokeTokens({ actorId: actor.id, controllerId: c.id });
  return Response.json({ ok: true });
});
