/** Demo scenario part: logbook (to be filled in by the logbook feature). */
import type { Database } from "../client";

/** Seed the logbook part of the demo scenario; adds only what is missing. */
export async function seedLogbook(_db: Database, _people: Map<string, number>): Promise<string> {
  return "logbook: nothing yet";
}
