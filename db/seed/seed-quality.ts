/** Demo scenario part: quality (to be filled in by the quality feature). */
import type { Database } from "../client";

/** Seed the quality part of the demo scenario; adds only what is missing. */
export async function seedQuality(_db: Database, _people: Map<string, number>): Promise<string> {
  return "quality: nothing yet";
}
