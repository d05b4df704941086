import { sql } from "drizzle-orm";
import { int, timestamp } from "drizzle-orm/mysql-core";

// MariaDB rejects Drizzle's `serial AUTO_INCREMENT`; an unsigned INT key is plenty here.
export const autoId = () => int("id", { unsigned: true }).autoincrement().primaryKey();

/** Millisecond timestamps, set by the database on insert. */
export const createdAt = () =>
  timestamp("created_at", { fsp: 3 }).notNull().default(sql`CURRENT_TIMESTAMP(3)`);
export const updatedAt = () =>
  timestamp("updated_at", { fsp: 3 })
    .notNull()
    .default(sql`CURRENT_TIMESTAMP(3)`)
    .$onUpdate(() => new Date());
