import { describe, it, expect } from "vitest";
import {
  computePeriodExposure,
  computePeriodsExposure,
  ExposureInputError,
  runQuality,
  type DataQualityPeriod,
  type ExposureFlag,
  type ExposureRun,
} from "@/lib/exposure";

// Every bad record must stop the computation with an ExposureInputError naming it (never a NaN total).
const H = 3_600_000;
const T0 = Date.UTC(2031, 2, 1);
const goodRun: ExposureRun = { number: 1234, type: "science", startMs: T0, endMs: T0 + 10 * H, liveSeconds: 32_400, targetMassKg: 950 };
const goodPeriod: DataQualityPeriod = { name: "first", startMs: T0, endMs: T0 + 24 * H, runTypes: ["science"] };
const flag = (f: Partial<ExposureFlag>): ExposureFlag => ({ id: 7, startMs: T0 + H, endMs: T0 + 2 * H, verdict: "exclude", ...f });

interface BadCase {
  label: string;
  runs?: ExposureRun[];
  flags?: ExposureFlag[];
  period?: DataQualityPeriod;
  record: string;
  field: string;
}

const bad: BadCase[] = [
  { label: "run ends at its start", runs: [{ ...goodRun, endMs: T0 }], record: "run 1234", field: "endMs" },
  { label: "run ends before its start", runs: [{ ...goodRun, endMs: T0 - H }], record: "run 1234", field: "endMs" },
  { label: "negative live time", runs: [{ ...goodRun, liveSeconds: -1 }], record: "run 1234", field: "liveSeconds" },
  // 10 h run = 36 000 s, so 36 001 s of live time is impossible
  { label: "live time above run duration", runs: [{ ...goodRun, liveSeconds: 36_001 }], record: "run 1234", field: "liveSeconds" },
  { label: "NaN live time", runs: [{ ...goodRun, liveSeconds: NaN }], record: "run 1234", field: "liveSeconds" },
  { label: "negative mass", runs: [{ ...goodRun, targetMassKg: -950 }], record: "run 1234", field: "targetMassKg" },
  { label: "NaN mass", runs: [{ ...goodRun, targetMassKg: NaN }], record: "run 1234", field: "targetMassKg" },
  { label: "infinite mass", runs: [{ ...goodRun, targetMassKg: Infinity }], record: "run 1234", field: "targetMassKg" },
  { label: "non-finite run start", runs: [{ ...goodRun, startMs: NaN }], record: "run 1234", field: "startMs" },
  { label: "open run with negative live time", runs: [{ ...goodRun, endMs: null, liveSeconds: -5 }], record: "run 1234", field: "liveSeconds" },
  { label: "flag ends at its start", flags: [flag({ endMs: T0 + H })], record: "flag 7", field: "endMs" },
  { label: "flag ends before its start", flags: [flag({ endMs: T0 })], record: "flag 7", field: "endMs" },
  { label: "flag without id named by position", flags: [flag({}), flag({ id: undefined, endMs: T0 })], record: "flag [1]", field: "endMs" },
  { label: "flag with unknown verdict", flags: [flag({ verdict: "maybe" as never })], record: "flag 7", field: "verdict" },
  { label: "period ends at its start", period: { ...goodPeriod, endMs: T0 }, record: "period first", field: "endMs" },
  { label: "period ends before its start", period: { ...goodPeriod, endMs: T0 - H }, record: "period first", field: "endMs" },
  // validated before computing: this run is of another type and far outside the period, yet still rejected
  {
    label: "bad run that would be ignored anyway",
    runs: [goodRun, { ...goodRun, number: 99, type: "noise", startMs: T0 + 100 * H, endMs: T0 + 99 * H }],
    record: "run 99",
    field: "endMs",
  },
  // likewise a bad flag far from every run
  { label: "bad flag outside every run", flags: [flag({ startMs: T0 + 500 * H, endMs: T0 + 400 * H })], record: "flag 7", field: "endMs" },
];

function caught(fn: () => unknown): unknown {
  try {
    fn();
  } catch (err) {
    return err;
  }
  return undefined;
}

describe("ExposureInputError for bad input", () => {
  it.each(bad)("$label", ({ runs = [goodRun], flags = [], period = goodPeriod, record, field }) => {
    const err = caught(() => computePeriodExposure(runs, flags, period));
    expect(err).toBeInstanceOf(ExposureInputError);
    const e = err as ExposureInputError;
    expect(e.record).toBe(record);
    expect(e.field).toBe(field);
    expect(e.code).toBe("EXPOSURE_INPUT_INVALID");
    expect(e.reason.length).toBeGreaterThan(0);
    expect(e.message).toContain(record);
  });

  it("names the failing period among several", () => {
    const second = { ...goodPeriod, name: "second", endMs: goodPeriod.startMs };
    const err = caught(() => computePeriodsExposure([goodRun], [], [goodPeriod, second])) as ExposureInputError;
    expect(err.record).toBe("period second");
  });

  it("live time equal to the run duration is accepted", () => {
    // 10 h = 36 000 s: a run with no dead time at all is valid; 36000/86400 × 950 = 395.8333…
    const { totals } = computePeriodExposure([{ ...goodRun, liveSeconds: 36_000 }], [], goodPeriod);
    expect(totals.exposureKgDay).toBeCloseTo((36_000 / 86_400) * 950, 9);
  });

  it("runQuality validates its run too", () => {
    expect(caught(() => runQuality({ ...goodRun, liveSeconds: -1 }, []))).toBeInstanceOf(ExposureInputError);
  });
});
