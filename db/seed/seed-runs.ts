/** Demo scenario part: runs (to be filled in by the runs feature). */
import type { Database } from "../client";

/** Seed the runs part of the demo scenario; adds only what is missing. */
export async function seedRuns(_db: Database, _people: Map<string, number>): Promise<string> {
  return "runs: nothing yet";
}
