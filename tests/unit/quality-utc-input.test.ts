import { describe, it, expect } from "vitest";
import { formatUtcInput, parseUtcInput, UtcInputError } from "@/components/quality/utc-input";

// Expected instants are written with Date.UTC (ECMAScript's own UTC constructor, the general-purpose reference here).
const good: { label: string; text: string; ms: number }[] = [
  { label: "date and minutes, space separated", text: "2032-01-05 10:00", ms: Date.UTC(2032, 0, 5, 10, 0) },
  { label: "ISO 8601 with T and Z", text: "2032-01-05T10:00:30Z", ms: Date.UTC(2032, 0, 5, 10, 0, 30) },
  { label: "milliseconds", text: "2032-01-05 10:00:30.25", ms: Date.UTC(2032, 0, 5, 10, 0, 30, 250) },
  { label: "date only means midnight UTC", text: "2032-03-01", ms: Date.UTC(2032, 2, 1) },
  { label: "explicit +00:00 is UTC", text: "2032-01-05T10:00+00:00", ms: Date.UTC(2032, 0, 5, 10, 0) },
  { label: "leap day of a leap year (2032 is divisible by 4, Gregorian rule)", text: "2032-02-29 23:59:59", ms: Date.UTC(2032, 1, 29, 23, 59, 59) },
  { label: "surrounding spaces are ignored", text: "  2032-01-05 10:00  ", ms: Date.UTC(2032, 0, 5, 10, 0) },
];

const bad: { label: string; text: string; why: RegExp }[] = [
  { label: "empty", text: "", why: /empty/ },
  // another offset would shift the boundary by hours: refused, not converted
  { label: "a non-UTC offset", text: "2032-01-05T10:00+01:00", why: /not a UTC time/ },
  { label: "February 30th", text: "2032-02-30 10:00", why: /not a real date/ },
  { label: "hour 24", text: "2032-01-05 24:00", why: /not a real date/ },
  { label: "29 February of a common year (2031)", text: "2031-02-29", why: /not a real date/ },
  { label: "day-first order", text: "05.01.2032 10:00", why: /not a UTC time/ },
];

describe("typed UTC times", () => {
  it.each(good)("reads $label", ({ text, ms }) => {
    expect(parseUtcInput(text)).toBe(ms);
  });

  it.each(bad)("refuses $label with a typed error", ({ text, why }) => {
    expect(() => parseUtcInput(text, "startAt")).toThrow(UtcInputError);
    try {
      parseUtcInput(text, "startAt");
    } catch (err) {
      expect((err as UtcInputError).field).toBe("startAt");
      expect((err as UtcInputError).reason).toMatch(why);
    }
  });

  it.each([
    { label: "whole seconds", ms: Date.UTC(2032, 0, 5, 10, 0, 30), text: "2032-01-05 10:00:30" },
    { label: "with milliseconds", ms: Date.UTC(2032, 0, 5, 10, 0, 30, 7), text: "2032-01-05 10:00:30.007" },
  ])("formats $label so it reads back to the same instant", ({ ms, text }) => {
    expect(formatUtcInput(ms)).toBe(text);
    expect(parseUtcInput(formatUtcInput(ms))).toBe(ms);
  });
});
