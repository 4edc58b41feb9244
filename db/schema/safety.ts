/** Safety: the review queue over entries, calibration sources and their checkouts. */
import { double, index, int, mysqlEnum, mysqlTable, primaryKey, text, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { id, ref, utc } from "./columns";
import { users } from "./auth";
import { entries } from "./logbook";

export const REVIEW_STATES = ["awaiting_review", "acknowledged", "follow_up", "closed"] as const;
export type ReviewState = (typeof REVIEW_STATES)[number];

export const safetyReviews = mysqlTable(
  "safety_reviews",
  {
    id: id(),
    entryId: ref("entry_id").notNull().unique().references(() => entries.id, { onDelete: "cascade" }),
    state: mysqlEnum("state", REVIEW_STATES).notNull().default("awaiting_review"),
    // The entry revision the last review step looked at; a newer revision re-opens the item.
    reviewedRevision: int("reviewed_revision"),
    enteredAt: utc("entered_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("safety_reviews_state_idx").on(t.state, t.enteredAt)],
);

export const safetyReviewEvents = mysqlTable(
  "safety_review_events",
  {
    id: id(),
    reviewId: ref("review_id").notNull().references(() => safetyReviews.id, { onDelete: "cascade" }),
    fromState: mysqlEnum("from_state", REVIEW_STATES),
    toState: mysqlEnum("to_state", REVIEW_STATES).notNull(),
    comment: text("comment").notNull(),
    actorId: ref("actor_id").references(() => users.id),
    at: utc("at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("safety_review_events_review_idx").on(t.reviewId)],
);

export const SOURCE_FORMS = ["sealed", "gaseous"] as const;

export const calibrationSources = mysqlTable("calibration_sources", {
  id: id(),
  nuclide: varchar("nuclide", { length: 20 }).notNull(),
  serial: varchar("serial", { length: 60 }).notNull().unique(),
  form: mysqlEnum("form", SOURCE_FORMS).notNull(),
  referenceActivityBq: double("reference_activity_bq").notNull(),
  referenceDate: utc("reference_date").notNull(),
  location: varchar("location", { length: 120 }).notNull(),
  custodianId: ref("custodian_id").references(() => users.id),
  allowedOutHours: double("allowed_out_hours").notNull(),
  leakTestIntervalMonths: int("leak_test_interval_months"),
  lastLeakTestAt: utc("last_leak_test_at"),
  // Gaseous sources: science data counts again once activity falls below this fraction of the injected activity.
  decayWaitFraction: double("decay_wait_fraction"),
  notes: text("notes"),
  createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});

export const sourceCheckouts = mysqlTable(
  "source_checkouts",
  {
    id: id(),
    sourceId: ref("source_id").notNull().references(() => calibrationSources.id),
    checkedOutBy: ref("checked_out_by").notNull().references(() => users.id),
    checkedOutAt: utc("checked_out_at").notNull(),
    purpose: varchar("purpose", { length: 200 }).notNull(),
    returnedAt: utc("returned_at"),
    returnedBy: ref("returned_by").references(() => users.id),
    overdueNotifiedAt: utc("overdue_notified_at"),
  },
  (t) => [index("source_checkouts_source_idx").on(t.sourceId, t.checkedOutAt)],
);

export const checkoutRuns = mysqlTable(
  "checkout_runs",
  {
    checkoutId: ref("checkout_id").notNull().references(() => sourceCheckouts.id, { onDelete: "cascade" }),
    runNumber: int("run_number").notNull(),
  },
  (t) => [primaryKey({ columns: [t.checkoutId, t.runNumber] })],
);

