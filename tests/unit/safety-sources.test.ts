import { describe, it, expect } from "vitest";
import { addUtcMonths, checkoutStatus, leakTestDueMs, leakTestStatus, DEFAULT_LEAK_TEST_INTERVAL } from "@/lib/safety/sources";
import { SafetyInputError } from "@/lib/safety/errors";

const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;
const utc = (iso: string): number => Date.parse(iso);

describe("checkout overdue", () => {
  const out = utc("2025-03-10T08:00:00Z"); // Cs-137 check source taken to the Quillon cryostat (invented)
  const allowed = 4 * HOUR_MS; // due back at 12:00

  it.each([
    { label: "still within the allowance", now: "2025-03-10T11:00:00Z", overdue: false, byMs: 0, leftMs: HOUR_MS },
    { label: "exactly at the deadline", now: "2025-03-10T12:00:00Z", overdue: false, byMs: 0, leftMs: 0 },
    { label: "ninety minutes late", now: "2025-03-10T13:30:00Z", overdue: true, byMs: 1.5 * HOUR_MS, leftMs: 0 },
    { label: "next day", now: "2025-03-11T12:00:00Z", overdue: true, byMs: DAY_MS, leftMs: 0 },
  ])("$label", ({ now, overdue, byMs, leftMs }) => {
    // Expected values are clock arithmetic from the stated times.
    const s = checkoutStatus(out, allowed, utc(now));
    expect(s.dueMs).toBe(utc("2025-03-10T12:00:00Z"));
    expect(s.overdue).toBe(overdue);
    expect(s.overdueByMs).toBe(byMs);
    expect(s.remainingMs).toBe(leftMs);
  });
});

describe("adding calendar months with month-end clamping", () => {
  it.each([
    // Month lengths and leap years per the Gregorian calendar (2024 is a leap year, 2025 is not).
    { label: "31 Aug + 6 → 28 Feb (common year)", from: "2024-08-31T00:00:00Z", months: 6, to: "2025-02-28T00:00:00Z" },
    { label: "31 Aug + 6 → 29 Feb (leap year)", from: "2023-08-31T00:00:00Z", months: 6, to: "2024-02-29T00:00:00Z" },
    { label: "31 Jan + 1 → 29 Feb", from: "2024-01-31T00:00:00Z", months: 1, to: "2024-02-29T00:00:00Z" },
    { label: "31 Oct + 1 → 30 Nov", from: "2024-10-31T09:15:00Z", months: 1, to: "2024-11-30T09:15:00Z" },
    { label: "31 Dec + 2 → 28 Feb next year", from: "2024-12-31T00:00:00Z", months: 2, to: "2025-02-28T00:00:00Z" },
    { label: "keeps time of day", from: "2024-05-15T10:30:45.123Z", months: 6, to: "2024-11-15T10:30:45.123Z" },
    { label: "twelve months is one year", from: "2024-02-29T00:00:00Z", months: 12, to: "2025-02-28T00:00:00Z" },
    { label: "backwards: 31 Mar − 1 → 29 Feb", from: "2024-03-31T00:00:00Z", months: -1, to: "2024-02-29T00:00:00Z" },
    { label: "backwards across a year: 15 Jan − 13", from: "2025-01-15T00:00:00Z", months: -13, to: "2023-12-15T00:00:00Z" },
    { label: "zero months", from: "2024-07-31T00:00:00Z", months: 0, to: "2024-07-31T00:00:00Z" },
  ])("$label", ({ from, months, to }) => {
    expect(new Date(addUtcMonths(utc(from), months)).toISOString()).toBe(new Date(utc(to)).toISOString());
  });
});

describe("leak-test due date", () => {
  it("defaults to six calendar months (common practice for sealed sources)", () => {
    expect(DEFAULT_LEAK_TEST_INTERVAL).toEqual({ months: 6 });
    expect(leakTestDueMs(utc("2025-01-20T00:00:00Z"))).toBe(utc("2025-07-20T00:00:00Z"));
  });

  it.each([
    // Gregorian calendar: 31 Aug 2024 + 6 months clamps to 28 Feb 2025.
    { label: "month-end test, day after due", last: "2024-08-31T00:00:00Z", now: "2025-03-01T00:00:00Z", interval: { months: 6 }, due: "2025-02-28T00:00:00Z", overdue: true, byMs: DAY_MS },
    { label: "month-end test, on the due date", last: "2024-08-31T00:00:00Z", now: "2025-02-28T00:00:00Z", interval: { months: 6 }, due: "2025-02-28T00:00:00Z", overdue: false, byMs: 0 },
    { label: "yearly interval", last: "2024-03-01T00:00:00Z", now: "2024-12-01T00:00:00Z", interval: { months: 12 }, due: "2025-03-01T00:00:00Z", overdue: false, byMs: 0 },
    // 31 + 29 + 31 + 30 + 31 + 30 = 182 days from 1 Jan 2024 reaches 1 Jul 2024 (leap February).
    { label: "182-day interval", last: "2024-01-01T00:00:00Z", now: "2024-07-11T00:00:00Z", interval: { days: 182 }, due: "2024-07-01T00:00:00Z", overdue: true, byMs: 10 * DAY_MS },
  ])("$label", ({ last, now, interval, due, overdue, byMs }) => {
    const s = leakTestStatus(utc(last), utc(now), interval);
    expect(s.dueMs).toBe(utc(due));
    expect(s.overdue).toBe(overdue);
    expect(s.overdueByMs).toBe(byMs);
  });
});

describe("bad input is a typed error", () => {
  it.each([
    { label: "negative allowance", run: () => checkoutStatus(0, -1, 0), code: "NEGATIVE", field: "allowedMs" },
    { label: "NaN now", run: () => checkoutStatus(0, 1, Number.NaN), code: "NOT_FINITE", field: "nowMs" },
    { label: "fractional months", run: () => addUtcMonths(0, 1.5), code: "NOT_INTEGER", field: "months" },
    { label: "zero-month interval", run: () => leakTestDueMs(0, { months: 0 }), code: "NOT_POSITIVE", field: "interval.months" },
    { label: "negative-day interval", run: () => leakTestDueMs(0, { days: -1 }), code: "NOT_POSITIVE", field: "interval.days" },
    { label: "empty interval", run: () => leakTestDueMs(0, {} as { days: number }), code: "MISSING", field: "interval" },
    { label: "invalid last-test date", run: () => leakTestStatus(Number.NaN, 0), code: "NOT_FINITE", field: "lastTestMs" },
  ])("$label → $code", ({ run, code, field }) => {
    expect(run).toThrow(SafetyInputError);
    expect(run).toThrow(expect.objectContaining({ code, field }));
  });
});
