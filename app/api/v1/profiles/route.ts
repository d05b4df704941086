import { listProfiles } from "@/db/queries/profiles";
import { authorize } from "@/lib/auth/guard";
import { handle, readJson } from "@/lib/http/route";
import { createProfileSchema, createProfileWithContent } from "@/lib/reviews/create";

/** Every profile with its newest revision's state. */
export const GET = handle(async (request) => {
  await authorize(request.headers, "profiles:read");
  return Response.json({ profiles: await listProfiles() }, { headers: { "cache-control": "no-store" } });
});

/** Creates a base profile or site overlay: `{ layer, name, doorModelId, siteId?, schemaVersion, content? }`. */
export const POST = handle(async (request) => {
  const actor = await authorize(request.headers, "profiles:edit");
  const input = await readJson(request, createProfileSchema);
  return Response.json(await createProfileWithContent({ actor, input }), { status: 201 });
});
