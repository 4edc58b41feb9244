/**
 * Exposure over time, for charts: the cumulative exposure curve and the daily live fraction.
 * Both are derived from a period summary, so they agree exactly with the period totals.
 */
import { ExposureInputError } from "./errors";
import { lengthOfMerged } from "./intervals";
import { computePeriodExposure } from "./period-exposure";
import type { DataQualityPeriod, ExposureFlag, ExposureRun, PeriodExposure } from "./types";
import { MS_PER_DAY, SECONDS_PER_DAY } from "./units";
import { periodLabel } from "./validate";

/** One step of the cumulative exposure curve. */
export interface CumulativeExposurePoint {
  /** End of a counted run's window (run end, or period end if the run outlasts the period). */
  timeMs: number;
  /** Exposure of all runs whose window ends at or before timeMs. */
  cumulativeKgDay: number;
}

/** Good live time falling in one UTC day of the period. */
export interface DailyLiveFraction {
  /** UTC midnight starting the day. */
  dayStartMs: number;
  goodLiveSeconds: number;
  /** goodLiveSeconds / 86 400 (whole-day denominator, also for the partial first and last days). */
  liveFraction: number;
}

/** Longest period a daily series is built for (about 300 years), so a typo cannot allocate millions of days. */
export const MAX_SERIES_DAYS = 110_000;

/** Cumulative exposure at each counted run's window end, in time order; runs ending together share one point. */
export function cumulativeExposureSeries(summary: PeriodExposure): CumulativeExposurePoint[] {
  const byEnd = [...summary.rows].sort((a, b) => a.window.endMs - b.window.endMs);
  const points: CumulativeExposurePoint[] = [];
  let cumulative = 0;
  for (const row of byEnd) {
    cumulative += row.exposureKgDay;
    const last = points[points.length - 1];
    if (last && last.timeMs === row.window.endMs) last.cumulativeKgDay = cumulative;
    else points.push({ timeMs: row.window.endMs, cumulativeKgDay: cumulative });
  }
  return points;
}

/**
 * Good live seconds per UTC day of the period, each run's good live time shared across days in
 * proportion to its good (not excluded) time in each day.
 */
export function dailyLiveFraction(summary: PeriodExposure): DailyLiveFraction[] {
  const { period } = summary;
  const firstDayMs = Math.floor(period.startMs / MS_PER_DAY) * MS_PER_DAY;
  const dayCount = Math.ceil((period.endMs - firstDayMs) / MS_PER_DAY);
  if (dayCount > MAX_SERIES_DAYS) {
    throw new ExposureInputError(periodLabel(period), "endMs", `spans ${dayCount} days, more than ${MAX_SERIES_DAYS} for a daily series`);
  }
  const seconds = new Array<number>(dayCount).fill(0);
  for (const row of summary.rows) {
    const goodMs = lengthOfMerged(row.goodIntervals);
    if (goodMs === 0) continue;
    for (const piece of row.goodIntervals) {
      let cursor = piece.startMs;
      while (cursor < piece.endMs) {
        const day = Math.floor((cursor - firstDayMs) / MS_PER_DAY);
        const dayEnd = firstDayMs + (day + 1) * MS_PER_DAY;
        const stop = Math.min(piece.endMs, dayEnd);
        seconds[day] = seconds[day]! + (row.goodLiveSeconds * (stop - cursor)) / goodMs;
        cursor = stop;
      }
    }
  }
  return seconds.map((goodLiveSeconds, day) => ({
    dayStartMs: firstDayMs + day * MS_PER_DAY,
    goodLiveSeconds,
    liveFraction: goodLiveSeconds / SECONDS_PER_DAY,
  }));
}

/** Period summary plus both chart series, computed from raw runs and flags. */
export function exposureOverTime(
  runs: readonly ExposureRun[],
  flags: readonly ExposureFlag[],
  period: DataQualityPeriod,
): { summary: PeriodExposure; cumulative: CumulativeExposurePoint[]; daily: DailyLiveFraction[] } {
  const summary = computePeriodExposure(runs, flags, period);
  return { summary, cumulative: cumulativeExposureSeries(summary), daily: dailyLiveFraction(summary) };
}
