/**
 * Detector configurations: target material and fiducial mass from an effective time on. Experts add them;
 * each run keeps a reference to the one in force at its start.
 */
import { and, asc, desc, eq, gt, gte, inArray, lt, lte } from "drizzle-orm";
import { db, type Database } from "./client";
import { audit, type Actor } from "./audit";
import { detectorConfigs, runs } from "./schema";
import { canonicalDecimal, RunConflictError, type ConfigInput } from "../lib/runs";

type Tx = Pick<Database, "select" | "insert" | "update">;

/** A configuration as the API and pages show it (mass as a canonical decimal string, times as ISO text). */
export interface ConfigView {
  id: number;
  detector: string;
  name: string;
  targetMaterial: string;
  fiducialMassKg: string;
  effectiveFrom: string;
  notes: string | null;
}

/** The API/page view of a configuration row. */
export function toConfigView(row: typeof detectorConfigs.$inferSelect): ConfigView {
  return {
    id: row.id,
    detector: row.detector,
    name: row.name,
    targetMaterial: row.targetMaterial,
    fiducialMassKg: canonicalDecimal(row.fiducialMassKg),
    effectiveFrom: row.effectiveFrom.toISOString(),
    notes: row.notes,
  };
}

/** Every configuration, by detector then effective time. */
export async function listConfigs(): Promise<ConfigView[]> {
  const rows = await db.select().from(detectorConfigs).orderBy(asc(detectorConfigs.detector), asc(detectorConfigs.effectiveFrom), asc(detectorConfigs.id));
  return rows.map(toConfigView);
}

/** The configuration in force for a detector at an instant (latest effective at or before it), or null. */
export async function findConfigInForce(detector: string, atMs: number, tx: Tx = db) {
  const [row] = await tx
    .select()
    .from(detectorConfigs)
    .where(and(eq(detectorConfigs.detector, detector), lte(detectorConfigs.effectiveFrom, new Date(atMs))))
    .orderBy(desc(detectorConfigs.effectiveFrom), desc(detectorConfigs.id))
    .limit(1);
  return row ?? null;
}

/** The earliest configuration of a detector, for the "nothing in force yet" message. */
export async function firstConfigOf(detector: string, tx: Tx = db) {
  const [row] = await tx.select().from(detectorConfigs).where(eq(detectorConfigs.detector, detector)).orderBy(asc(detectorConfigs.effectiveFrom)).limit(1);
  return row ?? null;
}

/**
 * Add a configuration; audited. Runs of that detector that started on or after its effective time (and before the
 * next configuration) are moved onto it, so "the configuration in force at a run's start" holds even when an expert
 * enters a change late. Two configurations of one detector from the same instant are refused as a conflict.
 */
export async function createConfig(actor: Actor, input: ConfigInput): Promise<{ id: number; reassignedRuns: number }> {
  const from = new Date(input.effectiveFromMs);
  return db.transaction(async (tx) => {
    const same = await tx
      .select({ id: detectorConfigs.id, name: detectorConfigs.name })
      .from(detectorConfigs)
      .where(and(eq(detectorConfigs.detector, input.detector), eq(detectorConfigs.effectiveFrom, from)))
      .limit(1);
    if (same[0]) {
      throw new RunConflictError(`the ${input.detector} configuration "${same[0].name}" already takes effect at ${from.toISOString()}`, ["effectiveFrom"]);
    }
    const [res] = await tx.insert(detectorConfigs).values({
      detector: input.detector,
      name: input.name,
      targetMaterial: input.targetMaterial,
      fiducialMassKg: input.fiducialMassKg,
      effectiveFrom: from,
      notes: input.notes,
      createdBy: actor.userId ?? null,
    });
    const id = res.insertId;
    const [next] = await tx
      .select({ from: detectorConfigs.effectiveFrom })
      .from(detectorConfigs)
      .where(and(eq(detectorConfigs.detector, input.detector), gt(detectorConfigs.effectiveFrom, from)))
      .orderBy(asc(detectorConfigs.effectiveFrom))
      .limit(1);
    const sameDetector = tx.select({ id: detectorConfigs.id }).from(detectorConfigs).where(eq(detectorConfigs.detector, input.detector));
    const moved = await tx
      .update(runs)
      .set({ configId: id, updatedAt: new Date() })
      .where(and(inArray(runs.configId, sameDetector), gte(runs.startAt, from), next ? lt(runs.startAt, next.from) : undefined));
    const reassignedRuns = moved[0].affectedRows;
    const { effectiveFromMs: _ms, ...rest } = input;
    await audit(actor, "config.create", { type: "detector_config", id }, { ...rest, effectiveFrom: from.toISOString(), reassignedRuns }, tx);
    return { id, reassignedRuns };
  });
}
