import { listUsers } from "@/db/queries/users";
import { authorize } from "@/lib/auth/guard";
import { handle, readJson } from "@/lib/http/route";
import { inviteSchema, inviteUser } from "@/lib/users/admin";

/** Every user with role and status (admins). */
export const GET = handle(async (request) => {
  await authorize(request.headers, "users:manage");
  const users = await listUsers();
  return Response.json({ users }, { headers: { "cache-control": "no-store" } });
});

/** Invites a user: `{ name, email, role }` → 201 `{ userId }`. */
export const POST = handle(async (request) => {
  const actor = await authorize(request.headers, "users:manage");
  const input = await readJson(request, inviteSchema);
  const { userId } = await inviteUser({ actor, input, requestHeaders: request.headers });
  return Response.json({ userId }, { status: 201 });
});
