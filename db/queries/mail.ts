import { and, desc, eq, inArray, lt, lte, sql } from "drizzle-orm";
import { db } from "@/db/client";
import { accounts, capturedMails, mailOutbox } from "@/db/schema";
import { retryDelaySeconds } from "@/lib/mail/templates";

export const MAX_MAIL_ATTEMPTS = 8;

export type OutboxKind = (typeof mailOutbox.$inferInsert)["kind"];

/** Adds a message to the outbox and returns its id. */
export async function enqueueMail(mail: {
  kind: OutboxKind;
  toAddress: string;
  subject: string;
  textBody: string;
  htmlBody?: string;
}): Promise<number> {
  const [row] = await db.insert(mailOutbox).values(mail).$returningId();
  return row!.id;
}

/** Whether the user already has a password (so a link is a reset, not an invitation). */
export async function userHasPassword({ userId }: { userId: string }): Promise<boolean> {
  const rows = await db
    .select({ id: accounts.id })
    .from(accounts)
    .where(and(eq(accounts.userId, userId), eq(accounts.providerId, "credential")))
    .limit(1);
  return rows.length > 0;
}

type Sender = (mail: { to: string; subject: string; text: string; html: string | null }) => Promise<void>;

/**
 * Sends due messages. Rows are locked with SKIP LOCKED, so several app instances never send one twice.
 * Returns how many were sent and how many failed.
 */
export async function deliverDue({ send, now = new Date(), limit = 20 }: { send: Sender; now?: Date; limit?: number }) {
  let sent = 0;
  let failed = 0;
  await db.transaction(async (tx) => {
    const due = await tx
      .select()
      .from(mailOutbox)
      .where(
        and(
          inArray(mailOutbox.status, ["queued", "failed"]),
          lte(mailOutbox.nextAttemptAt, now),
          lt(mailOutbox.attempts, MAX_MAIL_ATTEMPTS),
        ),
      )
      .orderBy(mailOutbox.id)
      .limit(limit)
      .for("update", { skipLocked: true });
    for (const mail of due) {
      try {
        await send({ to: mail.toAddress, subject: mail.subject, text: mail.textBody, html: mail.htmlBody });
        await tx
          .update(mailOutbox)
          .set({ status: "sent", sentAt: new Date(), attempts: mail.attempts + 1, lastError: null })
          .where(eq(mailOutbox.id, mail.id));
        sent++;
      } catch (err) {
        const attempts = mail.attempts + 1;
        await tx
          .update(mailOutbox)
          .set({
            status: "failed",
            attempts,
            lastError: (err instanceof Error ? err.message : String(err)).slice(0, 500),
            nextAttemptAt: new Date(now.getTime() + retryDelaySeconds(attempts) * 1000),
          })
          .where(eq(mailOutbox.id, mail.id));
        failed++;
      }
    }
  });
  return { sent, failed };
}

export type OutboxRow = {
  id: number;
  kind: OutboxKind;
  toAddress: string;
  subject: string;
  status: "queued" | "sent" | "failed";
  attempts: number;
  lastError: string | null;
  createdAt: Date;
  sentAt: Date | null;
  nextAttemptAt: Date;
};

/** The newest outbox entries, for the admin mail page. */
export async function listOutbox({ limit = 50 }: { limit?: number } = {}): Promise<OutboxRow[]> {
  return db
    .select({
      id: mailOutbox.id,
      kind: mailOutbox.kind,
      toAddress: mailOutbox.toAddress,
      subject: mailOutbox.subject,
      status: mailOutbox.status,
      attempts: mailOutbox.attempts,
      lastError: mailOutbox.lastError,
      createdAt: mailOutbox.createdAt,
      sentAt: mailOutbox.sentAt,
      nextAttemptAt: mailOutbox.nextAttemptAt,
    })
    .from(mailOutbox)
    .orderBy(desc(mailOutbox.id))
    .limit(limit);
}

/** Makes an unsent message due again now, with a fresh set of attempts. */
export async function retryMail({ mailId }: { mailId: number }): Promise<boolean> {
  const [res] = await db
    .update(mailOutbox)
    .set({ attempts: 0, nextAttemptAt: sql`CURRENT_TIMESTAMP(3)` })
    .where(and(eq(mailOutbox.id, mailId), inArray(mailOutbox.status, ["queued", "failed"])));
  return res.affectedRows > 0;
}

/** Stores a message received by the local SMTP stand-in. */
export async function captureMail(mail: typeof capturedMails.$inferInsert): Promise<number> {
  const [row] = await db.insert(capturedMails).values(mail).$returningId();
  return row!.id;
}

export type CapturedSummary = { id: number; envelopeTo: string; subject: string; receivedAt: Date };

/** The newest captured messages, optionally only those sent to one address. */
export async function listCapturedMails({ limit = 50, to }: { limit?: number; to?: string } = {}) {
  return db
    .select({
      id: capturedMails.id,
      envelopeTo: capturedMails.envelopeTo,
      subject: capturedMails.subject,
      receivedAt: capturedMails.receivedAt,
    })
    .from(capturedMails)
    .where(to ? sql`FIND_IN_SET(${to.toLowerCase()}, LOWER(${capturedMails.envelopeTo}))` : undefined)
    .orderBy(desc(capturedMails.id))
    .limit(limit);
}

/** One captured message with its bodies. */
export async function getCapturedMail({ mailId }: { mailId: number }) {
  const [row] = await db.select().from(capturedMails).where(eq(capturedMails.id, mailId)).limit(1);
  return row ?? null;
}
