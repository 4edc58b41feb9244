/**
 * Shapes shared by the exposure modules. All times are UTC milliseconds since the epoch and every
 * span is half-open [startMs, endMs), so back-to-back runs or flags never double-count an instant.
 */

/** A half-open span of time [startMs, endMs) in UTC milliseconds. */
export interface Interval {
  startMs: number;
  endMs: number;
}

/** Run types the detector records; periods choose a subset of these. */
export type RunType = "science" | "calibration" | "background" | "noise" | "commissioning";

/** One DAQ run as the exposure code needs it. `endMs: null` means the run is still open. */
export interface ExposureRun {
  id?: string | number;
  number: number;
  /** Usually a RunType; other strings are accepted and simply never match a period. */
  type: string;
  startMs: number;
  endMs: number | null;
  /** DAQ live time of the whole run, in seconds. */
  liveSeconds: number;
  /** Target (fiducial) mass in kg used for this run. */
  targetMassKg: number;
}

/** "exclude" removes time from exposure; "caution" is only shown, never subtracted. */
export type FlagVerdict = "exclude" | "caution";

/** A confirmed data-quality flag over a span of time. */
export interface ExposureFlag {
  id?: string | number;
  startMs: number;
  endMs: number;
  verdict: FlagVerdict;
  subsystem?: string;
}

/** A data-quality period: a named span and the run types that count towards its exposure. */
export interface DataQualityPeriod {
  name: string;
  startMs: number;
  endMs: number;
  runTypes: readonly string[];
}

/** Exposure bookkeeping of one counted run inside one period. */
export interface RunExposureRow {
  runNumber: number;
  runId?: string | number;
  /** The part of the run inside the period: [max(run start, period start), min(run end, period end)). */
  window: Interval;
  /** The window minus the union of excluding flags. */
  goodIntervals: Interval[];
  /** Caution-flagged time inside the window (merged, clipped), for display only. */
  cautionIntervals: Interval[];
  /** DAQ live seconds × window / run duration. */
  liveSecondsInPeriod: number;
  /** Live seconds in the period lost to excluding flags. */
  lostLiveSeconds: number;
  /** DAQ live seconds × good time / run duration. */
  goodLiveSeconds: number;
  targetMassKg: number;
  /** goodLiveSeconds / 86 400 × target mass. */
  exposureKgDay: number;
}

/** Period totals over the counted runs. */
export interface PeriodTotals {
  runs: number;
  liveSeconds: number;
  goodLiveSeconds: number;
  lostLiveSeconds: number;
  exposureKgDay: number;
  exposureTonneYear: number;
  /** Open runs of a matching type overlapping the period (listed apart, not counted). */
  openRuns: number;
}

/** Full exposure summary of one period. */
export interface PeriodExposure {
  period: DataQualityPeriod;
  /** Counted runs, in window start order (then run number). */
  rows: RunExposureRow[];
  /** Matching runs still open that overlap the period; not counted in totals. */
  openRuns: ExposureRun[];
  totals: PeriodTotals;
}
