/** Data quality: subsystems, bad-time flags with their two-person history, and data-quality periods. */
import { boolean, double, index, int, mysqlEnum, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { id, jsonb, ref, utc } from "./columns";
import { users } from "./auth";
import type { RunType } from "./runs";

/** Configurable list of subsystems a flag can name. */
export const subsystems = mysqlTable("subsystems", {
  code: varchar("code", { length: 40 }).primaryKey(),
  label: varchar("label", { length: 80 }).notNull(),
  active: boolean("active").notNull().default(true),
});

export const FLAG_VERDICTS = ["exclude", "caution"] as const;
export type FlagVerdict = (typeof FLAG_VERDICTS)[number];
export const FLAG_STATES = ["proposed", "confirmed", "withdrawn"] as const;
export type FlagState = (typeof FLAG_STATES)[number];

export const badTimeFlags = mysqlTable(
  "bad_time_flags",
  {
    id: id(),
    startAt: utc("start_at").notNull(),
    endAt: utc("end_at").notNull(),
    subsystem: varchar("subsystem", { length: 40 }).notNull().references(() => subsystems.code),
    verdict: mysqlEnum("verdict", FLAG_VERDICTS).notNull(),
    reason: text("reason").notNull(),
    state: mysqlEnum("state", FLAG_STATES).notNull().default("proposed"),
    proposedBy: ref("proposed_by").notNull().references(() => users.id),
    proposedAt: utc("proposed_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    confirmedBy: ref("confirmed_by").references(() => users.id),
    confirmedAt: utc("confirmed_at"),
    withdrawnBy: ref("withdrawn_by").references(() => users.id),
    withdrawnAt: utc("withdrawn_at"),
    withdrawReason: text("withdraw_reason"),
  },
  (t) => [index("flags_state_start_idx").on(t.state, t.startAt)],
);

/** Every step of a flag's life: proposed, confirmed, withdrawn, with who and why. */
export const flagEvents = mysqlTable(
  "flag_events",
  {
    id: id(),
    flagId: ref("flag_id").notNull().references(() => badTimeFlags.id, { onDelete: "cascade" }),
    action: varchar("action", { length: 30 }).notNull(),
    actorId: ref("actor_id").notNull().references(() => users.id),
    comment: text("comment"),
    at: utc("at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("flag_events_flag_idx").on(t.flagId)],
);

export const LIMIT_METHODS = ["classical", "fc", "bayes"] as const;
export type LimitMethod = (typeof LIMIT_METHODS)[number];

export const dqPeriods = mysqlTable("dq_periods", {
  id: id(),
  name: varchar("name", { length: 120 }).notNull().unique(),
  startAt: utc("start_at").notNull(),
  endAt: utc("end_at").notNull(),
  runTypes: jsonb("run_types").$type<RunType[]>().notNull(),
  // Detectors have different targets, so a period normally counts one; null counts every detector's runs.
  detector: varchar("detector", { length: 60 }),
  signalAcceptance: double("signal_acceptance").notNull(),
  notes: text("notes"),
  blind: boolean("blind").notNull().default(false),
  // Counting result: hidden while blind; recorded by a convener.
  observedCount: int("observed_count"),
  expectedBackground: double("expected_background"),
  backgroundNote: text("background_note"),
  confidenceLevel: double("confidence_level").notNull().default(0.9),
  limitMethod: mysqlEnum("limit_method", LIMIT_METHODS).notNull().default("fc"),
  unblindedAt: utc("unblinded_at"),
  unblindedBy: ref("unblinded_by").references(() => users.id),
  createdBy: ref("created_by").references(() => users.id),
  createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});
