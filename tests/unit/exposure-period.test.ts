import { describe, it, expect } from "vitest";
import {
  computePeriodExposure,
  computePeriodsExposure,
  type DataQualityPeriod,
  type ExposureFlag,
  type ExposureRun,
} from "@/lib/exposure";

// Invented demo data: Quillon (liquid xenon, 950 kg fiducial) and Quillon-Ge (12.25 kg) at Kestrin Deep Site.
// Formulas (common practice, dead time spread evenly over a run):
//   live in period = live × window / duration, good live = live × good / duration, kg·day = good live / 86400 × mass.
const H = 3_600_000; // ms per hour
const T0 = Date.UTC(2031, 2, 1); // 2031-03-01T00:00Z
const at = (hours: number) => T0 + hours * H;

function run(number: number, fromH: number, toH: number | null, liveSeconds: number, extra: Partial<ExposureRun> = {}): ExposureRun {
  return { number, type: "science", startMs: at(fromH), endMs: toH === null ? null : at(toH), liveSeconds, targetMassKg: 950, ...extra };
}
const exclude = (fromH: number, toH: number, id?: number): ExposureFlag => ({ id, startMs: at(fromH), endMs: at(toH), verdict: "exclude" });
const caution = (fromH: number, toH: number): ExposureFlag => ({ startMs: at(fromH), endMs: at(toH), verdict: "caution" });
const period = (fromH: number, toH: number, runTypes: string[] = ["science"]): DataQualityPeriod => ({
  name: "first",
  startMs: at(fromH),
  endMs: at(toH),
  runTypes,
});

// The reference run: 10 h long, 9 h (32 400 s) live, 950 kg.
const ref = run(1, 0, 10, 32_400);

interface Case {
  label: string;
  runs: ExposureRun[];
  flags: ExposureFlag[];
  period: DataQualityPeriod;
  expected: { runs: number; liveSeconds: number; goodLiveSeconds: number; exposureKgDay: number; openRuns: number };
}

const cases: Case[] = [
  {
    label: "worked example: 1 h excluding flag inside a 10 h run",
    runs: [ref],
    flags: [exclude(4, 5)],
    period: period(0, 24),
    // by hand: good live = 32400 × 9/10 = 29160 s; 29160 / 86400 × 950 = 0.3375 × 950 = 320.625 kg·day
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 29_160, exposureKgDay: 320.625, openRuns: 0 },
  },
  {
    label: "flag across the run start",
    runs: [ref],
    flags: [exclude(-2, 2)],
    period: period(-5, 24),
    // by hand: 2 h of the run excluded; 32400 × 8/10 = 25920 s; 25920 / 86400 × 950 = 0.3 × 950 = 285
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 25_920, exposureKgDay: 285, openRuns: 0 },
  },
  {
    label: "flag across the run end",
    runs: [ref],
    flags: [exclude(8, 11)],
    period: period(0, 24),
    // by hand: [8,10) h excluded; 32400 × 8/10 = 25920 s → 285 kg·day
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 25_920, exposureKgDay: 285, openRuns: 0 },
  },
  {
    label: "period starts inside the run, flag across the period start",
    runs: [ref],
    flags: [exclude(1, 3)],
    period: period(2, 24),
    // by hand: window [2,10) h → live 32400 × 8/10 = 25920; excluded [2,3) → good 32400 × 7/10 = 22680;
    // 22680 / 86400 × 950 = 0.2625 × 950 = 249.375
    expected: { runs: 1, liveSeconds: 25_920, goodLiveSeconds: 22_680, exposureKgDay: 249.375, openRuns: 0 },
  },
  {
    label: "period ends inside the run, flag across the period end",
    runs: [ref],
    flags: [exclude(4, 6)],
    period: period(0, 5),
    // by hand: window [0,5) h → live 32400 × 5/10 = 16200; excluded [4,5) → good 32400 × 4/10 = 12960;
    // 12960 / 86400 × 950 = 0.15 × 950 = 142.5
    expected: { runs: 1, liveSeconds: 16_200, goodLiveSeconds: 12_960, exposureKgDay: 142.5, openRuns: 0 },
  },
  {
    label: "overlapping flags subtracted once",
    runs: [ref],
    flags: [exclude(2, 4), exclude(3, 5)],
    period: period(0, 24),
    // by hand: union [2,5) = 3 h; 32400 × 7/10 = 22680 s → 249.375 kg·day (not 6/10, which double-counts [3,4))
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 22_680, exposureKgDay: 249.375, openRuns: 0 },
  },
  {
    label: "nested flags",
    runs: [ref],
    flags: [exclude(2, 6), exclude(3, 4)],
    period: period(0, 24),
    // by hand: union [2,6) = 4 h; 32400 × 6/10 = 19440 s; 19440 / 86400 × 950 = 0.225 × 950 = 213.75
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 19_440, exposureKgDay: 213.75, openRuns: 0 },
  },
  {
    label: "caution flag changes nothing",
    runs: [ref],
    flags: [caution(4, 5)],
    period: period(0, 24),
    // by hand: nothing excluded; 32400 / 86400 × 950 = 0.375 × 950 = 356.25
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 32_400, exposureKgDay: 356.25, openRuns: 0 },
  },
  {
    label: "caution on top of an exclusion adds nothing",
    runs: [ref],
    flags: [exclude(4, 5), caution(3, 6)],
    period: period(0, 24),
    // by hand: as the worked example, 29160 s → 320.625
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 29_160, exposureKgDay: 320.625, openRuns: 0 },
  },
  {
    label: "open run listed apart, not counted",
    runs: [ref, run(2, 12, null, 0), run(3, -30, null, 0)],
    flags: [exclude(4, 5)],
    period: period(0, 24),
    // by hand: only run 1 counted (320.625 as worked example); runs 2 and 3 are open and overlap → 2 open
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 29_160, exposureKgDay: 320.625, openRuns: 2 },
  },
  {
    label: "open run starting at the period end is not listed",
    runs: [ref, run(2, 24, null, 0)],
    flags: [],
    period: period(0, 24),
    // by hand: run 2 starts at 24 h = period end, half-open → no overlap; run 1: 356.25
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 32_400, exposureKgDay: 356.25, openRuns: 0 },
  },
  {
    label: "run types filter: calibration run ignored",
    runs: [ref, run(2, 11, 12, 3_000, { type: "calibration" }), run(3, 13, null, 0, { type: "calibration" })],
    flags: [],
    period: period(0, 24),
    // by hand: only run 1 is science → 356.25; the open calibration run is not listed either
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 32_400, exposureKgDay: 356.25, openRuns: 0 },
  },
  {
    label: "run types filter: calibration included when asked",
    runs: [ref, run(2, 11, 12, 3_000, { type: "calibration" })],
    flags: [],
    period: period(0, 24, ["science", "calibration"]),
    // by hand: 32400 + 3000 = 35400 s; 35400 / 86400 × 950 = 389.2361111… (= 356.25 + 3000/86400 × 950)
    expected: { runs: 2, liveSeconds: 35_400, goodLiveSeconds: 35_400, exposureKgDay: (35_400 / 86_400) * 950, openRuns: 0 },
  },
  {
    label: "run ending exactly at the period start is not counted",
    runs: [ref],
    flags: [],
    period: period(10, 20),
    // by hand: [0,10) ∩ [10,20) is empty for half-open spans
    expected: { runs: 0, liveSeconds: 0, goodLiveSeconds: 0, exposureKgDay: 0, openRuns: 0 },
  },
  {
    label: "run starting exactly at the period end is not counted",
    runs: [run(1, 10, 20, 32_400)],
    flags: [],
    period: period(0, 10),
    // by hand: [10,20) ∩ [0,10) is empty
    expected: { runs: 0, liveSeconds: 0, goodLiveSeconds: 0, exposureKgDay: 0, openRuns: 0 },
  },
  {
    label: "two detectors with different masses",
    runs: [ref, run(2, 10, 16, 21_000, { targetMassKg: 12.25 })],
    flags: [],
    period: period(0, 24),
    // by hand: 356.25 + 21000 / 86400 × 12.25 = 356.25 + 257250/86400 = 356.25 + 2.977430555… = 359.227430555…
    expected: { runs: 2, liveSeconds: 53_400, goodLiveSeconds: 53_400, exposureKgDay: 356.25 + 257_250 / 86_400, openRuns: 0 },
  },
  {
    label: "fully excluded run still counted, with zero exposure",
    runs: [ref],
    flags: [exclude(-1, 11)],
    period: period(0, 24),
    // by hand: good time 0 → good live 0, lost 32400
    expected: { runs: 1, liveSeconds: 32_400, goodLiveSeconds: 0, exposureKgDay: 0, openRuns: 0 },
  },
];

const REL = 1e-12; // floating-point slack; the hand values are exact decimals or simple fractions

describe("computePeriodExposure totals", () => {
  it.each(cases)("$label", ({ runs, flags, period: p, expected }) => {
    const { totals } = computePeriodExposure(runs, flags, p);
    expect(totals.runs).toBe(expected.runs);
    expect(totals.openRuns).toBe(expected.openRuns);
    expect(totals.liveSeconds).toBeCloseTo(expected.liveSeconds, 9);
    expect(totals.goodLiveSeconds).toBeCloseTo(expected.goodLiveSeconds, 9);
    // lost = live in period − good live, by definition
    expect(totals.lostLiveSeconds).toBeCloseTo(expected.liveSeconds - expected.goodLiveSeconds, 9);
    expect(Math.abs(totals.exposureKgDay - expected.exposureKgDay)).toBeLessThanOrEqual(REL * expected.exposureKgDay);
    // 1 t·yr = 365 250 kg·day (Julian year, IAU convention)
    expect(totals.exposureTonneYear).toBeCloseTo(expected.exposureKgDay / 365_250, 15);
  });
});

describe("computePeriodExposure rows", () => {
  it("worked example row holds window, good intervals and per-run numbers", () => {
    const { rows } = computePeriodExposure([{ ...ref, id: "q-0001" }], [exclude(4, 5)], period(0, 24));
    expect(rows).toHaveLength(1);
    const row = rows[0]!;
    expect(row.runNumber).toBe(1);
    expect(row.runId).toBe("q-0001");
    expect(row.window).toEqual({ startMs: at(0), endMs: at(10) }); // by hand: whole run inside the period
    expect(row.goodIntervals).toEqual([
      { startMs: at(0), endMs: at(4) }, // by hand: [0,10) h − [4,5) h
      { startMs: at(5), endMs: at(10) },
    ]);
    expect(row.cautionIntervals).toEqual([]);
    expect(row.lostLiveSeconds).toBeCloseTo(3_240, 9); // by hand: 32400 × 1/10
    expect(row.targetMassKg).toBe(950);
    expect(row.exposureKgDay).toBeCloseTo(320.625, 9); // by hand, see worked example
  });

  it("caution intervals touching the window are listed, clipped to it", () => {
    const { rows } = computePeriodExposure([ref], [caution(-3, 1), caution(9, 12), caution(12, 13)], period(0, 24));
    expect(rows[0]!.cautionIntervals).toEqual([
      { startMs: at(0), endMs: at(1) }, // by hand: [-3,1) ∩ [0,10)
      { startMs: at(9), endMs: at(10) }, // by hand: [9,13) ∩ [0,10) (the two caution flags merge first)
    ]);
  });

  it("open runs are returned apart", () => {
    const open = run(7, 12, null, 0);
    const summary = computePeriodExposure([ref, open], [], period(0, 24));
    expect(summary.openRuns).toEqual([open]);
    expect(summary.rows.map((r) => r.runNumber)).toEqual([1]);
  });

  it("nested runs keep the sweep right (a short run inside a long one)", () => {
    // A long background run [0,10) h and a short one [2,3) h inside it; flags at [1,2.5) and [6,7) h.
    const long = run(1, 0, 10, 36_000, { type: "background" });
    const short = run(2, 2, 3, 3_600, { type: "background" });
    const { rows } = computePeriodExposure([short, long], [exclude(1, 2.5), exclude(6, 7)], period(0, 24, ["background"]));
    // by hand: long run good time 10 − 1.5 − 1 = 7.5 h → 36000 × 7.5/10 = 27000 s;
    //          short run good time 1 − 0.5 = 0.5 h → 3600 × 0.5/1 = 1800 s
    expect(rows.map((r) => [r.runNumber, r.goodLiveSeconds])).toEqual([
      [1, 27_000],
      [2, 1_800],
    ]);
  });
});

describe("computePeriodsExposure", () => {
  it("gives the same summaries as one period at a time", () => {
    const runs = [ref, run(2, 30, 40, 30_000), run(3, 50, null, 0)];
    const flags = [exclude(4, 5), exclude(35, 45), caution(31, 32)];
    const periods = [period(0, 24), { ...period(24, 48), name: "second" }, { ...period(0, 48), name: "both" }];
    const all = computePeriodsExposure(runs, flags, periods);
    expect(all).toEqual(periods.map((p) => computePeriodExposure(runs, flags, p)));
    // by hand: second period, run 2 good [30,35) h → 30000 × 5/10 = 15000 s; 15000/86400 × 950 = 164.930555…
    expect(all[1]!.totals.goodLiveSeconds).toBeCloseTo(15_000, 9);
    // by hand: "both" = 29160 + 15000 = 44160 s; run 3 opens at 50 h, after the end (48 h) → not listed
    expect(all[2]!.totals.goodLiveSeconds).toBeCloseTo(44_160, 9);
    expect(all[2]!.totals.openRuns).toBe(0);
  });
});
