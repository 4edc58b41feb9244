/** Seeds the invented demo scenario. Safe to run repeatedly: each part adds only what is missing. */
import { closeDb, db } from "../client";
import { seedPeople } from "./seed-people";

async function main(): Promise<void> {
  const people = await seedPeople(db);
  process.stdout.write(`demo people: ${people.size}\n`);
}

main()
  .then(closeDb)
  .catch(async (err: unknown) => {
    process.stderr.write(`seeding failed: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}\n`);
    await closeDb();
    process.exit(1);
  });
