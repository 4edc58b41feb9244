/** Detector configurations and runs: what the DAQ took, when, and on which target mass. */
import { bigint, decimal, index, int, mysqlEnum, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { id, jsonb, ref, utc } from "./columns";
import { machineTokens, users } from "./auth";

export const RUN_TYPES = ["science", "calibration", "background", "noise", "commissioning"] as const;
export type RunType = (typeof RUN_TYPES)[number];
export const RUN_STATUSES = ["running", "ended", "aborted"] as const;
export type RunStatus = (typeof RUN_STATUSES)[number];

export const detectorConfigs = mysqlTable(
  "detector_configs",
  {
    id: id(),
    detector: varchar("detector", { length: 60 }).notNull(),
    name: varchar("name", { length: 120 }).notNull(),
    targetMaterial: varchar("target_material", { length: 60 }).notNull(),
    // Exact decimal: exposure figures are quoted to the gram.
    fiducialMassKg: decimal("fiducial_mass_kg", { precision: 12, scale: 4 }).notNull(),
    effectiveFrom: utc("effective_from").notNull(),
    notes: text("notes"),
    createdBy: ref("created_by").references(() => users.id),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("configs_detector_from_idx").on(t.detector, t.effectiveFrom)],
);

export const runs = mysqlTable(
  "runs",
  {
    id: id(),
    number: int("number").notNull().unique(),
    type: mysqlEnum("type", RUN_TYPES).notNull(),
    status: mysqlEnum("status", RUN_STATUSES).notNull().default("running"),
    startAt: utc("start_at").notNull(),
    endAt: utc("end_at"),
    liveSeconds: decimal("live_seconds", { precision: 14, scale: 3 }),
    deadSeconds: decimal("dead_seconds", { precision: 14, scale: 3 }),
    triggerCount: bigint("trigger_count", { mode: "number" }),
    configId: ref("config_id").notNull().references(() => detectorConfigs.id),
    targetMassOverrideKg: decimal("target_mass_override_kg", { precision: 12, scale: 4 }),
    conditions: jsonb("conditions").$type<Record<string, string | number>>().notNull(),
    openedByUserId: ref("opened_by_user_id").references(() => users.id),
    openedByTokenId: ref("opened_by_token_id").references(() => machineTokens.id),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    updatedAt: utc("updated_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [
    index("runs_start_idx").on(t.startAt),
    index("runs_type_start_idx").on(t.type, t.startAt),
    index("runs_status_idx").on(t.status),
  ],
);
