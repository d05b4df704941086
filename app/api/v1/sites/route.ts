import { listSites } from "@/db/queries/fleet";
import { authorize } from "@/lib/auth/guard";
import { handle, readJson } from "@/lib/http/route";
import { createSite, siteSchema } from "@/lib/releases/sites";

/** Every site. */
export const GET = handle(async (request) => {
  await authorize(request.headers, "sites:read");
  return Response.json({ sites: await listSites() }, { headers: { "cache-control": "no-store" } });
});

/** Adds a site: `{ slug, name, latitude, longitude, timeZone, contactName?, contactEmail? }`. */
export const POST = handle(async (request) => {
  const actor = await authorize(request.headers, "sites:manage");
  const input = await readJson(request, siteSchema);
  return Response.json(await createSite({ actorId: actor.id, input }), { status: 201 });
});
