/**
 * Period exposure from loaded runs and flags: the summary with confirmed flags, the "if the proposed flags were
 * confirmed" preview, and the chart series. Pure; uses lib/exposure's fast path so runs are validated and
 * sorted once even when the preview needs a second sweep.
 */
import {
  buildFlagUnion,
  cumulativeExposureSeries,
  dailyLiveFraction,
  sortRunsByStart,
  summarizePeriodSorted,
  validatePeriod,
  validateRun,
  type CumulativeExposurePoint,
  type DailyLiveFraction,
  type DataQualityPeriod,
  type ExposureFlag,
  type ExposureRun,
  type Interval,
  type PeriodExposure,
} from "@/lib/exposure";
import { buildExposureReport, type ExposureReport, type ReportPeriod } from "./report";

/** Runs and flags as loaded for a span (see db/exposure.ts). */
export interface LoadedInputs {
  runs: readonly ExposureRun[];
  /** Runs closed without a live time (handed over as open, endMs null): run number → their real end in ms. */
  withoutLiveTime: ReadonlyMap<number, number>;
  confirmed: readonly ExposureFlag[];
  proposed: readonly ExposureFlag[];
}

/** Chart series of a period, as plain arrays (x in UTC seconds, as uPlot wants). */
export interface ExposureSeries {
  cumulative: { t: number[]; kgDay: number[] };
  daily: { t: number[]; liveFraction: number[] };
}

/** A period's report and, when asked, its chart series. */
export interface PeriodComputation {
  report: ExposureReport;
  summary: PeriodExposure;
  series: ExposureSeries | null;
}

/** Period span and run types in lib/exposure's shape. */
export function toDataQualityPeriod(p: ReportPeriod): DataQualityPeriod {
  return { name: p.name, startMs: Date.parse(p.startAt), endMs: Date.parse(p.endAt), runTypes: p.runTypes };
}

/**
 * Whether a run that is listed apart (open, or closed without a live time) touches the period. lib/exposure lists
 * every open run starting before a period's end, as if it ran for ever; here an open run covers its start up to
 * now, and a run without live time covers its real span, so a run open today is not listed under a period that
 * lies wholly in the past of its start or the future of now.
 */
export function listedApartReaches(run: ExposureRun, period: DataQualityPeriod, nowMs: number, realEndMs?: number): boolean {
  if (run.startMs >= period.endMs) return false;
  const coveredUntil = realEndMs ?? Math.max(nowMs, run.startMs + 1);
  return coveredUntil > period.startMs;
}

/** The runs to hand lib/exposure for one period: every ended run, and the listed-apart ones that touch it. */
export function runsForPeriod(inputs: LoadedInputs, period: DataQualityPeriod, nowMs: number): ExposureRun[] {
  return inputs.runs.filter((r) => r.endMs !== null || listedApartReaches(r, period, nowMs, inputs.withoutLiveTime.get(r.number)));
}

/** Keeps at most `max` points of a step curve: the last point of each bucket, so the curve's end stays exact. */
export function thinPoints<T>(points: readonly T[], max: number): T[] {
  if (points.length <= max || max < 2) return [...points];
  const step = points.length / max;
  const kept: T[] = [];
  for (let k = 1; k <= max; k++) kept.push(points[Math.min(points.length, Math.round(k * step)) - 1]!);
  return kept;
}

/** Turns lib/exposure's series into chart arrays; the cumulative curve is thinned to `maxPoints`. */
export function seriesOf(summary: PeriodExposure, maxPoints = 2000): ExposureSeries {
  const cumulative = thinPoints<CumulativeExposurePoint>(cumulativeExposureSeries(summary), maxPoints);
  const daily: DailyLiveFraction[] = dailyLiveFraction(summary);
  return {
    cumulative: { t: cumulative.map((p) => p.timeMs / 1000), kgDay: cumulative.map((p) => p.cumulativeKgDay) },
    daily: { t: daily.map((d) => d.dayStartMs / 1000), liveFraction: daily.map((d) => d.liveFraction) },
  };
}

/** Totals the period would have if the proposed excluding flags were confirmed. */
export interface ProposedPreviewTotals {
  proposedExcludingFlags: number;
  exposureKgDay: number;
  goodLiveSeconds: number;
}

/** True when the half-open span [startMs, endMs) meets any interval of a merged, sorted list. */
function meets(merged: readonly Interval[], startMs: number, endMs: number): boolean {
  let lo = 0;
  let hi = merged.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (merged[mid]!.endMs <= startMs) lo = mid + 1;
    else hi = mid;
  }
  return lo < merged.length && merged[lo]!.startMs < endMs;
}

/**
 * The preview without a second sweep over every run: only runs touched by a proposed excluding flag can change,
 * so lib/exposure recomputes just those (with confirmed + proposed flags) and their new exposure replaces their
 * current one in the totals.
 */
export function previewTotals(
  sortedRuns: readonly ExposureRun[],
  inputs: Pick<LoadedInputs, "confirmed" | "proposed">,
  period: DataQualityPeriod,
  current: PeriodExposure,
): ProposedPreviewTotals {
  const extra = inputs.proposed.filter((f) => f.verdict === "exclude");
  const base = { proposedExcludingFlags: extra.length, exposureKgDay: current.totals.exposureKgDay, goodLiveSeconds: current.totals.goodLiveSeconds };
  if (extra.length === 0) return base;
  const extraUnion = buildFlagUnion(extra).exclude;
  const touched = sortedRuns.filter((r) => r.endMs !== null && meets(extraUnion, r.startMs, r.endMs));
  if (touched.length === 0) return base;
  const after = summarizePeriodSorted(touched, buildFlagUnion([...inputs.confirmed, ...extra]), period);
  const numbers = new Set(touched.map((r) => r.number));
  let exposureKgDay = current.totals.exposureKgDay;
  let goodLiveSeconds = current.totals.goodLiveSeconds;
  for (const row of current.rows) {
    if (!numbers.has(row.runNumber)) continue;
    exposureKgDay -= row.exposureKgDay;
    goodLiveSeconds -= row.goodLiveSeconds;
  }
  return { ...base, exposureKgDay: exposureKgDay + after.totals.exposureKgDay, goodLiveSeconds: goodLiveSeconds + after.totals.goodLiveSeconds };
}

/** The numbers of one period before they are shaped into a report. */
export interface PeriodSummary {
  summary: PeriodExposure;
  preview: ProposedPreviewTotals | null;
  /** The runs handed to lib/exposure (ended ones, and the listed-apart ones touching the period). */
  runs: ExposureRun[];
  now: Date;
}

/**
 * Computes one period: exposure with confirmed flags, and (when `preview`) the totals with the proposed
 * excluding flags added. Throws ExposureInputError naming the run or flag when the ledger is inconsistent.
 */
export function computePeriodSummary(period: ReportPeriod, inputs: LoadedInputs, opts: { preview?: boolean; now?: Date } = {}): PeriodSummary {
  const dq = toDataQualityPeriod(period);
  validatePeriod(dq);
  const now = opts.now ?? new Date();
  const runs = runsForPeriod(inputs, dq, now.getTime());
  for (const run of runs) validateRun(run);
  const sorted = sortRunsByStart(runs);
  const summary = summarizePeriodSorted(sorted, buildFlagUnion(inputs.confirmed), dq);
  return { summary, preview: opts.preview ? previewTotals(sorted, inputs, dq, summary) : null, runs, now };
}

/** How much of a report to shape: chart series or not, and at most how many per-run rows. */
export type ShapeOptions = { series?: boolean; maxRows?: number };

/** Shapes a computed period into the report the page and the exports show, with chart series when asked. */
export function shapePeriodReport(
  period: ReportPeriod,
  computed: PeriodSummary,
  inputs: Pick<LoadedInputs, "withoutLiveTime">,
  opts: ShapeOptions = {},
): PeriodComputation {
  const runsByNumber = new Map<number, ExposureRun>();
  for (const run of computed.runs) runsByNumber.set(run.number, run);
  const { summary, preview, now } = computed;
  const report = buildExposureReport(period, summary, { runsByNumber, withoutLiveTime: inputs.withoutLiveTime, preview, now, maxRows: opts.maxRows });
  return { report, summary, series: opts.series ? seriesOf(summary) : null };
}

/** computePeriodSummary then shapePeriodReport: what the API and the pages run. */
export function computePeriodReport(
  period: ReportPeriod,
  inputs: LoadedInputs,
  opts: { preview?: boolean; now?: Date } & ShapeOptions = {},
): PeriodComputation {
  return shapePeriodReport(period, computePeriodSummary(period, inputs, opts), inputs, opts);
}
