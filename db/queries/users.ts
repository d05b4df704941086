import { and, asc, eq, inArray, or, isNull, sql } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { sessions, users } from "@/db/schema";
import type { Role } from "@/lib/auth/permissions";
import { AppError } from "@/lib/http/errors";
import { recordAudit } from "./audit";

export type UserStatus = "invited" | "active" | "deactivated";

export type UserSummary = {
  id: string;
  name: string;
  email: string;
  role: Role;
  status: UserStatus;
  createdAt: Date;
};

const activeFilter = or(isNull(users.banned), eq(users.banned, false));

/** Every user with a status derived from their account: invited (no password yet), active or deactivated. */
export async function listUsers(): Promise<UserSummary[]> {
  const rows = await db
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      role: users.role,
      banned: users.banned,
      createdAt: users.createdAt,
      // Spelled out: Drizzle drops table names inside a one-table select, which would make this ambiguous.
      hasPassword: sql<number>`EXISTS (SELECT 1 FROM accounts a WHERE a.user_id = users.id AND a.provider_id = 'credential')`,
    })
    .from(users)
    .orderBy(asc(users.name));
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    email: r.email,
    role: r.role as Role,
    status: r.banned ? "deactivated" : Number(r.hasPassword) ? "active" : "invited",
    createdAt: r.createdAt,
  }));
}

/** One user, or null. */
export async function getUser({ userId }: { userId: string }): Promise<UserSummary | null> {
  return (await listUsers()).find((u) => u.id === userId) ?? null;
}

/** Name and e-mail of a user, or null. */
export async function findUserById({ userId }: { userId: string }) {
  const [row] = await db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.id, userId)).limit(1);
  return row ?? null;
}

/** Looks a user up by e-mail (case-insensitive). */
export async function findUserByEmail({ email }: { email: string }) {
  const [row] = await db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(eq(sql`LOWER(${users.email})`, email.toLowerCase()))
    .limit(1);
  return row ?? null;
}

const LAST_ADMIN = "Roostline needs at least one active admin: make someone else an admin first.";

/**
 * Locks every active admin row and the target row, in that order (a fixed order avoids deadlocks),
 * and refuses when the change would take away the last active admin.
 */
async function lockForAdminChange(tx: Tx, userId: string, removesAdmin: (target: { role: string; banned: boolean | null }) => boolean) {
  const admins = await tx.select({ id: users.id }).from(users).where(and(eq(users.role, "admin"), activeFilter)).for("update");
  const [target] = await tx.select({ id: users.id, role: users.role, banned: users.banned }).from(users).where(eq(users.id, userId)).for("update");
  if (!target) throw new AppError("not_found", "No such user.");
  if (removesAdmin(target) && admins.some((a) => a.id === userId) && admins.length <= 1) throw new AppError("conflict", LAST_ADMIN);
  return target;
}

/**
 * Changes a user's role. Active admins are locked first, so two admins demoting each other
 * at the same moment cannot leave the system without one.
 */
export async function changeUserRole({ actorId, userId, role }: { actorId: string; userId: string; role: Role }) {
  await db.transaction(async (tx) => {
    const target = await lockForAdminChange(tx, userId, (t) => t.role === "admin" && role !== "admin");
    if (target.role === role) return;
    await tx.update(users).set({ role }).where(eq(users.id, userId));
    await recordAudit({ actorId, action: "user.role_changed", subjectType: "user", subjectId: userId, detail: { from: target.role, to: role } }, tx);
  });
}

/** Deactivates a user and ends all their sessions at once; refuses to deactivate the last active admin. */
export async function deactivateUser({ actorId, userId }: { actorId: string; userId: string }) {
  await db.transaction(async (tx) => {
    const target = await lockForAdminChange(tx, userId, (t) => !t.banned);
    if (target.banned) return;
    await tx.update(users).set({ banned: true, banReason: "deactivated by an admin" }).where(eq(users.id, userId));
    await tx.delete(sessions).where(eq(sessions.userId, userId));
    await recordAudit({ actorId, action: "user.deactivated", subjectType: "user", subjectId: userId }, tx);
  });
}

/** Lets a deactivated user sign in again. */
export async function reactivateUser({ actorId, userId }: { actorId: string; userId: string }) {
  await db.transaction(async (tx) => {
    const [target] = await tx.select({ id: users.id, banned: users.banned }).from(users).where(eq(users.id, userId)).for("update");
    if (!target) throw new AppError("not_found", "No such user.");
    if (!target.banned) return;
    await tx.update(users).set({ banned: false, banReason: null, banExpires: null }).where(eq(users.id, userId));
    await recordAudit({ actorId, action: "user.reactivated", subjectType: "user", subjectId: userId }, tx);
  });
}

/** How many sessions a user has (tests and the users page). */
export async function countSessions({ userIds }: { userIds: string[] }): Promise<Map<string, number>> {
  if (!userIds.length) return new Map();
  const rows = await db
    .select({ userId: sessions.userId, n: sql<number>`COUNT(*)` })
    .from(sessions)
    .where(and(inArray(sessions.userId, userIds), sql`${sessions.expiresAt} > CURRENT_TIMESTAMP(3)`))
    .groupBy(sessions.userId);
  return new Map(rows.map((r) => [r.userId, Number(r.n)]));
}
