/**
 * Opening and closing runs, for the DAQ API and the shift crew's forms alike. A repeated request that matches
 * the record is answered as a retry (nothing changes, no audit row); one that differs is a RunConflictError.
 */
import { eq } from "drizzle-orm";
import { db } from "./client";
import { audit, type Actor } from "./audit";
import { runs } from "./schema";
import { findConfigInForce, firstConfigOf } from "./configs";
import { getRunView } from "./runs";
import type { RunView } from "./run-views";
import {
  checkClose,
  closeDifferences,
  openDifferences,
  RunConflictError,
  RunInputError,
  RunNotFoundError,
  type CloseRunInput,
  type OpenRunInput,
  type RunStatus as LibRunStatus,
  type RunType as LibRunType,
} from "../lib/runs";
import type { RunStatus, RunType } from "./schema";

// The rules' lists and the database enums must stay the same; these fail to compile if they drift apart.
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const _typesMatch: Same<LibRunType, RunType> = true;
const _statusesMatch: Same<LibRunStatus, RunStatus> = true;

/** Result of an open or close: the run as it now stands, and whether this request changed anything. */
export interface RunWriteResult {
  run: RunView;
  changed: boolean;
}

function isDuplicateKey(err: unknown): boolean {
  const e = err as { code?: string; cause?: { code?: string } } | null;
  return e?.code === "ER_DUP_ENTRY" || e?.cause?.code === "ER_DUP_ENTRY";
}

async function mustGet(number: number): Promise<RunView> {
  const view = await getRunView(number);
  if (!view) throw new RunNotFoundError(number);
  return view;
}

/** Compare an open request against an existing run of that number: a retry returns it, anything else conflicts. */
async function replayOpen(number: number, input: OpenRunInput): Promise<RunWriteResult> {
  const run = await mustGet(number);
  const diffs = openDifferences(
    { type: run.type, startMs: run.startMs, detector: run.detector, conditions: run.conditions, targetMassOverrideKg: run.targetMassOverrideKg },
    input,
  );
  if (diffs.length) throw new RunConflictError(`run number ${number} is already used by a run with different content`, diffs);
  return { run, changed: false };
}

async function noConfigError(input: OpenRunInput): Promise<RunInputError> {
  const first = await firstConfigOf(input.detector);
  const at = new Date(input.startMs).toISOString();
  return new RunInputError(
    "start",
    first
      ? `no ${input.detector} configuration is in force at ${at}; the first one takes effect at ${first.effectiveFrom.toISOString()}`
      : `no ${input.detector} configuration exists yet; a detector expert must add one first`,
  );
}

/** Open a run (audited); a retry of the same open returns the run unchanged. */
export async function openRun(actor: Actor, input: OpenRunInput): Promise<RunWriteResult> {
  const [existing] = await db.select({ id: runs.id }).from(runs).where(eq(runs.number, input.number)).limit(1);
  if (existing) return replayOpen(input.number, input);
  try {
    await db.transaction(async (tx) => {
      const config = await findConfigInForce(input.detector, input.startMs, tx);
      if (!config) throw await noConfigError(input);
      await tx.insert(runs).values({
        number: input.number,
        type: input.type,
        status: "running",
        startAt: new Date(input.startMs),
        configId: config.id,
        targetMassOverrideKg: input.targetMassOverrideKg,
        conditions: input.conditions,
        openedByUserId: actor.userId ?? null,
        openedByTokenId: actor.tokenId ?? null,
      });
      await audit(
        actor,
        "run.open",
        { type: "run", id: input.number },
        {
          type: input.type,
          start: new Date(input.startMs).toISOString(),
          detector: input.detector,
          configId: config.id,
          targetMassOverrideKg: input.targetMassOverrideKg,
          conditions: input.conditions,
        },
        tx,
      );
    });
  } catch (err) {
    // Two identical opens racing: the loser sees the unique number taken and answers as a retry.
    if (isDuplicateKey(err)) return replayOpen(input.number, input);
    throw err;
  }
  return { run: await mustGet(input.number), changed: true };
}

/** Close a running run (audited) after checking live and dead time; a retry of the same close changes nothing. */
export async function closeRun(actor: Actor, number: number, input: CloseRunInput): Promise<RunWriteResult> {
  const changed = await db.transaction(async (tx) => {
    const [row] = await tx.select().from(runs).where(eq(runs.number, number)).limit(1).for("update");
    if (!row) throw new RunNotFoundError(number);
    checkClose(row.startAt.getTime(), input);
    if (row.status !== "running") {
      const diffs = closeDifferences(
        {
          status: row.status,
          endMs: row.endAt ? row.endAt.getTime() : null,
          liveSeconds: row.liveSeconds === null ? null : Number(row.liveSeconds),
          deadSeconds: row.deadSeconds === null ? null : Number(row.deadSeconds),
          triggerCount: row.triggerCount,
        },
        input,
      );
      if (diffs.length) throw new RunConflictError(`run ${number} is already closed (${row.status}) with different values`, diffs);
      return false;
    }
    await tx
      .update(runs)
      .set({
        status: input.status,
        endAt: new Date(input.endMs),
        liveSeconds: input.liveSeconds.toFixed(3),
        deadSeconds: input.deadSeconds.toFixed(3),
        triggerCount: input.triggerCount,
        updatedAt: new Date(),
      })
      .where(eq(runs.id, row.id));
    const { endMs, ...values } = input;
    await audit(actor, "run.close", { type: "run", id: number }, { ...values, end: new Date(endMs).toISOString() }, tx);
    return true;
  });
  return { run: await mustGet(number), changed };
}
