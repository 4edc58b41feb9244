// Bookkeeping checks for sealed calibration sources: is a checked-out source overdue for
// return, and when is its next leak (wipe) test due. Dates are UTC milliseconds.

import { SafetyInputError, requireFinite, requireInteger, requireNonNegative, requirePositive } from "./errors";

/** Due date and overdue state of something that has to happen by a deadline. */
export interface DeadlineStatus {
  /** Deadline, UTC ms. */
  dueMs: number;
  /** True once `now` is strictly after the deadline. */
  overdue: boolean;
  /** How far past the deadline `now` is, ms (0 when not overdue). */
  overdueByMs: number;
  /** Time left until the deadline, ms (0 when overdue). */
  remainingMs: number;
}

function deadlineStatus(dueMs: number, nowMs: number): DeadlineStatus {
  const late = nowMs - dueMs;
  return { dueMs, overdue: late > 0, overdueByMs: Math.max(0, late), remainingMs: Math.max(0, -late) };
}

/** Whether a source checked out at `checkedOutMs` for `allowedMs` is overdue at `nowMs`. */
export function checkoutStatus(checkedOutMs: number, allowedMs: number, nowMs: number): DeadlineStatus {
  requireFinite(checkedOutMs, "checkedOutMs");
  requireNonNegative(allowedMs, "allowedMs");
  requireFinite(nowMs, "nowMs");
  return deadlineStatus(checkedOutMs + allowedMs, nowMs);
}

function daysInUtcMonth(year: number, month0: number): number {
  // Day 0 of the next month is the last day of this one.
  const d = new Date(0);
  d.setUTCFullYear(year, month0 + 1, 0);
  return d.getUTCDate();
}

// Clamping matches how people read "in six months": 31 Aug + 6 months is the end of February.
/** Adds whole calendar months to a UTC date, keeping the time of day and clamping to month end. */
export function addUtcMonths(ms: number, months: number): number {
  requireFinite(ms, "ms");
  requireInteger(months, "months");
  const start = new Date(ms);
  const total = start.getUTCMonth() + months;
  const year = start.getUTCFullYear() + Math.floor(total / 12);
  const month0 = ((total % 12) + 12) % 12;
  const day = Math.min(start.getUTCDate(), daysInUtcMonth(year, month0));
  const out = new Date(ms);
  // setUTCFullYear (unlike Date.UTC) does not reinterpret years 0–99 as 1900–1999.
  out.setUTCFullYear(year, month0, day);
  return out.getTime();
}

/** Leak-test interval: whole calendar months, or a fixed number of days. */
export type LeakTestInterval = { months: number } | { days: number };

/** Six calendar months between leak tests: common practice for sealed sources. */
export const DEFAULT_LEAK_TEST_INTERVAL: LeakTestInterval = Object.freeze({ months: 6 });

const MS_PER_DAY = 86_400_000;

/** Date (UTC ms) the next leak test is due after one done at `lastTestMs`. */
export function leakTestDueMs(lastTestMs: number, interval: LeakTestInterval = DEFAULT_LEAK_TEST_INTERVAL): number {
  requireFinite(lastTestMs, "lastTestMs");
  if ("months" in interval) {
    requireInteger(interval.months, "interval.months");
    requirePositive(interval.months, "interval.months");
    return addUtcMonths(lastTestMs, interval.months);
  }
  if ("days" in interval) {
    requirePositive(interval.days, "interval.days");
    return lastTestMs + interval.days * MS_PER_DAY;
  }
  throw new SafetyInputError("MISSING", "interval", "give either months or days");
}

/** Due date and overdue state of the next leak test at `nowMs`. */
export function leakTestStatus(
  lastTestMs: number,
  nowMs: number,
  interval: LeakTestInterval = DEFAULT_LEAK_TEST_INTERVAL,
): DeadlineStatus {
  requireFinite(nowMs, "nowMs");
  return deadlineStatus(leakTestDueMs(lastTestMs, interval), nowMs);
}
