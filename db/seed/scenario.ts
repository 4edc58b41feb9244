/**
 * The invented demo scenario's calendar: four weeks of Quillon data taking ending "now" at first seeding.
 * Later seed parts read the start back from the database (the first configuration), so re-seeding days later
 * still lines everything up with the runs that exist.
 */
import { asc, eq } from "drizzle-orm";
import type { Database } from "../client";
import { detectorConfigs } from "../schema";

export const DAY_MS = 86_400_000;
export const SCENARIO_DAYS = 28;
/** Day (from the start) on which the grid repair reduced the fiducial mass to 948.5 kg. */
export const REPAIR_DAY = 15;
/** Day on which the full 950 kg fiducial volume was restored. */
export const RESTORE_DAY = 23;

/** Midnight UTC, SCENARIO_DAYS before the given instant. */
export function scenarioStartFor(nowMs: number): number {
  const d = new Date(nowMs);
  d.setUTCHours(0, 0, 0, 0);
  return d.getTime() - SCENARIO_DAYS * DAY_MS;
}

/** The scenario start as stored (effective date of Quillon's first configuration), or null before seeding runs. */
export async function storedScenarioStart(db: Database): Promise<number | null> {
  const [first] = await db
    .select({ from: detectorConfigs.effectiveFrom })
    .from(detectorConfigs)
    .where(eq(detectorConfigs.detector, "Quillon"))
    .orderBy(asc(detectorConfigs.effectiveFrom))
    .limit(1);
  return first ? first.from.getTime() : null;
}
