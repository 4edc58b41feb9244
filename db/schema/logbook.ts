/** Entries (append-only, one row per revision), their links to runs, tags and attachments. */
import { bigint, boolean, index, int, mysqlEnum, mysqlTable, primaryKey, text, uniqueIndex, varchar, mediumtext } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { id, jsonb, ref, utc } from "./columns";
import { users } from "./auth";

export const ENTRY_CATEGORIES = [
  "shift_summary",
  "run_note",
  "detector",
  "cryogenics",
  "radiation",
  "daq_computing",
  "calibration",
  "maintenance",
  "incident",
] as const;
export type EntryCategory = (typeof ENTRY_CATEGORIES)[number];

export const entries = mysqlTable(
  "entries",
  {
    id: id(),
    category: mysqlEnum("category", ENTRY_CATEGORIES).notNull(),
    authorId: ref("author_id").notNull().references(() => users.id),
    // The newest revision number; an edit must name it to be accepted (stale edits are refused).
    currentRevision: int("current_revision").notNull().default(1),
    needsSafetyReview: boolean("needs_safety_review").notNull().default(false),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    retractedAt: utc("retracted_at"),
    retractedBy: ref("retracted_by").references(() => users.id),
    retractReason: text("retract_reason"),
  },
  (t) => [index("entries_created_idx").on(t.createdAt), index("entries_category_idx").on(t.category, t.createdAt)],
);

export const entryRevisions = mysqlTable(
  "entry_revisions",
  {
    id: id(),
    entryId: ref("entry_id").notNull().references(() => entries.id, { onDelete: "cascade" }),
    revision: int("revision").notNull(),
    title: varchar("title", { length: 200 }).notNull(),
    body: mediumtext("body").notNull(),
    // Snapshot of the links at this revision, so the history shows what changed.
    tags: jsonb("tags").$type<string[]>().notNull(),
    runNumbers: jsonb("run_numbers").$type<number[]>().notNull(),
    authorId: ref("author_id").notNull().references(() => users.id),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    // True only on the newest revision; the FULLTEXT search reads these rows.
    isCurrent: boolean("is_current").notNull().default(true),
  },
  (t) => [uniqueIndex("entry_revisions_entry_rev_uq").on(t.entryId, t.revision), index("entry_revisions_current_idx").on(t.isCurrent)],
);

export const entryTags = mysqlTable(
  "entry_tags",
  {
    entryId: ref("entry_id").notNull().references(() => entries.id, { onDelete: "cascade" }),
    tag: varchar("tag", { length: 60 }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.entryId, t.tag] }), index("entry_tags_tag_idx").on(t.tag)],
);

export const entryRuns = mysqlTable(
  "entry_runs",
  {
    entryId: ref("entry_id").notNull().references(() => entries.id, { onDelete: "cascade" }),
    runNumber: int("run_number").notNull(),
  },
  (t) => [primaryKey({ columns: [t.entryId, t.runNumber] }), index("entry_runs_run_idx").on(t.runNumber)],
);

export const ATTACHMENT_STATES = ["pending", "stored", "failed"] as const;

export const attachments = mysqlTable(
  "attachments",
  {
    id: id(),
    entryId: ref("entry_id").notNull().references(() => entries.id, { onDelete: "cascade" }),
    // Made by the server (random); the file name is display text only.
    objectKey: varchar("object_key", { length: 200 }).notNull().unique(),
    fileName: varchar("file_name", { length: 255 }).notNull(),
    contentType: varchar("content_type", { length: 100 }).notNull(),
    sizeBytes: bigint("size_bytes", { mode: "number" }).notNull(),
    state: mysqlEnum("state", ATTACHMENT_STATES).notNull().default("pending"),
    failureReason: varchar("failure_reason", { length: 300 }),
    uploadedBy: ref("uploaded_by").notNull().references(() => users.id),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("attachments_entry_idx").on(t.entryId)],
);
