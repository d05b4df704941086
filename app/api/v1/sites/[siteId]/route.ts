import { authorize } from "@/lib/auth/guard";
import { idParam } from "@/lib/http/params";
import { handle, readJson } from "@/lib/http/route";
import { siteSchema, updateSite } from "@/lib/releases/sites";

type Ctx = { params: Promise<{ siteId: string }> };

/** Changes a site's name, position, zone or contact. */
export const PATCH = handle<Ctx>(async (request, ctx) => {
  const actor = await authorize(request.headers, "sites:manage");
  const siteId = idParam((await ctx.params).siteId, "site");
  const input = await readJson(request, siteSchema.omit({ slug: true }));
  await updateSite({ actorId: actor.id, siteId, input });
  return Response.json({ ok: true });
});
