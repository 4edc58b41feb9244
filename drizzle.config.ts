import { defineConfig } from "drizzle-kit";

// Used by `npm run db:generate` to write a migration from db/schema; applying is db/migrate.ts.
export default defineConfig({
  dialect: "mysql",
  schema: "./db/schema/index.ts",
  out: "./db/migrations",
  dbCredentials: { url: process.env.DATABASE_URL ?? "mysql://deepshift@127.0.0.1:3307/deepshift" },
});
