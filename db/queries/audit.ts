import { and, desc, eq, like, lt, type SQL } from "drizzle-orm";
import { db, type Tx } from "@/db/client";
import { auditEvents, users } from "@/db/schema";

export type AuditInput = {
  actorId: string | null;
  action: string;
  subjectType: string;
  subjectId: string;
  detail?: Record<string, unknown>;
};

/** Appends an audit event; pass the transaction that makes the change so both commit together. */
export async function recordAudit(event: AuditInput, tx: Tx | typeof db = db): Promise<void> {
  await tx.insert(auditEvents).values(event);
}

export type AuditFilter = { action?: string; actorEmail?: string; subjectType?: string; beforeId?: number; limit?: number };

/** The newest audit events with the actor's name, optionally filtered; `beforeId` pages back. */
export async function listAuditEvents({ action, actorEmail, subjectType, beforeId, limit = 100 }: AuditFilter = {}) {
  const where: SQL[] = [];
  if (action) where.push(like(auditEvents.action, `${action.replace(/[%_\\]/g, "")}%`));
  if (actorEmail) where.push(eq(users.email, actorEmail));
  if (subjectType) where.push(eq(auditEvents.subjectType, subjectType));
  if (beforeId) where.push(lt(auditEvents.id, beforeId));
  return db
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      subjectType: auditEvents.subjectType,
      subjectId: auditEvents.subjectId,
      detail: auditEvents.detail,
      createdAt: auditEvents.createdAt,
      actorName: users.name,
      actorEmail: users.email,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(where.length ? and(...where) : undefined)
    .orderBy(desc(auditEvents.id))
    .limit(limit);
}
