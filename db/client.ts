/**
 * The one database client: a mysql2 pool wrapped by drizzle. Every query in the app goes through `db`.
 * Sessions are pinned to UTC so that DATETIME(3) columns and CURRENT_TIMESTAMP(3) mean UTC everywhere.
 */
import mysql from "mysql2/promise";
import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import * as schema from "./schema";

export type Database = MySql2Database<typeof schema>;

type Held = { pool: mysql.Pool; db: Database };
// Next's dev server reloads modules; keep one pool per process.
const holder = globalThis as typeof globalThis & { __deepshiftDb?: Held };

function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set (docker-free-scripts/start sets it)");
  return url;
}

function open(): Held {
  const pool = mysql.createPool({
    uri: databaseUrl(),
    connectionLimit: Number(process.env.DATABASE_POOL_SIZE ?? 10),
    timezone: "Z",
    decimalNumbers: false,
    supportBigNumbers: true,
  });
  pool.on("connection", (conn) => {
    conn.query("SET time_zone = '+00:00'");
  });
  return { pool, db: drizzle(pool, { schema, mode: "default" }) };
}

function held(): Held {
  holder.__deepshiftDb ??= open();
  return holder.__deepshiftDb;
}

/** The drizzle database; the pool opens on first use. */
export const db: Database = new Proxy({} as Database, {
  get: (_target, prop) => Reflect.get(held().db, prop),
});

/** The underlying mysql2 pool, for raw reads and health checks. */
export function pool(): mysql.Pool {
  return held().pool;
}

/** Close the pool (scripts and tests call this before exiting). */
export async function closeDb(): Promise<void> {
  const h = holder.__deepshiftDb;
  holder.__deepshiftDb = undefined;
  if (h) await h.pool.end();
}
