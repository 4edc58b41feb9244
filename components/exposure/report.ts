/**
 * The exposure report of one period, shaped once for the page, the JSON export and the CSV export, so all three
 * show the same numbers. Pure: it takes what lib/exposure computed plus the runs it was computed from.
 */
import type { ExposureRun, Interval, PeriodExposure, PeriodTotals } from "@/lib/exposure";

/** The formula, stated next to every exposure figure. */
export const EXPOSURE_FORMULA = "Σ good live s / 86 400 × target mass";

/** Period fields the report repeats (ISO UTC strings so the JSON is self-describing). */
export interface ReportPeriod {
  id: number;
  name: string;
  startAt: string;
  endAt: string;
  runTypes: string[];
  /** The detector whose runs count; null (or absent) counts every detector. */
  detector?: string | null;
  signalAcceptance: number;
  blind: boolean;
}

/** A span as ISO UTC strings. */
export interface IsoInterval {
  start: string;
  end: string;
}

/** One counted run with every step of its arithmetic. */
export interface ExposureReportRow {
  runNumber: number;
  runType: string;
  runStart: string;
  runEnd: string;
  /** Whole run, end − start, in seconds. */
  runDurationSeconds: number;
  /** DAQ live time of the whole run. */
  daqLiveSeconds: number;
  windowStart: string;
  windowEnd: string;
  /** Part of the run inside the period, in seconds. */
  windowSeconds: number;
  /** Window minus excluding flags, in seconds of wall-clock time. */
  goodSeconds: number;
  liveSecondsInPeriod: number;
  /** daqLive × goodSeconds / runDuration. */
  goodLiveSeconds: number;
  lostLiveSeconds: number;
  targetMassKg: number;
  /** goodLive / 86 400 × targetMass. */
  exposureKgDay: number;
  goodIntervals: IsoInterval[];
  cautionIntervals: IsoInterval[];
}

/** A run of a counted type still open (or closed without live time): listed apart, never counted. */
export interface OpenRunEntry {
  runNumber: number;
  runType: string;
  runStart: string;
  /** "running" while the DAQ has not closed it; "no live time" when it was closed without a live time. */
  state: "running" | "no live time";
}

/** What the proposed (unconfirmed) excluding flags would change if they were confirmed. */
export interface ProposedPreview {
  proposedExcludingFlags: number;
  exposureKgDay: number;
  /** Preview minus current, kg·day (zero or negative). */
  changeKgDay: number;
  goodLiveSeconds: number;
}

/** The whole report. */
export interface ExposureReport {
  period: ReportPeriod;
  formula: string;
  totals: PeriodTotals;
  runs: ExposureReportRow[];
  /** Counted runs left out of `runs` when the report was cut short for a page (0 in exports). */
  runsOmitted: number;
  openRuns: OpenRunEntry[];
  preview: ProposedPreview | null;
  computedAt: string;
}

const MS_PER_DAY = 86_400_000;
// "YYYY-MM-DDT" of recent UTC days: a report over 100 000 runs writes some 500 000 times, mostly on few days,
// and building each through a Date object costs more than the whole exposure sweep.
const dayPrefixes = new Map<number, string>();

function pad(n: number, width: number): string {
  return String(n).padStart(width, "0");
}

/** Milliseconds to an ISO UTC string, exactly as Date#toISOString writes it, faster for many nearby times. */
export function iso(timeMs: number): string {
  const ms = Math.trunc(timeMs); // a Date's time value drops fractions of a millisecond the same way
  const day = Math.floor(ms / MS_PER_DAY);
  let prefix = dayPrefixes.get(day);
  if (prefix === undefined) {
    const full = new Date(day * MS_PER_DAY).toISOString();
    prefix = full.slice(0, full.indexOf("T") + 1);
    if (dayPrefixes.size > 20_000) dayPrefixes.clear();
    dayPrefixes.set(day, prefix);
  }
  let rest = ms - day * MS_PER_DAY;
  const h = Math.floor(rest / 3_600_000);
  rest -= h * 3_600_000;
  const m = Math.floor(rest / 60_000);
  rest -= m * 60_000;
  const sec = Math.floor(rest / 1000);
  return `${prefix}${pad(h, 2)}:${pad(m, 2)}:${pad(sec, 2)}.${pad(rest - sec * 1000, 3)}Z`;
}

function isoIntervals(list: readonly Interval[]): IsoInterval[] {
  return list.map((i) => ({ start: iso(i.startMs), end: iso(i.endMs) }));
}

function lengthSeconds(list: readonly Interval[]): number {
  let ms = 0;
  for (const i of list) ms += i.endMs - i.startMs;
  return ms / 1000;
}

/** Inputs of buildExposureReport besides the period and its summary. */
export interface ReportSources {
  /** Each counted run's start, end and DAQ live time, which the summary rows do not repeat. */
  runsByNumber: ReadonlyMap<number, ExposureRun>;
  /** Runs closed without a live time (handed to the computation as open, so they are listed apart). */
  withoutLiveTime?: { has(runNumber: number): boolean };
  /** Totals of the same period with the proposed excluding flags added, and how many there were. */
  preview?: { proposedExcludingFlags: number; exposureKgDay: number; goodLiveSeconds: number } | null;
  now?: Date;
  /** Shape only the first rows (a page shows a screenful; the totals still cover every run). */
  maxRows?: number;
}

/** Builds the report from a computed summary and the runs it was computed from. */
export function buildExposureReport(period: ReportPeriod, summary: PeriodExposure, sources: ReportSources): ExposureReport {
  const { runsByNumber, withoutLiveTime, preview = null, now = new Date(), maxRows = Infinity } = sources;
  const rows = summary.rows.length > maxRows ? summary.rows.slice(0, maxRows) : summary.rows;
  const runs = rows.map((row): ExposureReportRow => {
    const run = runsByNumber.get(row.runNumber);
    if (!run || run.endMs === null) throw new Error(`run ${row.runNumber} is in the summary but not among the loaded ended runs`);
    return {
      runNumber: row.runNumber,
      runType: run.type,
      runStart: iso(run.startMs),
      runEnd: iso(run.endMs),
      runDurationSeconds: (run.endMs - run.startMs) / 1000,
      daqLiveSeconds: run.liveSeconds,
      windowStart: iso(row.window.startMs),
      windowEnd: iso(row.window.endMs),
      windowSeconds: (row.window.endMs - row.window.startMs) / 1000,
      goodSeconds: lengthSeconds(row.goodIntervals),
      liveSecondsInPeriod: row.liveSecondsInPeriod,
      goodLiveSeconds: row.goodLiveSeconds,
      lostLiveSeconds: row.lostLiveSeconds,
      targetMassKg: row.targetMassKg,
      exposureKgDay: row.exposureKgDay,
      goodIntervals: isoIntervals(row.goodIntervals),
      cautionIntervals: isoIntervals(row.cautionIntervals),
    };
  });
  const openRuns = summary.openRuns.map(
    (r): OpenRunEntry => ({
      runNumber: r.number,
      runType: r.type,
      runStart: iso(r.startMs),
      state: withoutLiveTime?.has(r.number) ? "no live time" : "running",
    }),
  );
  return {
    period,
    formula: EXPOSURE_FORMULA,
    totals: summary.totals,
    runs,
    runsOmitted: summary.rows.length - rows.length,
    openRuns,
    preview: preview
      ? {
          proposedExcludingFlags: preview.proposedExcludingFlags,
          exposureKgDay: preview.exposureKgDay,
          changeKgDay: preview.exposureKgDay - summary.totals.exposureKgDay,
          goodLiveSeconds: preview.goodLiveSeconds,
        }
      : null,
    computedAt: now.toISOString(),
  };
}
