import { describe, it, expect } from "vitest";
import {
  computePeriodExposure,
  cumulativeExposureSeries,
  dailyLiveFraction,
  exposureOverTime,
  kgDayToTonneYear,
  KG_DAY_PER_TONNE_YEAR,
  liveSecondsToKgDay,
  runQualities,
  runQuality,
  SECONDS_PER_DAY,
  tonneYearToKgDay,
  type ExposureFlag,
  type ExposureRun,
} from "@/lib/exposure";

const H = 3_600_000;
const T0 = Date.UTC(2031, 2, 1); // 2031-03-01T00:00Z
const at = (hours: number) => T0 + hours * H;
const run = (number: number, fromH: number, toH: number | null, liveSeconds: number): ExposureRun => ({
  number,
  type: "science",
  startMs: at(fromH),
  endMs: toH === null ? null : at(toH),
  liveSeconds,
  targetMassKg: 950,
});
const flag = (fromH: number, toH: number, verdict: "exclude" | "caution" = "exclude"): ExposureFlag => ({
  startMs: at(fromH),
  endMs: at(toH),
  verdict,
});

describe("units", () => {
  it.each([
    // Julian year of 365.25 days (IAU convention, common practice): 1 t·yr = 1000 kg × 365.25 d = 365 250 kg·day
    { label: "constant", value: KG_DAY_PER_TONNE_YEAR, expected: 365_250 },
    { label: "365 250 kg·day → 1 t·yr", value: kgDayToTonneYear(365_250), expected: 1 },
    { label: "1 t·yr → 365 250 kg·day", value: tonneYearToKgDay(1), expected: 365_250 },
    { label: "2.5 t·yr → 913 125 kg·day", value: tonneYearToKgDay(2.5), expected: 913_125 }, // by hand: 2.5 × 365250
    { label: "seconds per day", value: SECONDS_PER_DAY, expected: 86_400 }, // common practice: 24 × 3600
    { label: "one live day on 1000 kg", value: liveSecondsToKgDay(86_400, 1000), expected: 1000 }, // by hand: 1 d × 1000 kg
  ])("$label", ({ value, expected }) => {
    expect(value).toBeCloseTo(expected, 9);
  });
});

describe("runQuality", () => {
  const r = run(1, 0, 10, 32_400);
  it.each([
    { label: "open run", target: run(2, 0, null, 0), flags: [flag(1, 2)], expected: "open" },
    { label: "no flags", target: r, flags: [], expected: "good" },
    { label: "flag covers the whole run", target: r, flags: [flag(-1, 11)], expected: "excluded" },
    { label: "two flags together cover the run", target: r, flags: [flag(0, 6), flag(5, 10)], expected: "excluded" },
    { label: "flag inside the run", target: r, flags: [flag(4, 5)], expected: "partly excluded" },
    { label: "flag across the run end", target: r, flags: [flag(9, 12)], expected: "partly excluded" },
    { label: "caution covering the run", target: r, flags: [flag(-1, 11, "caution")], expected: "good" },
    { label: "flag touching the run end only", target: r, flags: [flag(10, 12)], expected: "good" }, // half-open: no shared time
    { label: "flag far away", target: r, flags: [flag(100, 101)], expected: "good" },
  ] as const)("$label → $expected", ({ target, flags, expected }) => {
    expect(runQuality(target, flags)).toBe(expected);
  });

  it("batch form gives the same answers in input order", () => {
    const runs = [run(3, 20, 30, 0), r, run(4, 40, null, 0)];
    const flags = [flag(4, 5), flag(19, 31)];
    expect(runQualities(runs, flags)).toEqual(["excluded", "partly excluded", "open"]);
  });
});

describe("dailyLiveFraction", () => {
  // Run across UTC midnight: 2031-03-01T20:00Z → 2031-03-02T04:00Z (8 h), 7 h = 25 200 s live.
  const night = run(1, 20, 28, 25_200);
  const period = { name: "march", startMs: at(0), endMs: at(48), runTypes: ["science"] };

  it.each([
    {
      label: "no flags: split 4 h / 4 h",
      flags: [],
      // by hand: 25200 × 4/8 = 12600 s each day; 12600 / 86400 = 0.1458333…
      expected: [12_600, 12_600],
    },
    {
      label: "1 h excluded after midnight: split by good time 4 h / 3 h",
      flags: [flag(26, 27)],
      // by hand: good live = 25200 × 7/8 = 22050 s; day 1: 22050 × 4/7 = 12600, day 2: 22050 × 3/7 = 9450
      expected: [12_600, 9_450],
    },
  ])("$label", ({ flags, expected }) => {
    const days = dailyLiveFraction(computePeriodExposure([night], flags, period));
    expect(days.map((d) => d.dayStartMs)).toEqual([at(0), at(24)]); // UTC midnights of 1 and 2 March
    days.forEach((d, i) => {
      expect(d.goodLiveSeconds).toBeCloseTo(expected[i]!, 9);
      expect(d.liveFraction).toBeCloseTo(expected[i]! / 86_400, 12);
    });
  });

  it("period starting mid-day still buckets by UTC day", () => {
    const days = dailyLiveFraction(computePeriodExposure([night], [], { ...period, startMs: at(22), endMs: at(26) }));
    // by hand: window [22,26) h: 2 h on 1 March, 2 h on 2 March; 25200 × 2/8 = 6300 s each
    expect(days.map((d) => [d.dayStartMs, d.goodLiveSeconds])).toEqual([
      [at(0), 6_300],
      [at(24), 6_300],
    ]);
  });
});

describe("cumulativeExposureSeries", () => {
  it("steps at each run's window end and ends at the period total", () => {
    // Runs 1 [0,10) h and 2 [12,22) h each 32400 s live; run 3 [40,60) h outlasts the period [0,48) h.
    const runs = [run(1, 0, 10, 32_400), run(2, 12, 22, 32_400), run(3, 40, 60, 36_000)];
    const { summary, cumulative } = exposureOverTime(runs, [flag(4, 5)], { name: "p", startMs: at(0), endMs: at(48), runTypes: ["science"] });
    // by hand: run 1 320.625 (worked example); run 2 32400/86400 × 950 = 356.25;
    //          run 3 window [40,48) h → good live 36000 × 8/20 = 14400 s → 14400/86400 × 950 = 158.3333…
    const expected = [
      [at(10), 320.625],
      [at(22), 320.625 + 356.25],
      [at(48), 320.625 + 356.25 + (14_400 / 86_400) * 950],
    ];
    expect(cumulative).toHaveLength(3);
    cumulative.forEach((p, i) => {
      expect(p.timeMs).toBe(expected[i]![0]);
      expect(p.cumulativeKgDay).toBeCloseTo(expected[i]![1]!, 9);
    });
    expect(cumulative[2]!.cumulativeKgDay).toBeCloseTo(summary.totals.exposureKgDay, 9);
  });

  it("runs ending at the same time share one point", () => {
    const summary = computePeriodExposure([run(1, 0, 10, 3_600), run(2, 5, 10, 3_600)], [], {
      name: "p",
      startMs: at(0),
      endMs: at(24),
      runTypes: ["science"],
    });
    // by hand: 3600/86400 × 950 × 2 = 79.1666… kg·day at 10 h
    expect(cumulativeExposureSeries(summary)).toEqual([{ timeMs: at(10), cumulativeKgDay: expect.closeTo((3_600 / 86_400) * 950 * 2, 9) }]);
  });
});
