import { char, index, int, json, mysqlEnum, mysqlTable, text, timestamp, tinyint, uniqueIndex, varchar } from "drizzle-orm/mysql-core";
import { users } from "./auth";
import { autoId, createdAt, updatedAt } from "./columns";
import { doorModels, sites } from "./fleet";

/** The parameter-set schemas, one row per firmware parameter-set version (the files in schemas/ are the source). */
export const parameterSchemas = mysqlTable("parameter_schemas", {
  version: tinyint("version", { unsigned: true }).primaryKey(),
  schemaId: varchar("schema_id", { length: 191 }).notNull().unique(),
  title: varchar("title", { length: 191 }).notNull(),
  schema: json("schema").$type<Record<string, unknown>>().notNull(),
  schemaHash: char("schema_hash", { length: 64 }).notNull(),
  createdAt: createdAt(),
});

/**
 * A profile is one layer: a door model's base, a site's overlay or one controller's overlay.
 * Its content lives in immutable revisions; `headRevisionId` is the newest.
 */
export const profiles = mysqlTable(
  "profiles",
  {
    id: autoId(),
    layer: mysqlEnum("layer", ["base", "site", "controller"]).notNull(),
    name: varchar("name", { length: 191 }).notNull(),
    doorModelId: int("door_model_id", { unsigned: true }).references(() => doorModels.id),
    siteId: int("site_id", { unsigned: true }).references(() => sites.id),
    controllerSerial: varchar("controller_serial", { length: 64 }),
    schemaVersion: tinyint("schema_version", { unsigned: true })
      .notNull()
      .references(() => parameterSchemas.version),
    headRevisionId: int("head_revision_id", { unsigned: true }),
    createdBy: varchar("created_by", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("profiles_door_model_idx").on(t.doorModelId), index("profiles_site_idx").on(t.siteId)],
);

export const REVISION_STATES = ["draft", "in_review", "changes_requested", "approved", "withdrawn", "superseded"] as const;
export type RevisionState = (typeof REVISION_STATES)[number];

/** One saved version of a profile's content. Content and hash never change after insert; only `state` moves. */
export const profileRevisions = mysqlTable(
  "profile_revisions",
  {
    id: autoId(),
    profileId: int("profile_id", { unsigned: true })
      .notNull()
      .references(() => profiles.id),
    number: int("number", { unsigned: true }).notNull(),
    parentRevisionId: int("parent_revision_id", { unsigned: true }),
    schemaVersion: tinyint("schema_version", { unsigned: true }).notNull(),
    content: json("content").$type<Record<string, unknown>>().notNull(),
    contentHash: char("content_hash", { length: 64 }).notNull(),
    message: varchar("message", { length: 500 }).notNull(),
    state: mysqlEnum("state", REVISION_STATES).notNull().default("draft"),
    safetyRelevant: tinyint("safety_relevant").notNull().default(0),
    requiredApprovals: tinyint("required_approvals", { unsigned: true }).notNull().default(1),
    authorId: varchar("author_id", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    submittedAt: timestamp("submitted_at", { fsp: 3 }),
    decidedAt: timestamp("decided_at", { fsp: 3 }),
  },
  (t) => [uniqueIndex("profile_revisions_number_uq").on(t.profileId, t.number), index("profile_revisions_state_idx").on(t.state)],
);

/** A reviewer's decision on a revision, bound to the content hash they saw. */
export const reviewDecisions = mysqlTable(
  "review_decisions",
  {
    id: autoId(),
    revisionId: int("revision_id", { unsigned: true })
      .notNull()
      .references(() => profileRevisions.id),
    reviewerId: varchar("reviewer_id", { length: 36 })
      .notNull()
      .references(() => users.id),
    decision: mysqlEnum("decision", ["approve", "request_changes"]).notNull(),
    contentHash: char("content_hash", { length: 64 }).notNull(),
    comment: text("comment"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("review_decisions_one_per_reviewer").on(t.revisionId, t.reviewerId)],
);

/** A remark anchored to a parameter path of a revision. */
export const reviewComments = mysqlTable(
  "review_comments",
  {
    id: autoId(),
    revisionId: int("revision_id", { unsigned: true })
      .notNull()
      .references(() => profileRevisions.id),
    authorId: varchar("author_id", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    path: varchar("path", { length: 255 }).notNull(),
    body: text("body").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("review_comments_revision_idx").on(t.revisionId)],
);

/** The author's reason for going ahead despite a safety warning, per revision and rule. */
export const safetyAcknowledgements = mysqlTable(
  "safety_acknowledgements",
  {
    id: autoId(),
    revisionId: int("revision_id", { unsigned: true })
      .notNull()
      .references(() => profileRevisions.id),
    ruleId: varchar("rule_id", { length: 64 }).notNull(),
    reason: varchar("reason", { length: 1000 }).notNull(),
    authorId: varchar("author_id", { length: 36 }).references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("safety_ack_uq").on(t.revisionId, t.ruleId)],
);

/** Team-wide settings an admin may change (e.g. approvals needed for safety-relevant changes). */
export const appSettings = mysqlTable("app_settings", {
  key: varchar("key", { length: 64 }).primaryKey(),
  value: json("value").notNull(),
  updatedAt: updatedAt(),
});
