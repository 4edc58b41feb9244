/** Applies the committed migrations in db/migrations to DATABASE_URL (run by the start and test scripts). */
import { fileURLToPath } from "node:url";
import { migrate } from "drizzle-orm/mysql2/migrator";
import { closeDb, db } from "./client";

const migrationsFolder = fileURLToPath(new URL("./migrations", import.meta.url));

async function main(): Promise<void> {
  await migrate(db, { migrationsFolder });
  process.stdout.write("migrations applied\n");
}

main()
  .then(closeDb)
  .catch(async (err: unknown) => {
    process.stderr.write(`migration failed: ${err instanceof Error ? err.message : String(err)}\n`);
    await closeDb();
    process.exit(1);
  });
