/** Seeds the invented demo scenario. Safe to run repeatedly: each part adds only what is missing. */
import { closeDb, db } from "../client";
import { seedPeople } from "./seed-people";
import { seedRuns } from "./seed-runs";
import { seedLogbook } from "./seed-logbook";
import { seedQuality } from "./seed-quality";
import { seedLimits } from "./seed-limits";
import { seedSafety } from "./seed-safety";

async function main(): Promise<void> {
  const people = await seedPeople(db);
  process.stdout.write(`demo people: ${people.size}\n`);
  // Order matters: entries link runs, flags and periods lie over runs, safety reviews follow entries.
  for (const part of [seedRuns, seedLogbook, seedQuality, seedLimits, seedSafety]) {
    process.stdout.write(`${await part(db, people)}\n`);
  }
}

main()
  .then(closeDb)
  .catch(async (err: unknown) => {
    process.stderr.write(`seeding failed: ${err instanceof Error ? (err.stack ?? err.message) : String(err)}\n`);
    await closeDb();
    process.exit(1);
  });
