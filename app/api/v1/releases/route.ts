import { listReleases } from "@/db/queries/releases";
import { authorize } from "@/lib/auth/guard";
import { handle, readJson } from "@/lib/http/route";
import { createRelease, releaseSchema } from "@/lib/releases/service";

/** Every release, newest first. */
export const GET = handle(async (request) => {
  await authorize(request.headers, "controllers:read");
  return Response.json({ releases: await listReleases() }, { headers: { "cache-control": "no-store" } });
});

/** Releases an approved base revision to a target and share; refused when any affected controller would get an invalid configuration. */
export const POST = handle(async (request) => {
  const actor = await authorize(request.headers, "releases:manage");
  const input = await readJson(request, releaseSchema);
  return Response.json(await createRelease({ actor, input }), { status: 201 });
});
