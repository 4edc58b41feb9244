import { describe, it, expect } from "vitest";
import { formatAge, formatHoursMinutes } from "@/components/safety/age";

const MIN = 60_000;
const HOUR = 60 * MIN;
const DAY = 24 * HOUR;

// Expected strings are clock arithmetic on the stated durations (rounded down for ages).
describe("queue item age", () => {
  it.each([
    { label: "just now", ms: 20_000, text: "< 1 min" },
    { label: "negative (clock skew) reads as just now", ms: -5_000, text: "< 1 min" },
    { label: "45 minutes", ms: 45 * MIN + 59_000, text: "45 min" },
    { label: "one hour", ms: HOUR, text: "1 h" },
    { label: "three hours", ms: 3 * HOUR + 40 * MIN, text: "3 h" },
    { label: "just past 24 h stays in hours", ms: 25 * HOUR, text: "25 h" },
    { label: "47 h 59 min", ms: 2 * DAY - MIN, text: "47 h" },
    { label: "two days", ms: 2 * DAY, text: "2 d" },
    { label: "nine and a half days", ms: 9.5 * DAY, text: "9 d" },
  ])("$label → $text", ({ ms, text }) => {
    expect(formatAge(ms)).toBe(text);
  });

  it("refuses a non-finite age", () => {
    expect(() => formatAge(Number.NaN)).toThrow(RangeError);
  });
});

describe("hours and minutes", () => {
  it.each([
    // Kr-83m decay wait to 0.1 %: 1.83 h × log2(1000) = 18.24 h (half-life ENSDF via NuDat 3, from memory).
    { label: "Kr-83m wait to 0.1 %", s: 1.83 * 3600 * Math.log2(1000), text: "18 h 14 min" },
    { label: "exact hours", s: 7200, text: "2 h" },
    { label: "under an hour", s: 600, text: "10 min" },
  ])("$label → $text", ({ s, text }) => {
    expect(formatHoursMinutes(s)).toBe(text);
  });
});
