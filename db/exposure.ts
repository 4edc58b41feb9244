/**
 * Loads what lib/exposure needs for a span of time, in two queries: the runs overlapping the span (joined to
 * their detector configuration for the target mass) and the flags overlapping it. Computation stays in lib/exposure.
 */
import { and, eq, gt, inArray, isNull, lt, or, sql } from "drizzle-orm";
import { db } from "./client";
import { badTimeFlags, detectorConfigs, runs, type RunType } from "./schema";
import { computePeriodsExposure, type ExposureFlag, type ExposureRun, type PeriodTotals } from "@/lib/exposure";
import {
  computePeriodSummary,
  listedApartReaches,
  shapePeriodReport,
  toDataQualityPeriod,
  type PeriodComputation,
  type PeriodSummary,
  type ShapeOptions,
} from "@/components/exposure/compute";
import type { ReportPeriod } from "@/components/exposure/report";
import type { PeriodRecord } from "./periods";

/** A span of time and, optionally, the run types and the detector to load. */
export type SpanQuery = { startMs: number; endMs: number; runTypes?: readonly RunType[]; detector?: string | null };

/** Raw rows of the run query (decimals arrive as strings from mysql2). */
export type RunRow = {
  id: number;
  number: number;
  type: RunType;
  startAt: Date;
  endAt: Date | null;
  liveSeconds: string | null;
  massKg: string;
  detector: string;
};

/** The run query: runs overlapping the span (open runs that started before its end included), one SELECT. */
export function selectRunRows(q: SpanQuery): Promise<RunRow[]> {
  const start = new Date(q.startMs);
  const end = new Date(q.endMs);
  const overlap = and(lt(runs.startAt, end), or(isNull(runs.endAt), gt(runs.endAt, start)));
  const where = and(
    overlap,
    q.runTypes ? inArray(runs.type, [...q.runTypes]) : undefined,
    q.detector ? eq(detectorConfigs.detector, q.detector) : undefined,
  );
  return db
    .select({
      id: runs.id,
      number: runs.number,
      type: runs.type,
      startAt: runs.startAt,
      endAt: runs.endAt,
      liveSeconds: runs.liveSeconds,
      // A run's target mass is the configuration's unless the run overrides it.
      massKg: sql<string>`COALESCE(${runs.targetMassOverrideKg}, ${detectorConfigs.fiducialMassKg})`,
      detector: detectorConfigs.detector,
    })
    .from(runs)
    .innerJoin(detectorConfigs, eq(detectorConfigs.id, runs.configId))
    .where(where);
}

/** Raw rows of the flag query. */
export type FlagRow = { id: number; startAt: Date; endAt: Date; verdict: "exclude" | "caution"; state: "proposed" | "confirmed" | "withdrawn"; subsystem: string };

/** The flag query: proposed and confirmed flags overlapping the span, one SELECT. */
export function selectFlagRows(q: SpanQuery): Promise<FlagRow[]> {
  return db
    .select({
      id: badTimeFlags.id,
      startAt: badTimeFlags.startAt,
      endAt: badTimeFlags.endAt,
      verdict: badTimeFlags.verdict,
      state: badTimeFlags.state,
      subsystem: badTimeFlags.subsystem,
    })
    .from(badTimeFlags)
    .where(
      and(
        inArray(badTimeFlags.state, ["proposed", "confirmed"]),
        lt(badTimeFlags.startAt, new Date(q.endMs)),
        gt(badTimeFlags.endAt, new Date(q.startMs)),
      ),
    );
}

/** Everything the exposure code needs for a span, converted to its shapes. */
export type ExposureInputs = {
  runs: ExposureRun[];
  /** Runs closed without a live time (handed over as open so they are listed apart, never counted as zero): number → real end ms. */
  withoutLiveTime: Map<number, number>;
  /** Detector of each run, for display: the same order as `runs` (a plain array, cheaper than a map for 100 000 runs). */
  detectors: string[];
  confirmed: ExposureFlag[];
  /** Proposed flags (both verdicts), for the "if confirmed" preview. */
  proposed: ExposureFlag[];
};

/** Converts run rows; an ended run without live time is passed on as open (endMs null). */
export function toExposureRuns(rows: readonly RunRow[]): Pick<ExposureInputs, "runs" | "withoutLiveTime" | "detectors"> {
  const list: ExposureRun[] = new Array(rows.length);
  const withoutLiveTime = new Map<number, number>();
  const detectors: string[] = new Array(rows.length);
  for (let i = 0; i < rows.length; i++) {
    const r = rows[i]!;
    const noLive = r.endAt !== null && r.liveSeconds === null;
    if (noLive) withoutLiveTime.set(r.number, r.endAt!.getTime());
    detectors[i] = r.detector;
    list[i] = {
      id: r.id,
      number: r.number,
      type: r.type,
      startMs: r.startAt.getTime(),
      endMs: r.endAt === null || noLive ? null : r.endAt.getTime(),
      liveSeconds: r.liveSeconds === null ? 0 : Number(r.liveSeconds),
      targetMassKg: Number(r.massKg),
    };
  }
  return { runs: list, withoutLiveTime, detectors };
}

/** Splits flag rows into confirmed and proposed exposure flags. */
export function toExposureFlags(rows: readonly FlagRow[]): Pick<ExposureInputs, "confirmed" | "proposed"> {
  const confirmed: ExposureFlag[] = [];
  const proposed: ExposureFlag[] = [];
  for (const f of rows) {
    const flag = { id: f.id, startMs: f.startAt.getTime(), endMs: f.endAt.getTime(), verdict: f.verdict, subsystem: f.subsystem };
    (f.state === "confirmed" ? confirmed : proposed).push(flag);
  }
  return { confirmed, proposed };
}

/** Runs and flags of a span, the two queries run side by side. */
export async function loadExposureInputs(q: SpanQuery): Promise<ExposureInputs> {
  if (q.runTypes && q.runTypes.length === 0) return { runs: [], withoutLiveTime: new Map(), detectors: [], confirmed: [], proposed: [] };
  const [runRows, flagRows] = await Promise.all([selectRunRows(q), selectFlagRows(q)]);
  return { ...toExposureRuns(runRows), ...toExposureFlags(flagRows) };
}

/** One run's span and state for the flag timeline on the quality page, or null if no such run. */
export async function runForTimeline(number: number) {
  const [row] = await db
    .select({ number: runs.number, type: runs.type, status: runs.status, startAt: runs.startAt, endAt: runs.endAt })
    .from(runs)
    .where(eq(runs.number, number))
    .limit(1);
  return row ?? null;
}

/** A stored period in the report's shape (ISO UTC strings). */
export function reportPeriodOf(p: PeriodRecord): ReportPeriod {
  return {
    id: p.id,
    name: p.name,
    startAt: p.startAt.toISOString(),
    endAt: p.endAt.toISOString(),
    runTypes: [...p.runTypes],
    detector: p.detector,
    signalAcceptance: p.signalAcceptance,
    blind: p.blind,
  };
}

/**
 * A period's exposure summary (totals, lib/exposure rows, preview): one run query and one flag query over its
 * span and run types, then lib/exposure. The period summary the API serves; the benchmark times this path.
 */
export async function loadPeriodSummary(p: PeriodRecord, opts: { preview?: boolean } = {}): Promise<PeriodSummary & { inputs: ExposureInputs }> {
  const inputs = await loadExposureInputs({ startMs: p.startAt.getTime(), endMs: p.endAt.getTime(), runTypes: p.runTypes, detector: p.detector });
  return { ...computePeriodSummary(reportPeriodOf(p), inputs, opts), inputs };
}

/** loadPeriodSummary shaped into the report of the period page and the exports. */
export async function loadPeriodReport(
  p: PeriodRecord,
  opts: { preview?: boolean } & ShapeOptions = {},
): Promise<PeriodComputation & { detectorOf: Map<number, string>; detectorsCounted: string[] }> {
  const computed = await loadPeriodSummary(p, opts);
  const shaped = shapePeriodReport(reportPeriodOf(p), computed, computed.inputs, opts);
  // Detectors only for the rows shaped (a page shows a screenful, not every run).
  const wanted = new Set(shaped.report.runs.map((r) => r.runNumber));
  const detectorOf = new Map<number, string>();
  const { runs, detectors } = computed.inputs;
  for (let i = 0; i < runs.length && detectorOf.size < wanted.size; i++) {
    if (wanted.has(runs[i]!.number)) detectorOf.set(runs[i]!.number, detectors[i]!);
  }
  // Which detectors the counted runs came from: more than one means target masses of different detectors add up.
  const counted = new Set(computed.summary.rows.map((r) => r.runNumber));
  const detectorsCounted = new Set<string>();
  for (let i = 0; i < runs.length; i++) if (counted.has(runs[i]!.number)) detectorsCounted.add(detectors[i]!);
  return { ...shaped, detectorOf, detectorsCounted: [...detectorsCounted].sort() };
}

/**
 * Totals of many periods for the period list: one load per detector the periods name (usually one), over the
 * union of their spans and run types.
 */
export async function loadPeriodsTotals(periods: readonly PeriodRecord[]): Promise<Map<number, PeriodTotals>> {
  const totals = new Map<number, PeriodTotals>();
  const byDetector = new Map<string | null, PeriodRecord[]>();
  for (const p of periods) {
    const group = byDetector.get(p.detector);
    if (group) group.push(p);
    else byDetector.set(p.detector, [p]);
  }
  for (const [detector, group] of byDetector) {
    for (const [id, t] of await totalsOfGroup(group, detector)) totals.set(id, t);
  }
  return totals;
}

/** Totals of periods that count the same detector (null: all), from one load. */
async function totalsOfGroup(periods: readonly PeriodRecord[], detector: string | null): Promise<Map<number, PeriodTotals>> {
  const totals = new Map<number, PeriodTotals>();
  const startMs = Math.min(...periods.map((p) => p.startAt.getTime()));
  const endMs = Math.max(...periods.map((p) => p.endAt.getTime()));
  const runTypes = [...new Set(periods.flatMap((p) => p.runTypes))];
  const inputs = await loadExposureInputs({ startMs, endMs, runTypes, detector });
  const dqs = periods.map((p) => toDataQualityPeriod(reportPeriodOf(p)));
  // Sums come from the ended runs in one sweep for all periods; runs listed apart are counted per period
  // with the same rule as the period page (see listedApartReaches).
  const ended = inputs.runs.filter((r) => r.endMs !== null);
  const apart = inputs.runs.filter((r) => r.endMs === null);
  const summaries = computePeriodsExposure(ended, inputs.confirmed, dqs);
  const nowMs = Date.now();
  periods.forEach((p, i) => {
    const dq = dqs[i]!;
    const types = new Set<string>(p.runTypes);
    const openRuns = apart.filter((r) => types.has(r.type) && listedApartReaches(r, dq, nowMs, inputs.withoutLiveTime.get(r.number))).length;
    totals.set(p.id, { ...summaries[i]!.totals, openRuns });
  });
  return totals;
}
