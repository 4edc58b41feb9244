/**
 * Exposure of data-quality periods. One pass per period over the runs in start order, with a pointer
 * into the merged flag union that only moves forward: O((R + F) log(R + F)) overall, never R × F.
 *
 * Per counted run (arithmetic kept in this order so hand-computed values match):
 *   live in period = DAQ live s × window / duration
 *   good live      = DAQ live s × good time / duration   (dead time spread evenly over the run)
 *   exposure       = good live / 86 400 × target mass    [kg·day]
 */
import { buildFlagUnion, type FlagUnion } from "./flag-union";
import { clipToSpan, firstEndingAfter, lengthOfMerged, subtractFromSpan } from "./intervals";
import type { DataQualityPeriod, ExposureFlag, ExposureRun, Interval, PeriodExposure, RunExposureRow } from "./types";
import { kgDayToTonneYear, liveSecondsToKgDay } from "./units";
import { validatePeriod, validateRun } from "./validate";

/** Runs sorted by start then number; the order every sweep relies on. */
export function sortRunsByStart(runs: readonly ExposureRun[]): ExposureRun[] {
  return [...runs].sort((a, b) => a.startMs - b.startMs || a.number - b.number);
}

/** Exposure row of one ended run over a window, given the flag union and sweep pointers. */
function rowFor(
  run: ExposureRun,
  runEndMs: number,
  window: Interval,
  flags: FlagUnion,
  ex: number,
  ca: number,
): RunExposureRow {
  const durationMs = runEndMs - run.startMs;
  const goodIntervals = subtractFromSpan(window, flags.exclude, ex);
  const liveSecondsInPeriod = (run.liveSeconds * (window.endMs - window.startMs)) / durationMs;
  const goodLiveSeconds = (run.liveSeconds * lengthOfMerged(goodIntervals)) / durationMs;
  const row: RunExposureRow = {
    runNumber: run.number,
    window,
    goodIntervals,
    cautionIntervals: clipToSpan(window, flags.caution, ca),
    liveSecondsInPeriod,
    lostLiveSeconds: liveSecondsInPeriod - goodLiveSeconds,
    goodLiveSeconds,
    targetMassKg: run.targetMassKg,
    exposureKgDay: liveSecondsToKgDay(goodLiveSeconds, run.targetMassKg),
  };
  if (run.id !== undefined) row.runId = run.id;
  return row;
}

/**
 * Summary of one period from runs already validated and sorted by start, and a prepared flag union.
 * Exposed so callers holding many periods (or a cached union) pay the sort and merge only once.
 */
export function summarizePeriodSorted(
  sortedRuns: readonly ExposureRun[],
  flags: FlagUnion,
  period: DataQualityPeriod,
): PeriodExposure {
  const types = new Set(period.runTypes);
  const rows: RunExposureRow[] = [];
  const openRuns: ExposureRun[] = [];
  // Window starts are max(run start, period start): non-decreasing in run start order, so flag
  // intervals ending before one window's start can be skipped for every later run as well.
  let ex = firstEndingAfter(flags.exclude, period.startMs);
  let ca = firstEndingAfter(flags.caution, period.startMs);
  const totals = { runs: 0, liveSeconds: 0, goodLiveSeconds: 0, lostLiveSeconds: 0, exposureKgDay: 0 };

  for (const run of sortedRuns) {
    if (run.startMs >= period.endMs) break; // this and all later runs start after the period
    if (!types.has(run.type)) continue;
    if (run.endMs === null) {
      openRuns.push(run); // still running, so it reaches into the period; not countable yet
      continue;
    }
    if (run.endMs <= period.startMs) continue; // ends at or before the period starts: no overlap
    const window = { startMs: Math.max(run.startMs, period.startMs), endMs: Math.min(run.endMs, period.endMs) };
    while (ex < flags.exclude.length && flags.exclude[ex]!.endMs <= window.startMs) ex++;
    while (ca < flags.caution.length && flags.caution[ca]!.endMs <= window.startMs) ca++;
    const row = rowFor(run, run.endMs, window, flags, ex, ca);
    rows.push(row);
    totals.runs += 1;
    totals.liveSeconds += row.liveSecondsInPeriod;
    totals.goodLiveSeconds += row.goodLiveSeconds;
    totals.lostLiveSeconds += row.lostLiveSeconds;
    totals.exposureKgDay += row.exposureKgDay;
  }

  return {
    period,
    rows,
    openRuns,
    totals: { ...totals, exposureTonneYear: kgDayToTonneYear(totals.exposureKgDay), openRuns: openRuns.length },
  };
}

/** Exposure summaries of several periods, sorting runs and merging flags once for all of them. */
export function computePeriodsExposure(
  runs: readonly ExposureRun[],
  flags: readonly ExposureFlag[],
  periods: readonly DataQualityPeriod[],
): PeriodExposure[] {
  runs.forEach((run) => validateRun(run));
  periods.forEach((period, i) => validatePeriod(period, i));
  const union = buildFlagUnion(flags);
  const sorted = sortRunsByStart(runs);
  return periods.map((period) => summarizePeriodSorted(sorted, union, period));
}

/** Exposure summary of one period: per-run rows, open runs listed apart, and totals. */
export function computePeriodExposure(
  runs: readonly ExposureRun[],
  flags: readonly ExposureFlag[],
  period: DataQualityPeriod,
): PeriodExposure {
  return computePeriodsExposure(runs, flags, [period])[0]!;
}
