import { desc, eq } from "drizzle-orm";
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

/** The newest audit events with the actor's name. */
export async function listAuditEvents({ limit = 100 }: { limit?: number } = {}) {
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
    .orderBy(desc(auditEvents.id))
    .limit(limit);
}
