/** The audit trail: every change anywhere in Deepshift appends one row here. */
import { bigint, index, mysqlTable, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { jsonb, ref, utc } from "./columns";
import { machineTokens, users } from "./auth";

export const auditEvents = mysqlTable(
  "audit_events",
  {
    id: bigint("id", { mode: "number" }).autoincrement().primaryKey(),
    actorUserId: ref("actor_user_id").references(() => users.id),
    actorTokenId: ref("actor_token_id").references(() => machineTokens.id),
    action: varchar("action", { length: 80 }).notNull(),
    recordType: varchar("record_type", { length: 60 }).notNull(),
    recordId: varchar("record_id", { length: 60 }).notNull(),
    details: jsonb("details").$type<Record<string, unknown>>(),
    at: utc("at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("audit_record_idx").on(t.recordType, t.recordId), index("audit_at_idx").on(t.at)],
);
