/**
 * Demo scenario part: limits. "Science run A" gets its observed count and background; the blind
 * "Science run B (post-repair)" gets only its background (its count stays unrecorded until an unblinding).
 * Values are set only where still empty, so a second run changes nothing; without the periods it does nothing.
 */
import { and, eq, isNull } from "drizzle-orm";
import type { Database } from "../client";
import { audit } from "../audit";
import { dqPeriods } from "../schema";

const PRIYA = "priya.castel@kestrin-deep.example";

type DemoCounting = { period: string; observed: number | null; background: number; note: string };

const DEMO_COUNTINGS: DemoCounting[] = [
  {
    period: "Science run A",
    observed: 2,
    background: 1.3,
    note: "radiogenic neutrons + ER leakage, from the Science run A background model v3 (invented)",
  },
  {
    period: "Science run B (post-repair)",
    observed: null,
    background: 1.1,
    note: "radiogenic neutrons + ER leakage scaled to the post-repair fiducial volume, background model v3 (invented)",
  },
];

/** Seed the limits part of the demo scenario; adds only what is missing. */
export async function seedLimits(db: Database, people: Map<string, number>): Promise<string> {
  const convener = people.get(PRIYA) ?? null;
  let recorded = 0;
  for (const c of DEMO_COUNTINGS) {
    const done = await db.transaction(async (tx) => {
      const [period] = await tx.select({ id: dqPeriods.id }).from(dqPeriods).where(eq(dqPeriods.name, c.period)).limit(1);
      if (!period) return false;
      // Only where nothing was recorded yet: no count, and (for the background-only period) no background.
      const empty = c.observed === null
        ? and(isNull(dqPeriods.observedCount), isNull(dqPeriods.expectedBackground))
        : isNull(dqPeriods.observedCount);
      const [res] = await tx
        .update(dqPeriods)
        .set({
          ...(c.observed === null ? {} : { observedCount: c.observed }),
          expectedBackground: c.background,
          backgroundNote: c.note,
          updatedAt: new Date(),
        })
        .where(and(eq(dqPeriods.id, period.id), empty));
      if (res.affectedRows === 0) return false;
      await audit(
        { userId: convener },
        "limits.record",
        { type: "period", id: period.id },
        { seeded: true, ...(c.observed === null ? {} : { observed: c.observed }), background: c.background },
        tx,
      );
      return true;
    });
    if (done) recorded++;
  }
  return `limits: ${recorded} period countings recorded`;
}
