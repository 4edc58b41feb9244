/**
 * The counting result of each data-quality period: observed count n, expected background b with its note, and
 * the confidence level and method the period is quoted with. Recording is audited; n is refused while the
 * period is blind (unblinding is its own, later step). Period definitions stay in db/periods.ts.
 */
import { asc, eq } from "drizzle-orm";
import { db } from "./client";
import { audit } from "./audit";
import { dqPeriods, type LimitMethod } from "./schema";

/** A period's counting fields as stored (observedCount is the raw value: callers hide it while blind). */
export type PeriodCounting = {
  periodId: number;
  name: string;
  blind: boolean;
  observedCount: number | null;
  expectedBackground: number | null;
  backgroundNote: string | null;
  confidenceLevel: number;
  limitMethod: LimitMethod;
  unblindedAt: Date | null;
};

/** What a convener records; absent keys stay as they are, null clears a value. */
export type CountingPatch = {
  observed?: number | null;
  background?: number | null;
  backgroundNote?: string | null;
  cl?: number;
  method?: LimitMethod;
};

/** A recording that cannot be made: unknown period, n while blind, b without a note, or nothing to record. */
export class CountingRequestError extends Error {
  constructor(
    readonly code: "not_found" | "blind" | "note_missing" | "empty",
    readonly status: 400 | 404 | 409,
    readonly field: string,
    readonly reason: string,
  ) {
    super(`${field}: ${reason}`);
    this.name = "CountingRequestError";
  }
}

const columns = {
  periodId: dqPeriods.id,
  name: dqPeriods.name,
  blind: dqPeriods.blind,
  observedCount: dqPeriods.observedCount,
  expectedBackground: dqPeriods.expectedBackground,
  backgroundNote: dqPeriods.backgroundNote,
  confidenceLevel: dqPeriods.confidenceLevel,
  limitMethod: dqPeriods.limitMethod,
  unblindedAt: dqPeriods.unblindedAt,
};

/** Every period's counting fields, keyed by period id. */
export async function listCountings(): Promise<Map<number, PeriodCounting>> {
  const rows = await db.select(columns).from(dqPeriods).orderBy(asc(dqPeriods.startAt), asc(dqPeriods.id));
  return new Map(rows.map((r) => [r.periodId, r]));
}

/** One period's counting fields, or null when there is no such period. */
export async function getCounting(periodId: number): Promise<PeriodCounting | null> {
  const [row] = await db.select(columns).from(dqPeriods).where(eq(dqPeriods.id, periodId)).limit(1);
  return row ?? null;
}

const FIELD_OF = {
  observed: "observedCount",
  background: "expectedBackground",
  backgroundNote: "backgroundNote",
  cl: "confidenceLevel",
  method: "limitMethod",
} as const satisfies Record<keyof CountingPatch, keyof PeriodCounting>;

/**
 * Records a period's counting fields in one transaction with an audit row ("limits.record", before and
 * after of each changed field). Refuses n on a blind period (409) and a background without a note (400).
 */
export async function recordCounting(actorId: number, periodId: number, patch: CountingPatch): Promise<PeriodCounting> {
  const keys = (Object.keys(FIELD_OF) as (keyof CountingPatch)[]).filter((k) => patch[k] !== undefined);
  if (keys.length === 0) {
    throw new CountingRequestError("empty", 400, "body", "give at least one of observed, background, backgroundNote, cl, method");
  }
  await db.transaction(async (tx) => {
    const [current] = await tx.select(columns).from(dqPeriods).where(eq(dqPeriods.id, periodId)).for("update").limit(1);
    if (!current) throw new CountingRequestError("not_found", 404, "id", `no period with id ${periodId}`);
    if (current.blind && patch.observed !== undefined) {
      throw new CountingRequestError(
        "blind",
        409,
        "observed",
        `"${current.name}" is blind: its observed count can be recorded only after the unblinding is recorded`,
      );
    }
    const next = { ...current };
    const changes: Record<string, { from: unknown; to: unknown }> = {};
    for (const key of keys) {
      const column = FIELD_OF[key];
      const value = key === "backgroundNote" ? (patch.backgroundNote?.trim() || null) : patch[key];
      if (current[column] === value) continue;
      Object.assign(next, { [column]: value });
      changes[key] = { from: current[column], to: value };
    }
    if (next.expectedBackground !== null && !next.backgroundNote) {
      throw new CountingRequestError("note_missing", 400, "backgroundNote", "say where the background estimate comes from");
    }
    if (Object.keys(changes).length === 0) return;
    await tx
      .update(dqPeriods)
      .set({
        observedCount: next.observedCount,
        expectedBackground: next.expectedBackground,
        backgroundNote: next.backgroundNote,
        confidenceLevel: next.confidenceLevel,
        limitMethod: next.limitMethod,
        updatedAt: new Date(),
      })
      .where(eq(dqPeriods.id, periodId));
    await audit({ userId: actorId }, "limits.record", { type: "period", id: periodId }, changes, tx);
  });
  return (await getCounting(periodId))!;
}
