/**
 * Data-quality periods: the named spans analyses count exposure over. Only the definition fields live here
 * (name, span, run types, detector, acceptance, notes, blind); the counting result and limit settings belong to the limits pages.
 */
import { asc, eq } from "drizzle-orm";
import { db } from "./client";
import { audit } from "./audit";
import { dqPeriods, type RunType } from "./schema";
import type { PeriodCreate, PeriodPatch } from "@/components/quality/inputs";

/** A period change that cannot be made (unknown id, duplicate name, span turned inside out, unblinding here). */
export class PeriodRequestError extends Error {
  constructor(
    readonly code: "not_found" | "name_taken" | "span_invalid" | "unblind_elsewhere",
    readonly status: 400 | 404 | 409,
    readonly field: string,
    reason: string,
  ) {
    super(reason);
    this.name = "PeriodRequestError";
  }
}

/** The definition of a period as pages and the API show it. */
export type PeriodRecord = {
  id: number;
  name: string;
  startAt: Date;
  endAt: Date;
  runTypes: RunType[];
  /** The detector whose runs count; null counts every detector. */
  detector: string | null;
  signalAcceptance: number;
  notes: string | null;
  blind: boolean;
  createdBy: number | null;
  createdAt: Date;
  updatedAt: Date;
};

const columns = {
  id: dqPeriods.id,
  name: dqPeriods.name,
  startAt: dqPeriods.startAt,
  endAt: dqPeriods.endAt,
  runTypes: dqPeriods.runTypes,
  detector: dqPeriods.detector,
  signalAcceptance: dqPeriods.signalAcceptance,
  notes: dqPeriods.notes,
  blind: dqPeriods.blind,
  createdBy: dqPeriods.createdBy,
  createdAt: dqPeriods.createdAt,
  updatedAt: dqPeriods.updatedAt,
};

/** Every period, by start. */
export async function listPeriods(): Promise<PeriodRecord[]> {
  return db.select(columns).from(dqPeriods).orderBy(asc(dqPeriods.startAt), asc(dqPeriods.id));
}

/** One period, or null. */
export async function getPeriod(id: number): Promise<PeriodRecord | null> {
  const [row] = await db.select(columns).from(dqPeriods).where(eq(dqPeriods.id, id)).limit(1);
  return row ?? null;
}

function isDuplicateName(err: unknown): boolean {
  const e = err as { code?: string; cause?: { code?: string } } | null;
  return e?.code === "ER_DUP_ENTRY" || e?.cause?.code === "ER_DUP_ENTRY";
}

function nameTaken(name: string): PeriodRequestError {
  return new PeriodRequestError("name_taken", 409, "name", `a period called "${name}" already exists; choose another name`);
}

/** Create a period; audited. */
export async function createPeriod(actorId: number, input: PeriodCreate): Promise<PeriodRecord> {
  try {
    const id = await db.transaction(async (tx) => {
      const [res] = await tx.insert(dqPeriods).values({
        name: input.name,
        startAt: input.startAt,
        endAt: input.endAt,
        runTypes: input.runTypes,
        detector: input.detector ?? null,
        signalAcceptance: input.signalAcceptance,
        notes: input.notes ?? null,
        blind: input.blind,
        createdBy: actorId,
      });
      await audit(
        { userId: actorId },
        "period.create",
        { type: "period", id: res.insertId },
        { ...input, startAt: input.startAt.toISOString(), endAt: input.endAt.toISOString() },
        tx,
      );
      return res.insertId;
    });
    return (await getPeriod(id))!;
  } catch (err) {
    if (isDuplicateName(err)) throw nameTaken(input.name);
    throw err;
  }
}

/**
 * Change a period's definition; audited with the before and after of each changed field.
 * A blind period is not unblinded here: that is recorded, with who and when, on the limits pages.
 */
export async function updatePeriod(actorId: number, id: number, patch: PeriodPatch): Promise<PeriodRecord> {
  try {
    await db.transaction(async (tx) => {
      const [current] = await tx.select(columns).from(dqPeriods).where(eq(dqPeriods.id, id)).for("update").limit(1);
      if (!current) throw new PeriodRequestError("not_found", 404, "id", `no period with id ${id}`);
      const startAt = patch.startAt ?? current.startAt;
      const endAt = patch.endAt ?? current.endAt;
      if (endAt.getTime() <= startAt.getTime()) {
        throw new PeriodRequestError("span_invalid", 400, patch.endAt ? "endAt" : "startAt", "the period must end after it starts");
      }
      if (current.blind && patch.blind === false) {
        throw new PeriodRequestError("unblind_elsewhere", 409, "blind", "a blind period is unblinded by recording the unblinding on its limits page, not by editing it");
      }
      const changes: Record<string, { from: unknown; to: unknown }> = {};
      const set: Partial<typeof dqPeriods.$inferInsert> = { updatedAt: new Date() };
      for (const key of ["name", "startAt", "endAt", "runTypes", "detector", "signalAcceptance", "notes", "blind"] as const) {
        const next = patch[key];
        if (next === undefined) continue;
        const before = current[key];
        const same = JSON.stringify(before) === JSON.stringify(next);
        if (same) continue;
        changes[key] = { from: before, to: next };
        Object.assign(set, { [key]: next });
      }
      if (Object.keys(changes).length === 0) return;
      await tx.update(dqPeriods).set(set).where(eq(dqPeriods.id, id));
      await audit({ userId: actorId }, "period.update", { type: "period", id }, changes, tx);
    });
  } catch (err) {
    if (isDuplicateName(err)) throw nameTaken(patch.name ?? "");
    throw err;
  }
  return (await getPeriod(id))!;
}
