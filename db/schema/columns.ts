/** Column helpers shared by every table: UTC timestamps at millisecond precision and an auto-increment id. */
import { customType, datetime, int } from "drizzle-orm/mysql-core";

/** A UTC instant stored as DATETIME(3); the client module pins the session time zone to UTC. */
export const utc = (name: string) => datetime(name, { mode: "date", fsp: 3 });

/** The auto-increment primary key every table uses. */
export const id = () => int("id").autoincrement().primaryKey();

/** A foreign key to another table's id. */
export const ref = (name: string) => int(name);

/**
 * A JSON column. MariaDB stores JSON as LONGTEXT, so the driver hands back a string; parse it here once
 * instead of at every call site.
 */
export const jsonb = customType<{ data: unknown; driverData: string }>({
  dataType: () => "json",
  toDriver: (value) => JSON.stringify(value),
  fromDriver: (value) => (typeof value === "string" ? JSON.parse(value) : value),
});
