/** Demo scenario part: safety (to be filled in by the safety feature). */
import type { Database } from "../client";

/** Seed the safety part of the demo scenario; adds only what is missing. */
export async function seedSafety(_db: Database, _people: Map<string, number>): Promise<string> {
  return "safety: nothing yet";
}
