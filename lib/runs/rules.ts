/**
 * The rules a run must satisfy when it is closed. One place for them: the DAQ API and the shift crew's
 * forms both call these, so a run closed either way obeys the same arithmetic.
 */
import { RunInputError } from "./errors";
import type { CloseRunInput } from "./types";

/** Smallest tolerance on live + dead time, in seconds. */
export const ACCOUNTING_TOLERANCE_MIN_SECONDS = 1;
/** Relative tolerance on live + dead time: 0.1 % of the run duration. */
export const ACCOUNTING_TOLERANCE_FRACTION = 0.001;
/** The tolerance rule in words, quoted in error texts so the DAQ operator knows what was allowed. */
export const ACCOUNTING_TOLERANCE_TEXT = "1 s or 0.1 % of the run duration, whichever is larger";

/**
 * How far live + dead time may exceed the run duration: the DAQ's clocks for live time, dead time and the run
 * boundaries are not read at the same instant, so the sum can overshoot by a little without anything being wrong.
 */
export function accountingToleranceSeconds(durationSeconds: number): number {
  return Math.max(ACCOUNTING_TOLERANCE_MIN_SECONDS, ACCOUNTING_TOLERANCE_FRACTION * durationSeconds);
}

/** Run duration in seconds between two UTC millisecond instants. */
export function durationSeconds(startMs: number, endMs: number): number {
  return (endMs - startMs) / 1000;
}

/** Live time over duration; null while the run is open (no end) or for a zero-length span. */
export function liveFraction(startMs: number, endMs: number | null, liveSeconds: number | null): number | null {
  if (endMs === null || liveSeconds === null) return null;
  const d = durationSeconds(startMs, endMs);
  return d > 0 ? liveSeconds / d : null;
}

function seconds(value: number): string {
  return `${Number(value.toFixed(3))} s`;
}

/**
 * Throws RunInputError unless a close fits its run: end after start, 0 ≤ live ≤ duration (no tolerance: live
 * time beyond the duration is impossible and would break exposure), dead ≥ 0, and live + dead ≤ duration + tolerance.
 */
export function checkClose(startMs: number, close: CloseRunInput): void {
  if (close.endMs <= startMs) {
    throw new RunInputError("end", `must be after the run's start (${new Date(startMs).toISOString()})`);
  }
  const duration = durationSeconds(startMs, close.endMs);
  if (close.liveSeconds < 0) throw new RunInputError("liveSeconds", `must not be negative (got ${close.liveSeconds})`);
  if (close.liveSeconds > duration) {
    throw new RunInputError("liveSeconds", `exceeds the run duration (${seconds(close.liveSeconds)} > ${seconds(duration)})`);
  }
  if (close.deadSeconds < 0) throw new RunInputError("deadSeconds", `must not be negative (got ${close.deadSeconds})`);
  const sum = close.liveSeconds + close.deadSeconds;
  const tolerance = accountingToleranceSeconds(duration);
  if (sum > duration + tolerance) {
    throw new RunInputError(
      "deadSeconds",
      `live + dead time (${seconds(sum)}) exceeds the run duration (${seconds(duration)}) by more than the tolerance of ` +
        `${seconds(tolerance)} (${ACCOUNTING_TOLERANCE_TEXT})`,
    );
  }
}
