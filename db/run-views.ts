/**
 * How a run row (joined with its configuration and who opened it) becomes the shape the API and pages show.
 * One mapping, so the DAQ's replies, the runs list and the run page never disagree about a run.
 */
import { eq } from "drizzle-orm";
import { db } from "./client";
import { detectorConfigs, machineTokens, runs, users } from "./schema";
import { canonicalDecimal, durationSeconds, liveFraction, type RunConditions, type RunStatus, type RunType } from "../lib/runs";
import type { RunQuality } from "../lib/exposure";

/** A run as every reply describes it. */
export interface RunView {
  id: number;
  number: number;
  type: RunType;
  status: RunStatus;
  detector: string;
  start: string;
  end: string | null;
  startMs: number;
  endMs: number | null;
  durationSeconds: number | null;
  liveSeconds: number | null;
  deadSeconds: number | null;
  triggerCount: number | null;
  /** live / duration; null while the run is open. */
  liveFraction: number | null;
  /** Target mass in force (canonical decimal string, kg): the override if given, else the configuration's. */
  targetMassKg: string;
  targetMassSource: "configuration" | "override";
  targetMassOverrideKg: string | null;
  config: { id: number; name: string; detector: string; targetMaterial: string; fiducialMassKg: string; effectiveFrom: string };
  conditions: RunConditions;
  openedBy: { kind: "user" | "token"; id: number; name: string } | null;
}

/** A row of the runs list: the run without its conditions, with its data-quality status. */
export type RunListRow = Omit<RunView, "conditions"> & { quality: RunQuality };

/** The columns every run read selects. */
export const runColumns = {
  run: runs,
  config: detectorConfigs,
  userName: users.displayName,
  tokenName: machineTokens.name,
};

/** A select of runs joined with configuration and opener; callers add where/order/limit. */
export function selectRuns() {
  return db
    .select(runColumns)
    .from(runs)
    .innerJoin(detectorConfigs, eq(detectorConfigs.id, runs.configId))
    .leftJoin(users, eq(users.id, runs.openedByUserId))
    .leftJoin(machineTokens, eq(machineTokens.id, runs.openedByTokenId));
}

export type JoinedRun = Awaited<ReturnType<typeof selectRuns>>[number];

const num = (d: string | null): number | null => (d === null ? null : Number(d));

function openerOf(row: JoinedRun): RunView["openedBy"] {
  if (row.run.openedByUserId !== null) return { kind: "user", id: row.run.openedByUserId, name: row.userName ?? "unknown person" };
  if (row.run.openedByTokenId !== null) return { kind: "token", id: row.run.openedByTokenId, name: row.tokenName ?? "unknown token" };
  return null;
}

/** The view of one joined run row. */
export function toRunView(row: JoinedRun): RunView {
  const { run, config } = row;
  const startMs = run.startAt.getTime();
  const endMs = run.endAt ? run.endAt.getTime() : null;
  const live = num(run.liveSeconds);
  const override = run.targetMassOverrideKg === null ? null : canonicalDecimal(run.targetMassOverrideKg);
  const configMass = canonicalDecimal(config.fiducialMassKg);
  return {
    id: run.id,
    number: run.number,
    type: run.type,
    status: run.status,
    detector: config.detector,
    start: run.startAt.toISOString(),
    end: run.endAt ? run.endAt.toISOString() : null,
    startMs,
    endMs,
    durationSeconds: endMs === null ? null : durationSeconds(startMs, endMs),
    liveSeconds: live,
    deadSeconds: num(run.deadSeconds),
    triggerCount: run.triggerCount,
    liveFraction: liveFraction(startMs, endMs, live),
    targetMassKg: override ?? configMass,
    targetMassSource: override === null ? "configuration" : "override",
    targetMassOverrideKg: override,
    config: {
      id: config.id,
      name: config.name,
      detector: config.detector,
      targetMaterial: config.targetMaterial,
      fiducialMassKg: configMass,
      effectiveFrom: config.effectiveFrom.toISOString(),
    },
    conditions: run.conditions,
    openedBy: openerOf(row),
  };
}
