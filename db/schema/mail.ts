/** The outbox: every e-mail is written here first and sent by the mailer, so a down mail server loses nothing. */
import { index, int, mysqlTable, text, varchar } from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { id, utc } from "./columns";

export const outbox = mysqlTable(
  "outbox",
  {
    id: id(),
    kind: varchar("kind", { length: 40 }).notNull(),
    toAddress: varchar("to_address", { length: 320 }).notNull(),
    subject: varchar("subject", { length: 300 }).notNull(),
    textBody: text("text_body").notNull(),
    // Lets a job enqueue "the same" message once (e.g. one overdue notice per checkout).
    dedupeKey: varchar("dedupe_key", { length: 200 }).unique(),
    attempts: int("attempts").notNull().default(0),
    lastError: varchar("last_error", { length: 500 }),
    createdAt: utc("created_at").notNull().default(sql`CURRENT_TIMESTAMP(3)`),
    sentAt: utc("sent_at"),
  },
  (t) => [index("outbox_sent_idx").on(t.sentAt)],
);
