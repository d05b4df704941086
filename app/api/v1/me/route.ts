import { authorize } from "@/lib/auth/guard";
import { permissionsOf } from "@/lib/auth/permissions";
import { handle } from "@/lib/http/route";

/** The signed-in user and their permissions. */
export const GET = handle(async (request) => {
  const user = await authorize(request.headers);
  return Response.json({ user, permissions: permissionsOf(user.role) }, { headers: { "cache-control": "no-store" } });
});
