import { and, eq, or, isNull } from "drizzle-orm";
import { afterEach, describe, expect, it } from "vitest";
import { GET as me } from "@/app/api/v1/me/route";
import { GET as listUsersRoute, POST as inviteRoute } from "@/app/api/v1/users/route";
import { GET as getUserRoute, PATCH as patchUser } from "@/app/api/v1/users/[userId]/route";
import { db } from "@/db/client";
import { auditEvents, users } from "@/db/schema";
import { changeUserRole, countSessions, deactivateUser } from "@/db/queries/users";
import { authRequest, signedInUser, signIn, withCookie } from "@/tests/support/auth";

const base = "http://127.0.0.1:3100";
const ctx = (userId: string) => ({ params: Promise.resolve({ userId }) });

function patch(cookie: string, userId: string, body: string) {
  return patchUser(new Request(`${base}/api/v1/users/${userId}`, { method: "PATCH", headers: withCookie(cookie, { "content-type": "application/json" }), body }), ctx(userId));
}
const meAs = (cookie: string) => me(new Request(`${base}/api/v1/me`, { headers: withCookie(cookie) }), {});

describe("role changes", () => {
  it("takes effect on the user's very next request", async () => {
    const admin = await signedInUser("admin");
    const user = await signedInUser("viewer");
    expect((await (await meAs(user.cookie)).json()).permissions).not.toContain("profiles:edit");

    const res = await patch(admin.cookie, user.id, JSON.stringify({ role: "engineer" }));
    expect(res.status).toBe(200);
    expect((await res.json()).user).toMatchObject({ role: "engineer", status: "active" });

    const after = await (await meAs(user.cookie)).json();
    expect(after.user.role).toBe("engineer");
    expect(after.permissions).toContain("profiles:edit");
    const audit = await db.select().from(auditEvents).where(and(eq(auditEvents.subjectId, user.id), eq(auditEvents.action, "user.role_changed")));
    expect(audit[0]?.detail).toEqual({ from: "viewer", to: "engineer" });
  });

  it("refuses a role that does not exist, naming the field", async () => {
    const admin = await signedInUser("admin");
    const user = await signedInUser("viewer");
    const res = await patch(admin.cookie, user.id, JSON.stringify({ role: "superuser" }));
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe("/role");
  });
});

describe("deactivation", () => {
  it("ends the user's sessions at once and refuses their next sign-in", async () => {
    const admin = await signedInUser("admin");
    const user = await signedInUser("technician");
    const second = await signIn(user.email, user.password);
    expect((await meAs(user.cookie)).status).toBe(200);
    expect((await countSessions({ userIds: [user.id] })).get(user.id)).toBe(2);

    const res = await patch(admin.cookie, user.id, JSON.stringify({ active: false }));
    expect(res.status).toBe(200);
    expect((await res.json()).user.status).toBe("deactivated");

    expect((await meAs(user.cookie)).status).toBe(401);
    expect((await meAs(second)).status).toBe(401);
    expect((await countSessions({ userIds: [user.id] })).get(user.id) ?? 0).toBe(0);
    const again = await authRequest("/sign-in/email", { email: user.email, password: user.password });
    expect(again.status).toBe(403);
    expect(await again.json()).toMatchObject({ code: "BANNED_USER" });
  });

  it("lets a reactivated user sign in again", async () => {
    const admin = await signedInUser("admin");
    const user = await signedInUser("viewer");
    await patch(admin.cookie, user.id, JSON.stringify({ active: false }));
    const res = await patch(admin.cookie, user.id, JSON.stringify({ active: true }));
    expect((await res.json()).user.status).toBe("active");
    await expect(signIn(user.email, user.password)).resolves.toContain("session_token");
  });
});

describe("the last active admin", () => {
  // These tests need to be the only active admin; others are parked and restored afterwards.
  let parked: string[] = [];
  async function parkOtherAdmins(keep: string[]) {
    const others = await db
      .select({ id: users.id })
      .from(users)
      .where(and(eq(users.role, "admin"), or(isNull(users.banned), eq(users.banned, false))));
    parked = others.map((o) => o.id).filter((id) => !keep.includes(id));
    for (const id of parked) await db.update(users).set({ banned: true }).where(eq(users.id, id));
  }
  afterEach(async () => {
    for (const id of parked) await db.update(users).set({ banned: false }).where(eq(users.id, id));
    parked = [];
  });

  it("cannot be demoted", async () => {
    const admin = await signedInUser("admin");
    await parkOtherAdmins([admin.id]);
    const res = await patch(admin.cookie, admin.id, JSON.stringify({ role: "viewer" }));
    expect(res.status).toBe(409);
    expect((await res.json()).message).toMatch(/at least one active admin/);
    expect((await db.select({ role: users.role }).from(users).where(eq(users.id, admin.id)))[0]?.role).toBe("admin");
  });

  it("cannot be deactivated", async () => {
    const admin = await signedInUser("admin");
    await parkOtherAdmins([admin.id]);
    const res = await patch(admin.cookie, admin.id, JSON.stringify({ active: false }));
    expect(res.status).toBe(409);
    expect((await meAs(admin.cookie)).status).toBe(200);
  });

  it("survives two admins demoting each other at the same moment", async () => {
    const a = await signedInUser("admin");
    const b = await signedInUser("admin");
    await parkOtherAdmins([a.id, b.id]);
    const results = await Promise.allSettled([
      changeUserRole({ actorId: a.id, userId: b.id, role: "viewer" }),
      changeUserRole({ actorId: b.id, userId: a.id, role: "viewer" }),
    ]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    const left = await db.select({ id: users.id }).from(users).where(and(eq(users.role, "admin"), or(eq(users.id, a.id), eq(users.id, b.id))));
    expect(left).toHaveLength(1);
  });

  it("can step down once another admin exists", async () => {
    const a = await signedInUser("admin");
    const b = await signedInUser("admin");
    await parkOtherAdmins([a.id, b.id]);
    await expect(deactivateUser({ actorId: b.id, userId: a.id })).resolves.toBeUndefined();
    await expect(deactivateUser({ actorId: b.id, userId: b.id })).rejects.toThrow(/at least one active admin/);
  });
});

describe("who may call the people API", () => {
  it("answers 401 without a session", async () => {
    const res = await listUsersRoute(new Request(`${base}/api/v1/users`), {});
    expect(res.status).toBe(401);
    expect(await res.json()).toMatchObject({ error: "unauthenticated" });
  });

  it("answers 403 to every non-admin role, for reads and writes", async () => {
    for (const role of ["viewer", "engineer", "reviewer", "technician"] as const) {
      const u = await signedInUser(role);
      expect((await listUsersRoute(new Request(`${base}/api/v1/users`, { headers: withCookie(u.cookie) }), {})).status).toBe(403);
      const post = await inviteRoute(
        new Request(`${base}/api/v1/users`, { method: "POST", headers: withCookie(u.cookie, { "content-type": "application/json" }), body: JSON.stringify({ name: "X", email: `x-${role}@example.test`, role: "admin" }) }),
        {},
      );
      expect(post.status).toBe(403);
      expect((await patch(u.cookie, u.id, JSON.stringify({ role: "admin" }))).status).toBe(403);
    }
  });

  it("answers 400 with a message to malformed JSON", async () => {
    const admin = await signedInUser("admin");
    const res = await patch(admin.cookie, admin.id, "{role:");
    expect(res.status).toBe(400);
    expect((await res.json()).message).toMatch(/not valid JSON/);
  });

  it("answers 400 to an empty change and to unknown fields", async () => {
    const admin = await signedInUser("admin");
    expect((await patch(admin.cookie, admin.id, "{}")).status).toBe(400);
    expect((await patch(admin.cookie, admin.id, JSON.stringify({ password: "x" }))).status).toBe(400);
  });

  it("answers 404 for a user that does not exist", async () => {
    const admin = await signedInUser("admin");
    expect((await patch(admin.cookie, "no-such-user", JSON.stringify({ role: "viewer" }))).status).toBe(404);
    expect((await getUserRoute(new Request(`${base}/api/v1/users/nope`, { headers: withCookie(admin.cookie) }), ctx("nope"))).status).toBe(404);
  });

  it("never returns password hashes", async () => {
    const admin = await signedInUser("admin");
    const body = await (await listUsersRoute(new Request(`${base}/api/v1/users`, { headers: withCookie(admin.cookie) }), {})).text();
    expect(body).not.toMatch(/password|\$argon|scrypt/i);
    expect(JSON.parse(body).users.length).toBeGreaterThan(0);
  });
});

describe("sign-in errors", () => {
  it("gives the same answer for a wrong password and an unknown address", async () => {
    const u = await signedInUser("viewer");
    const wrong = await authRequest("/sign-in/email", { email: u.email, password: "not-the-password" });
    const unknown = await authRequest("/sign-in/email", { email: `nobody-${u.id}@example.test`, password: "not-the-password" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    const [a, b] = [await wrong.json(), await unknown.json()];
    expect(a).toEqual(b);
    expect(JSON.stringify(a)).not.toMatch(/password is|no user|not found/i);
  });

  it("refuses self sign-up", async () => {
    const email = `self-${Date.now()}@example.test`;
    const res = await authRequest("/sign-up/email", { email, password: "self-signup-pass", name: "Self" });
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(await db.select({ id: users.id }).from(users).where(eq(users.email, email))).toHaveLength(0);
  });
});
