import { index, int, mediumtext, mysqlEnum, mysqlTable, text, timestamp, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { autoId, createdAt } from "./columns";

/** Every message the app wants to send; delivery is tracked so a failure is visible and can be retried. */
export const mailOutbox = mysqlTable(
  "mail_outbox",
  {
    id: autoId(),
    kind: mysqlEnum("kind", ["invitation", "password_reset", "notice"]).notNull(),
    toAddress: varchar("to_address", { length: 191 }).notNull(),
    subject: varchar("subject", { length: 255 }).notNull(),
    textBody: mediumtext("text_body").notNull(),
    htmlBody: mediumtext("html_body"),
    status: mysqlEnum("status", ["queued", "sent", "failed"]).notNull().default("queued"),
    attempts: int("attempts").notNull().default(0),
    lastError: text("last_error"),
    nextAttemptAt: timestamp("next_attempt_at", { fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    createdAt: createdAt(),
    sentAt: timestamp("sent_at", { fsp: 3 }),
  },
  (t) => [index("mail_outbox_status_idx").on(t.status, t.nextAttemptAt)],
);

/** Messages received by the local SMTP stand-in (development and tests only). */
export const capturedMails = mysqlTable(
  "captured_mails",
  {
    id: autoId(),
    envelopeFrom: varchar("envelope_from", { length: 191 }).notNull(),
    envelopeTo: varchar("envelope_to", { length: 1000 }).notNull(),
    subject: varchar("subject", { length: 255 }).notNull(),
    textBody: mediumtext("text_body").notNull(),
    htmlBody: mediumtext("html_body"),
    receivedAt: timestamp("received_at", { fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("captured_mails_received_idx").on(t.receivedAt)],
);
