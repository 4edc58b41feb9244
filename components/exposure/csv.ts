/**
 * CSV exports that analysis code can read with any CSV reader: RFC 4180 quoting, one header row, a `kind`
 * column so counted runs, open runs and the totals line can be told apart without parsing positions.
 * Numbers are written in JavaScript's shortest round-trip form, so a reader gets back exactly what the JSON holds.
 */
import type { ExposureReport, IsoInterval } from "./report";

/** One CSV field: quoted when it holds a comma, quote, CR or LF (quotes doubled), as RFC 4180 asks. */
export function csvField(value: string | number | boolean | null | undefined): string {
  if (value === null || value === undefined) return "";
  if (typeof value === "number" && !Number.isFinite(value)) {
    throw new TypeError(`a CSV number must be finite (got ${String(value)})`);
  }
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One CSV record, ended by CRLF (RFC 4180's line break). */
export function csvLine(values: readonly (string | number | boolean | null | undefined)[]): string {
  return `${values.map(csvField).join(",")}\r\n`;
}

/** Columns of the exposure CSV, in order. */
export const EXPOSURE_CSV_COLUMNS = [
  "kind",
  "run_number",
  "run_type",
  "run_start_utc",
  "run_end_utc",
  "run_duration_s",
  "daq_live_s",
  "window_start_utc",
  "window_end_utc",
  "window_s",
  "good_s",
  "live_in_period_s",
  "good_live_s",
  "lost_live_s",
  "target_mass_kg",
  "exposure_kg_day",
  "exposure_t_yr",
  "runs_counted",
] as const;

/**
 * The exposure report as CSV: `run` lines (one per counted run), `open` lines (listed, not counted) and one
 * `total` line whose window is the period span and whose sums are the period totals.
 */
export function exposureCsv(report: ExposureReport): string {
  let out = csvLine(EXPOSURE_CSV_COLUMNS);
  for (const r of report.runs) {
    out += csvLine([
      "run", r.runNumber, r.runType, r.runStart, r.runEnd, r.runDurationSeconds, r.daqLiveSeconds,
      r.windowStart, r.windowEnd, r.windowSeconds, r.goodSeconds, r.liveSecondsInPeriod, r.goodLiveSeconds,
      r.lostLiveSeconds, r.targetMassKg, r.exposureKgDay, null, null,
    ]);
  }
  for (const o of report.openRuns) {
    out += csvLine(["open", o.runNumber, o.runType, o.runStart, null, null, null, null, null, null, null, null, null, null, null, null, null, null]);
  }
  const t = report.totals;
  out += csvLine([
    "total", null, report.period.runTypes.join(" "), null, null, null, null, report.period.startAt, report.period.endAt,
    null, null, t.liveSeconds, t.goodLiveSeconds, t.lostLiveSeconds, null, t.exposureKgDay, t.exposureTonneYear, t.runs,
  ]);
  return out;
}

/** ISO 8601 time intervals ("start/end"), space-separated, for one CSV field. */
export function intervalsField(list: readonly IsoInterval[]): string {
  return list.map((i) => `${i.start}/${i.end}`).join(" ");
}

/** A period's good-run list entry: a counted run with some good time left. */
export interface GoodRun {
  runNumber: number;
  goodIntervals: IsoInterval[];
  goodLiveSeconds: number;
}

/** The good-run list: counted runs that keep some good time after the excluding flags, in window order. */
export function goodRunList(report: ExposureReport): GoodRun[] {
  return report.runs
    .filter((r) => r.goodIntervals.length > 0)
    .map((r) => ({ runNumber: r.runNumber, goodIntervals: r.goodIntervals, goodLiveSeconds: r.goodLiveSeconds }));
}

/** The good-run list as CSV: run number, good intervals (ISO 8601 "start/end", space-separated), good live seconds. */
export function goodRunsCsv(list: readonly GoodRun[]): string {
  let out = csvLine(["run_number", "good_intervals_utc", "good_live_s"]);
  for (const g of list) out += csvLine([g.runNumber, intervalsField(g.goodIntervals), g.goodLiveSeconds]);
  return out;
}

/** A file name safe for Content-Disposition: lower-case letters, digits and dashes only. */
export function exportFileName(periodName: string, periodId: number, what: string, ext: "csv" | "json"): string {
  const slug = periodName.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-+|-+$/g, "").slice(0, 60) || "period";
  return `${what}-${slug}-${periodId}.${ext}`;
}
