import { z } from "zod";
import { changeUserRole, deactivateUser, getUser, reactivateUser } from "@/db/queries/users";
import { authorize } from "@/lib/auth/guard";
import { AppError } from "@/lib/http/errors";
import { handle, readJson } from "@/lib/http/route";
import { roleSchema } from "@/lib/users/admin";

type Ctx = { params: Promise<{ userId: string }> };

const patchSchema = z
  .object({ role: roleSchema.optional(), active: z.boolean({ error: "must be true or false" }).optional() })
  .strict()
  .refine((v) => v.role !== undefined || v.active !== undefined, { message: "Give role, active, or both" });

async function loadUser(ctx: Ctx) {
  const { userId } = await ctx.params;
  const user = await getUser({ userId });
  if (!user) throw new AppError("not_found", "No such user.");
  return user;
}

/** One user (admins). */
export const GET = handle<Ctx>(async (request, ctx) => {
  await authorize(request.headers, "users:manage");
  return Response.json({ user: await loadUser(ctx) });
});

/** Changes a user's role and/or activity: `{ role?, active? }`. */
export const PATCH = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "users:manage");
  const body = await readJson(request, patchSchema);
  const user = await loadUser(ctx);
  if (body.role) await changeUserRole({ actorId: actor.id, userId: user.id, role: body.role });
  if (body.active === false) await deactivateUser({ actorId: actor.id, userId: user.id });
  if (body.active === true) await reactivateUser({ actorId: actor.id, userId: user.id });
  return Response.json({ user: await loadUser(ctx) });
});
