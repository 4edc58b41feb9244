import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  computePeriodExposure,
  intersectIntervals,
  subtractIntervals,
  totalLength,
  type DataQualityPeriod,
  type ExposureFlag,
  type ExposureRun,
} from "@/lib/exposure";

// Randomised checks of the exposure bookkeeping. Time in minutes from 2031-03-01T00:00Z (invented data).
const MIN = 60_000;
const T0 = Date.UTC(2031, 2, 1);
const SPAN_MIN = 3_000; // the generated ledger lives in [T0, T0 + 3000 min), dense enough for flags to cut runs

const runArb = fc
  .record({
    startMin: fc.integer({ min: 0, max: SPAN_MIN - 600 }),
    lengthMin: fc.integer({ min: 1, max: 600 }),
    // Whole per-mille steps: fc.double leans towards subnormal values, which would hide differences.
    liveFraction: fc.integer({ min: 0, max: 1000 }).map((k) => k / 1000),
    massKg: fc.constantFrom(950, 12.25), // Quillon and Quillon-Ge
    type: fc.constantFrom("science", "calibration"),
  })
  .map(({ startMin, lengthMin, liveFraction, massKg, type }) => ({
    type,
    startMs: T0 + startMin * MIN,
    endMs: T0 + (startMin + lengthMin) * MIN,
    liveSeconds: liveFraction * lengthMin * 60,
    targetMassKg: massKg,
  }));

// Runs may overlap each other here on purpose: the sweep must not rely on runs being disjoint.
const runsArb = fc
  .array(runArb, { maxLength: 25 })
  .map((rs) => rs.map((r, i): ExposureRun => ({ ...r, number: 1000 + i })));

const flagArb = fc
  .record({
    startMin: fc.integer({ min: 0, max: SPAN_MIN }),
    lengthMin: fc.integer({ min: 1, max: 300 }),
    verdict: fc.constantFrom<"exclude" | "caution">("exclude", "caution"),
  })
  .map(({ startMin, lengthMin, verdict }): ExposureFlag => ({
    startMs: T0 + startMin * MIN,
    endMs: T0 + (startMin + lengthMin) * MIN,
    verdict,
  }));
const flagsArb = fc.array(flagArb, { maxLength: 25 });

const periodArb = fc
  .tuple(fc.integer({ min: 0, max: SPAN_MIN }), fc.integer({ min: 1, max: SPAN_MIN }))
  .map(([a, len]): DataQualityPeriod => ({ name: "p", startMs: T0 + a * MIN, endMs: T0 + (a + len) * MIN, runTypes: ["science"] }));

const exposure = (runs: ExposureRun[], flags: ExposureFlag[], p: DataQualityPeriod) =>
  computePeriodExposure(runs, flags, p).totals.exposureKgDay;

/** Relative closeness (two zeros count as equal). */
function close(a: number, b: number, rel = 1e-9): boolean {
  return Math.abs(a - b) <= rel * Math.max(Math.abs(a), Math.abs(b));
}

/** Brute-force reference: every run against every flag, straight from the definitions. */
function naiveExposure(runs: ExposureRun[], flags: ExposureFlag[], p: DataQualityPeriod): number {
  const excl = flags.filter((f) => f.verdict === "exclude");
  let total = 0;
  for (const r of runs) {
    if (!p.runTypes.includes(r.type) || r.endMs === null) continue;
    const window = intersectIntervals([{ startMs: r.startMs, endMs: r.endMs }], [p]);
    const good = totalLength(subtractIntervals(window, excl));
    total += ((r.liveSeconds * good) / (r.endMs - r.startMs) / 86_400) * r.targetMassKg;
  }
  return total;
}

describe("exposure properties", () => {
  it("agrees with a brute-force run × flag reference", () => {
    fc.assert(
      fc.property(runsArb, flagsArb, periodArb, (runs, flags, p) => {
        expect(close(exposure(runs, flags, p), naiveExposure(runs, flags, p))).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it("adding a flag never raises exposure", () => {
    fc.assert(
      fc.property(runsArb, flagsArb, flagArb, periodArb, (runs, flags, extra, p) => {
        expect(exposure(runs, [...flags, extra], p)).toBeLessThanOrEqual(exposure(runs, flags, p));
      }),
    );
  });

  it("splitting a period at any point adds up to the whole", () => {
    fc.assert(
      fc.property(runsArb, flagsArb, periodArb, fc.double({ min: 0, max: 1, noNaN: true }), (runs, flags, p, at) => {
        const cut = Math.round(p.startMs + at * (p.endMs - p.startMs));
        fc.pre(cut > p.startMs && cut < p.endMs);
        const left = exposure(runs, flags, { ...p, endMs: cut });
        const right = exposure(runs, flags, { ...p, startMs: cut });
        expect(close(left + right, exposure(runs, flags, p))).toBe(true); // within 1e-9 relative
      }),
    );
  });

  it("flags outside all runs change nothing", () => {
    fc.assert(
      fc.property(runsArb, flagsArb, periodArb, fc.array(flagArb, { maxLength: 10 }), (runs, flags, p, outside) => {
        // Shift the extra flags past the end of every generated run (all runs end before T0 + SPAN_MIN).
        const shifted = outside.map((f) => ({ ...f, startMs: f.startMs + SPAN_MIN * MIN, endMs: f.endMs + SPAN_MIN * MIN }));
        expect(exposure(runs, [...flags, ...shifted], p)).toBe(exposure(runs, flags, p));
      }),
    );
  });

  it("exposure never exceeds Σ live × mass", () => {
    fc.assert(
      fc.property(runsArb, flagsArb, periodArb, (runs, flags, p) => {
        const bound = runs.reduce((s, r) => s + (r.liveSeconds / 86_400) * r.targetMassKg, 0);
        expect(exposure(runs, flags, p)).toBeLessThanOrEqual(bound * (1 + 1e-12));
      }),
    );
  });

  it("caution flags never change exposure", () => {
    fc.assert(
      fc.property(runsArb, flagsArb, periodArb, (runs, flags, p) => {
        const excludeOnly = flags.filter((f) => f.verdict === "exclude");
        expect(exposure(runs, flags, p)).toBe(exposure(runs, excludeOnly, p));
      }),
    );
  });
});
