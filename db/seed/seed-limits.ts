/** Demo scenario part: limits (to be filled in by the limits feature). */
import type { Database } from "../client";

/** Seed the limits part of the demo scenario; adds only what is missing. */
export async function seedLimits(_db: Database, _people: Map<string, number>): Promise<string> {
  return "limits: nothing yet";
}
