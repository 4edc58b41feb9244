/**
 * Calibration sources: the inventory, checkouts and returns with the calibration runs they served, and leak tests.
 * Every change writes an audit row in the same transaction. Computations (decay, deadlines) are in lib/safety.
 */
import { and, asc, desc, eq, gt, inArray, isNull, lt, or } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "./client";
import { audit, type Actor } from "./audit";
import { calibrationSources, checkoutRuns, runs, sourceCheckouts, users } from "./schema";

export type SourceRow = typeof calibrationSources.$inferSelect & { custodianName: string | null };
export type NewSource = Omit<typeof calibrationSources.$inferInsert, "id" | "createdAt">;
export type CheckoutRow = {
  id: number;
  sourceId: number;
  checkedOutAt: Date;
  checkedOutByName: string;
  purpose: string;
  returnedAt: Date | null;
  returnedByName: string | null;
  overdueNotifiedAt: Date | null;
  runNumbers: number[];
};

/** A refused source operation, naming the field and the reason (routes answer 400/404/409 with it). */
export class SourceError extends Error {
  readonly code: "NOT_FOUND" | "DUPLICATE_SERIAL" | "ALREADY_OUT" | "NOT_OUT" | "BAD_DATE" | "NOT_SEALED";
  readonly field: string;
  constructor(code: SourceError["code"], field: string, reason: string) {
    super(reason);
    this.name = "SourceError";
    this.code = code;
    this.field = field;
  }
}

const custodian = alias(users, "custodian");

/** Every source with its custodian's name, by nuclide then serial. */
export async function listSources(): Promise<SourceRow[]> {
  return db
    .select({ ...sourceColumns(), custodianName: custodian.displayName })
    .from(calibrationSources)
    .leftJoin(custodian, eq(custodian.id, calibrationSources.custodianId))
    .orderBy(asc(calibrationSources.nuclide), asc(calibrationSources.serial));
}

function sourceColumns() {
  const c = calibrationSources;
  return {
    id: c.id, nuclide: c.nuclide, serial: c.serial, form: c.form, referenceActivityBq: c.referenceActivityBq, referenceDate: c.referenceDate,
    location: c.location, custodianId: c.custodianId, allowedOutHours: c.allowedOutHours, leakTestIntervalMonths: c.leakTestIntervalMonths,
    lastLeakTestAt: c.lastLeakTestAt, decayWaitFraction: c.decayWaitFraction, notes: c.notes, createdAt: c.createdAt,
  };
}

/** One source, or null. */
export async function getSource(id: number): Promise<SourceRow | null> {
  const [row] = await db
    .select({ ...sourceColumns(), custodianName: custodian.displayName })
    .from(calibrationSources)
    .leftJoin(custodian, eq(custodian.id, calibrationSources.custodianId))
    .where(eq(calibrationSources.id, id))
    .limit(1);
  return row ?? null;
}

/** Add a source to the inventory; audited. A serial already in use is refused. */
export async function createSource(actor: Actor, input: NewSource): Promise<number> {
  return db.transaction(async (tx) => {
    const [dup] = await tx.select({ id: calibrationSources.id }).from(calibrationSources).where(eq(calibrationSources.serial, input.serial)).limit(1);
    if (dup) throw new SourceError("DUPLICATE_SERIAL", "serial", `a source with serial ${input.serial} is already in the inventory`);
    const [res] = await tx.insert(calibrationSources).values(input);
    await audit(actor, "source.create", { type: "calibration_source", id: res.insertId }, { nuclide: input.nuclide, serial: input.serial }, tx);
    return res.insertId;
  });
}

/** The inventory details a safety officer may change after a source is added. */
export type SourceChanges = Partial<Pick<NewSource, "location" | "custodianId" | "allowedOutHours" | "leakTestIntervalMonths" | "decayWaitFraction" | "notes">>;

/** Change a source's inventory details; audited with the old and new values. */
export async function updateSource(actor: Actor, sourceId: number, changes: SourceChanges): Promise<void> {
  await db.transaction(async (tx) => {
    const [src] = await tx.select().from(calibrationSources).where(eq(calibrationSources.id, sourceId)).for("update");
    if (!src) throw new SourceError("NOT_FOUND", "id", `no source ${sourceId}`);
    const keys = Object.keys(changes) as (keyof SourceChanges)[];
    if (keys.length === 0) return;
    await tx.update(calibrationSources).set(changes).where(eq(calibrationSources.id, sourceId));
    const before = Object.fromEntries(keys.map((k) => [k, src[k]]));
    await audit(actor, "source.update", { type: "calibration_source", id: sourceId }, { before, after: changes }, tx);
  });
}

/** Record a leak (wipe) test on a sealed source (the later of it and the last one on record counts); audited. */
export async function recordLeakTest(actor: Actor, sourceId: number, testedAt: Date, result: string): Promise<void> {
  await db.transaction(async (tx) => {
    const [src] = await tx.select().from(calibrationSources).where(eq(calibrationSources.id, sourceId)).for("update");
    if (!src) throw new SourceError("NOT_FOUND", "id", `no source ${sourceId}`);
    if (src.form !== "sealed") throw new SourceError("NOT_SEALED", "id", "only sealed sources are leak-tested");
    const latest = src.lastLeakTestAt && src.lastLeakTestAt > testedAt ? src.lastLeakTestAt : testedAt;
    await tx.update(calibrationSources).set({ lastLeakTestAt: latest }).where(eq(calibrationSources.id, sourceId));
    await audit(actor, "source.leak_test", { type: "calibration_source", id: sourceId }, { testedAt: testedAt.toISOString(), result }, tx);
  });
}

const outBy = alias(users, "out_by");
const backBy = alias(users, "back_by");

/** Checkouts, newest first, with names and linked run numbers; all of them or one source's. */
export async function listCheckouts(filter: { sourceId?: number; openOnly?: boolean } = {}): Promise<CheckoutRow[]> {
  const conds = [];
  if (filter.sourceId !== undefined) conds.push(eq(sourceCheckouts.sourceId, filter.sourceId));
  if (filter.openOnly) conds.push(isNull(sourceCheckouts.returnedAt));
  const rows = await db
    .select({
      id: sourceCheckouts.id, sourceId: sourceCheckouts.sourceId, checkedOutAt: sourceCheckouts.checkedOutAt, checkedOutByName: outBy.displayName,
      purpose: sourceCheckouts.purpose, returnedAt: sourceCheckouts.returnedAt, returnedByName: backBy.displayName,
      overdueNotifiedAt: sourceCheckouts.overdueNotifiedAt,
    })
    .from(sourceCheckouts)
    .innerJoin(outBy, eq(outBy.id, sourceCheckouts.checkedOutBy))
    .leftJoin(backBy, eq(backBy.id, sourceCheckouts.returnedBy))
    .where(conds.length ? and(...conds) : undefined)
    .orderBy(desc(sourceCheckouts.checkedOutAt), desc(sourceCheckouts.id));
  const ids = rows.map((r) => r.id);
  const links = ids.length ? await db.select().from(checkoutRuns).where(inArray(checkoutRuns.checkoutId, ids)).orderBy(asc(checkoutRuns.runNumber)) : [];
  return rows.map((r) => ({ ...r, runNumbers: links.filter((l) => l.checkoutId === r.id).map((l) => l.runNumber) }));
}

/** Check a source out (at `at`, which may be in the past when recorded afterwards); refused while it is out. */
export async function checkOut(actor: Actor & { userId: number }, sourceId: number, input: { at: Date; purpose: string; runNumbers: number[] }): Promise<number> {
  return db.transaction(async (tx) => {
    const [src] = await tx.select({ id: calibrationSources.id }).from(calibrationSources).where(eq(calibrationSources.id, sourceId)).for("update");
    if (!src) throw new SourceError("NOT_FOUND", "id", `no source ${sourceId}`);
    const [open] = await tx.select({ id: sourceCheckouts.id }).from(sourceCheckouts).where(and(eq(sourceCheckouts.sourceId, sourceId), isNull(sourceCheckouts.returnedAt))).limit(1);
    if (open) throw new SourceError("ALREADY_OUT", "sourceId", "this source is checked out; return it first");
    const [res] = await tx.insert(sourceCheckouts).values({ sourceId, checkedOutBy: actor.userId, checkedOutAt: input.at, purpose: input.purpose });
    const runNumbers = [...new Set(input.runNumbers)];
    if (runNumbers.length) await tx.insert(checkoutRuns).ignore().values(runNumbers.map((runNumber) => ({ checkoutId: res.insertId, runNumber })));
    await audit(actor, "source.checkout", { type: "source_checkout", id: res.insertId }, { sourceId, at: input.at.toISOString(), purpose: input.purpose, runNumbers }, tx);
    return res.insertId;
  });
}

/** Return a checked-out source; the return cannot be before the checkout. */
export async function returnSource(actor: Actor & { userId: number }, checkoutId: number, at: Date): Promise<void> {
  await db.transaction(async (tx) => {
    const [row] = await tx.select().from(sourceCheckouts).where(eq(sourceCheckouts.id, checkoutId)).for("update");
    if (!row) throw new SourceError("NOT_FOUND", "checkoutId", `no checkout ${checkoutId}`);
    if (row.returnedAt) throw new SourceError("NOT_OUT", "checkoutId", "this checkout was already returned");
    if (at < row.checkedOutAt) throw new SourceError("BAD_DATE", "returnedAt", "the return cannot be before the checkout");
    await tx.update(sourceCheckouts).set({ returnedAt: at, returnedBy: actor.userId }).where(eq(sourceCheckouts.id, checkoutId));
    await audit(actor, "source.return", { type: "source_checkout", id: checkoutId }, { sourceId: row.sourceId, at: at.toISOString() }, tx);
  });
}

/** Replace the run numbers a checkout served; audited. */
export async function setCheckoutRuns(actor: Actor, checkoutId: number, runNumbers: number[]): Promise<void> {
  await db.transaction(async (tx) => {
    const [row] = await tx.select({ id: sourceCheckouts.id }).from(sourceCheckouts).where(eq(sourceCheckouts.id, checkoutId)).limit(1);
    if (!row) throw new SourceError("NOT_FOUND", "checkoutId", `no checkout ${checkoutId}`);
    const unique = [...new Set(runNumbers)];
    await tx.delete(checkoutRuns).where(eq(checkoutRuns.checkoutId, checkoutId));
    if (unique.length) await tx.insert(checkoutRuns).values(unique.map((runNumber) => ({ checkoutId, runNumber })));
    await audit(actor, "source.checkout_runs", { type: "source_checkout", id: checkoutId }, { runNumbers: unique }, tx);
  });
}

/** Open checkouts whose overdue notice has not gone yet (the job decides which are past their allowance). */
export async function openUnnotifiedCheckouts() {
  return db
    .select({
      checkoutId: sourceCheckouts.id, sourceId: calibrationSources.id, serial: calibrationSources.serial, nuclide: calibrationSources.nuclide,
      location: calibrationSources.location, checkedOutAt: sourceCheckouts.checkedOutAt, allowedOutHours: calibrationSources.allowedOutHours,
      purpose: sourceCheckouts.purpose, byName: users.displayName,
    })
    .from(sourceCheckouts)
    .innerJoin(calibrationSources, eq(calibrationSources.id, sourceCheckouts.sourceId))
    .innerJoin(users, eq(users.id, sourceCheckouts.checkedOutBy))
    .where(and(isNull(sourceCheckouts.returnedAt), isNull(sourceCheckouts.overdueNotifiedAt)));
}

/** Note that the overdue notice for a checkout went out. */
export async function markOverdueNotified(checkoutId: number, at: Date): Promise<void> {
  await db.update(sourceCheckouts).set({ overdueNotifiedAt: at }).where(eq(sourceCheckouts.id, checkoutId));
}

/** Runs of the given types that overlap [fromMs, toMs] (a run without an end counts as still going). */
export async function runsOverlapping(from: Date, to: Date, types?: ("science" | "calibration")[]) {
  const conds = [lt(runs.startAt, to), or(isNull(runs.endAt), gt(runs.endAt, from))];
  if (types?.length) conds.push(inArray(runs.type, types));
  return db.select({ number: runs.number, type: runs.type, startAt: runs.startAt, endAt: runs.endAt }).from(runs).where(and(...conds)).orderBy(asc(runs.startAt));
}

/** Which of these run numbers exist. */
export async function existingRunNumbers(numbers: number[]): Promise<number[]> {
  if (numbers.length === 0) return [];
  const rows = await db.select({ number: runs.number }).from(runs).where(inArray(runs.number, numbers));
  return rows.map((r) => r.number);
}

/** Active people who may be named custodian, by name. */
export async function custodianChoices() {
  return db.select({ id: users.id, displayName: users.displayName }).from(users).where(eq(users.active, true)).orderBy(asc(users.displayName));
}
