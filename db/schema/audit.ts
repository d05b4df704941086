import { index, json, mysqlTable, timestamp, varchar } from "drizzle-orm/mysql-core";
import { autoId, createdAt } from "./columns";
import { users } from "./auth";

/** Append-only record of who changed what; written in the same transaction as the change. */
export const auditEvents = mysqlTable(
  "audit_events",
  {
    id: autoId(),
    actorId: varchar("actor_id", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    action: varchar("action", { length: 64 }).notNull(),
    subjectType: varchar("subject_type", { length: 32 }).notNull(),
    subjectId: varchar("subject_id", { length: 64 }).notNull(),
    detail: json("detail").$type<Record<string, unknown>>(),
    createdAt: createdAt(),
  },
  (t) => [index("audit_events_created_idx").on(t.createdAt)],
);
