import { headers as nextHeaders } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { AppError } from "@/lib/http/errors";
import { getAuth } from "./auth";
import { hasPermission, isRole, type Permission, type Role } from "./permissions";

/** The signed-in person as the rest of the app sees them. */
export type SessionUser = { id: string; name: string; email: string; role: Role };

/** The session's user for these request headers, or null when signed out, deactivated or unknown. */
export async function getSessionUser(requestHeaders: Headers): Promise<SessionUser | null> {
  const session = await getAuth().api.getSession({ headers: requestHeaders });
  if (!session) return null;
  const { id, name, email, role, banned } = session.user as typeof session.user & { role?: string; banned?: boolean };
  if (banned || !isRole(role)) return null;
  return { id, name, email, role };
}

/** Authorizes a request: 401 without a session, 403 without the permission. */
export async function authorize(requestHeaders: Headers, permission?: Permission): Promise<SessionUser> {
  const user = await getSessionUser(requestHeaders);
  if (!user) throw new AppError("unauthenticated", "Sign in first.");
  if (permission && !hasPermission(user.role, permission)) {
    throw new AppError("forbidden", "Your role does not allow this.");
  }
  return user;
}

/** For server actions and route handlers: the current request's user, or an AppError. */
export async function requireUser(permission?: Permission): Promise<SessionUser> {
  return authorize(await nextHeaders(), permission);
}

/** For pages: redirects to sign-in when signed out and shows the 403 page without the permission. */
export async function requirePageUser(permission?: Permission): Promise<SessionUser> {
  const user = await getSessionUser(await nextHeaders());
  if (!user) redirect("/sign-in");
  if (permission && !hasPermission(user.role, permission)) forbidden();
  return user;
}
