import { bigint, char, index, int, json, mediumtext, mysqlEnum, mysqlTable, timestamp, tinyint, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { autoId, createdAt, updatedAt } from "./columns";
import { doorModels, sites } from "./fleet";
import { profileRevisions } from "./profiles";

/** An installed door controller. */
export const controllers = mysqlTable(
  "controllers",
  {
    id: autoId(),
    serial: varchar("serial", { length: 32 }).notNull().unique(),
    doorModelId: int("door_model_id", { unsigned: true })
      .notNull()
      .references(() => doorModels.id),
    siteId: int("site_id", { unsigned: true })
      .notNull()
      .references(() => sites.id),
    firmwareVersion: varchar("firmware_version", { length: 32 }).notNull(),
    parameterSetVersion: tinyint("parameter_set_version", { unsigned: true }).notNull(),
    runningHash: char("running_hash", { length: 64 }),
    lastSeenAt: timestamp("last_seen_at", { fsp: 3 }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("controllers_site_idx").on(t.siteId), index("controllers_model_idx").on(t.doorModelId)],
);

/** Device credentials: only the SHA-256 of the token is kept; revoked tokens stay for the record. */
export const controllerTokens = mysqlTable(
  "controller_tokens",
  {
    id: autoId(),
    controllerId: int("controller_id", { unsigned: true })
      .notNull()
      .references(() => controllers.id),
    tokenHash: char("token_hash", { length: 64 }).notNull().unique(),
    hint: varchar("hint", { length: 8 }).notNull(),
    createdBy: varchar("created_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    revokedAt: timestamp("revoked_at", { fsp: 3 }),
  },
  (t) => [index("controller_tokens_controller_idx").on(t.controllerId)],
);

/**
 * A release puts an approved base revision (and the approved site overlays of that door model at
 * release time, pinned in `overlayRevisionIds`) onto a target, to a share of it.
 */
export const releases = mysqlTable(
  "releases",
  {
    id: autoId(),
    baseRevisionId: int("base_revision_id", { unsigned: true })
      .notNull()
      .references(() => profileRevisions.id),
    doorModelId: int("door_model_id", { unsigned: true })
      .notNull()
      .references(() => doorModels.id),
    overlayRevisionIds: json("overlay_revision_ids").$type<Record<string, number>>().notNull(),
    targetKind: mysqlEnum("target_kind", ["door_model", "site", "controllers"]).notNull(),
    targetSiteId: int("target_site_id", { unsigned: true }).references(() => sites.id),
    targetSerials: json("target_serials").$type<string[]>(),
    percent: tinyint("percent", { unsigned: true }).notNull(),
    state: mysqlEnum("state", ["active", "paused", "rolled_back"]).notNull().default("active"),
    note: varchar("note", { length: 500 }),
    createdBy: varchar("created_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("releases_model_idx").on(t.doorModelId, t.state)],
);

/** What a controller reported on each check-in. */
export const checkIns = mysqlTable(
  "check_ins",
  {
    id: bigint("id", { mode: "number", unsigned: true }).autoincrement().primaryKey(),
    controllerId: int("controller_id", { unsigned: true })
      .notNull()
      .references(() => controllers.id),
    receivedAt: createdAt(),
    appliedHash: char("applied_hash", { length: 64 }),
    refusedReason: varchar("refused_reason", { length: 500 }),
    firmwareVersion: varchar("firmware_version", { length: 32 }).notNull(),
    uptimeS: int("uptime_s", { unsigned: true }).notNull(),
    doorCycles: int("door_cycles", { unsigned: true }).notNull(),
    lastOpenCounts: int("last_open_counts", { unsigned: true }),
    lastCloseCounts: int("last_close_counts", { unsigned: true }),
    lastTravelMs: int("last_travel_ms", { unsigned: true }),
    stallEvents: int("stall_events", { unsigned: true }).notNull(),
    timeFixAgeS: int("time_fix_age_s", { unsigned: true }),
  },
  (t) => [index("check_ins_controller_idx").on(t.controllerId, t.receivedAt)],
);

/** A recorded calibration run (the CSV as uploaded, and what was computed from it). */
export const calibrationRuns = mysqlTable("calibration_runs", {
  id: autoId(),
  controllerId: int("controller_id", { unsigned: true })
    .notNull()
    .references(() => controllers.id),
  fileName: varchar("file_name", { length: 191 }).notNull(),
  csv: mediumtext("csv").notNull(),
  analysis: json("analysis").$type<Record<string, unknown>>().notNull(),
  uploadedBy: varchar("uploaded_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
  createdAt: createdAt(),
});

/**
 * One row whose number goes up in the same transaction as every change to releases. Each device
 * poll reads it with the token lookup, so every app instance sees a release at once and may keep
 * what it computed for a controller until the number moves.
 */
export const configGeneration = mysqlTable("config_generation", {
  id: tinyint("id", { unsigned: true }).primaryKey(),
  generation: bigint("generation", { mode: "number", unsigned: true }).notNull(),
});
