import { createController } from "@/db/queries/controllers";
import { fleetStatus } from "@/lib/releases/fleet-status";
import { authorize } from "@/lib/auth/guard";
import { handle, readJson } from "@/lib/http/route";
import { controllerSchema } from "@/lib/releases/inputs";


/** Every controller with assigned vs running hash (drift) and its latest counters (signed-in readers). */
export const GET = handle(async (request) => {
  await authorize(request.headers, "controllers:read");
  return Response.json({ controllers: await fleetStatus() }, { headers: { "cache-control": "no-store" } });
});

/** Registers a controller; the answer carries its token, shown this once. */
export const POST = handle(async (request) => {
  const actor = await authorize(request.headers, "controllers:manage");
  const input = await readJson(request, controllerSchema);
  const created = await createController({ actorId: actor.id, ...input });
  return Response.json({ ...created, note: "Store the token in the controller now; Roostline keeps only its hash." }, { status: 201, headers: { "cache-control": "no-store" } });
});
