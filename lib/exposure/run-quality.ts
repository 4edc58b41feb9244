/**
 * Per-run data-quality status for the runs table: how much of a run the excluding flags remove.
 * Caution flags never change the status (they do not remove time).
 */
import { buildFlagUnion } from "./flag-union";
import { firstEndingAfter, subtractFromSpan } from "./intervals";
import type { ExposureFlag, ExposureRun, Interval } from "./types";
import { validateRun } from "./validate";

/** Status of a run against the excluding flags. */
export type RunQuality = "open" | "excluded" | "partly excluded" | "good";

/** Quality of a validated run against an already merged union of excluding time, O(log F + k). */
export function runQualityFromUnion(run: ExposureRun, excludeUnion: readonly Interval[]): RunQuality {
  if (run.endMs === null) return "open";
  const span = { startMs: run.startMs, endMs: run.endMs };
  const good = subtractFromSpan(span, excludeUnion, firstEndingAfter(excludeUnion, span.startMs));
  if (good.length === 0) return "excluded";
  const untouched = good.length === 1 && good[0]!.startMs === span.startMs && good[0]!.endMs === span.endMs;
  return untouched ? "good" : "partly excluded";
}

/** Quality of one run given the flags ("caution" flags are ignored): open, excluded, partly excluded or good. */
export function runQuality(run: ExposureRun, flags: readonly ExposureFlag[]): RunQuality {
  validateRun(run);
  return runQualityFromUnion(run, buildFlagUnion(flags).exclude);
}

/** Quality of many runs at once, merging the flags a single time; results in input order. */
export function runQualities(runs: readonly ExposureRun[], flags: readonly ExposureFlag[]): RunQuality[] {
  runs.forEach((run) => validateRun(run));
  const exclude = buildFlagUnion(flags).exclude;
  return runs.map((run) => runQualityFromUnion(run, exclude));
}
