/** People, their roles, invitations, sign-in throttling and the DAQ's machine tokens. */
import { boolean, index, mysqlEnum, mysqlTable, primaryKey, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { id, jsonb, ref, utc } from "./columns";

export const ROLES = ["shift_crew", "detector_expert", "analysis_convener", "safety_officer", "admin"] as const;
export type Role = (typeof ROLES)[number];

export const users = mysqlTable("users", {
  id: id(),
  email: varchar("email", { length: 320 }).notNull().unique(),
  displayName: varchar("display_name", { length: 120 }).notNull(),
  // Null until an invited person sets a password.
  passwordHash: varchar("password_hash", { length: 100 }),
  active: boolean("active").notNull().default(true),
  createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
});

export const userRoles = mysqlTable(
  "user_roles",
  {
    userId: ref("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    role: mysqlEnum("role", ROLES).notNull(),
    grantedAt: utc("granted_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [primaryKey({ columns: [t.userId, t.role] })],
);

export const invitations = mysqlTable(
  "invitations",
  {
    id: id(),
    userId: ref("user_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    // SHA-256 of the token sent by e-mail; the token itself is never stored.
    tokenHash: varchar("token_hash", { length: 64 }).notNull().unique(),
    invitedBy: ref("invited_by").references(() => users.id),
    expiresAt: utc("expires_at").notNull(),
    usedAt: utc("used_at"),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  },
  (t) => [index("invitations_user_idx").on(t.userId)],
);

/** One row per failed sign-in, keyed "account:<email>" and "address:<ip>"; rows older than the window are pruned. */
export const signInFailures = mysqlTable(
  "sign_in_failures",
  {
    id: id(),
    key: varchar("throttle_key", { length: 400 }).notNull(),
    at: utc("at").notNull(),
  },
  (t) => [index("sign_in_failures_key_at_idx").on(t.key, t.at)],
);

export const machineTokens = mysqlTable("machine_tokens", {
  id: id(),
  name: varchar("name", { length: 120 }).notNull(),
  tokenHash: varchar("token_hash", { length: 64 }).notNull().unique(),
  // What the token may do, e.g. ["runs:write"]; read by the permission table.
  scopes: jsonb("scopes").$type<string[]>().notNull(),
  createdBy: ref("created_by").references(() => users.id),
  createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
  lastUsedAt: utc("last_used_at"),
  revokedAt: utc("revoked_at"),
});
