import { describe, it, expect } from "vitest";
import { computePeriodReport, listedApartReaches, previewTotals, thinPoints, type LoadedInputs } from "@/components/exposure/compute";
import { iso as fastIso } from "@/components/exposure/report";
import { computePeriodExposure, sortRunsByStart } from "@/lib/exposure";
import { alignByDay, valueAt } from "@/components/exposure/compare";
import type { ReportPeriod } from "@/components/exposure/report";
import type { ExposureFlag, ExposureRun } from "@/lib/exposure";

// Invented ledger (Quillon, 950 kg; 948.5 kg after the grid repair). Arithmetic by hand, the formulas of the
// product brief: good live = DAQ live × good time / duration; exposure = good live / 86 400 × mass [kg·day].
const H = 3_600_000;
const T0 = Date.UTC(2032, 4, 1); // 2032-05-01T00:00Z
const at = (h: number) => T0 + h * H;
const iso = (h: number) => new Date(at(h)).toISOString();

const period: ReportPeriod = { id: 1, name: "hand check", startAt: iso(0), endAt: iso(20), runTypes: ["science"], signalAcceptance: 0.8, blind: false };

const runA: ExposureRun = { number: 1, type: "science", startMs: at(0), endMs: at(10), liveSeconds: 32_400, targetMassKg: 950 };
const runB: ExposureRun = { number: 2, type: "science", startMs: at(18), endMs: at(22), liveSeconds: 14_000, targetMassKg: 948.5 };
const calib: ExposureRun = { number: 3, type: "calibration", startMs: at(11), endMs: at(12), liveSeconds: 3_000, targetMassKg: 950 };
const open: ExposureRun = { number: 4, type: "science", startMs: at(19), endMs: null, liveSeconds: 0, targetMassKg: 950 };
const noLive: ExposureRun = { number: 5, type: "science", startMs: at(12), endMs: null, liveSeconds: 0, targetMassKg: 950 };

const confirmed: ExposureFlag[] = [
  { id: 10, startMs: at(4), endMs: at(5), verdict: "exclude" },
  { id: 11, startMs: at(6), endMs: at(8), verdict: "caution" },
];
const proposed: ExposureFlag[] = [
  { id: 12, startMs: at(18.5), endMs: at(19), verdict: "exclude" },
  { id: 13, startMs: at(1), endMs: at(2), verdict: "caution" }, // caution: never changes the preview
];
const inputs: LoadedInputs = { runs: [runB, open, runA, calib, noLive], withoutLiveTime: new Map([[5, at(13)]]), confirmed, proposed };

describe("period report from loaded runs and flags", () => {
  const { report } = computePeriodReport(period, inputs, { preview: true, now: new Date(at(30)) });

  it.each([
    // by hand: 32 400 × 9/10 = 29 160 s; 29 160 / 86 400 × 950 = 320.625 kg·day
    { label: "run 1, 1 h excluded of 10 h", n: 1, goodSeconds: 32_400, goodLive: 29_160, liveInPeriod: 32_400, kgDay: 320.625 },
    // by hand: window 18–20 h of an 18–22 h run: 14 000 × 2/4 = 7 000 s; 7 000 / 86 400 × 948.5 = 76.846064814… kg·day
    { label: "run 2, half inside the period", n: 2, goodSeconds: 7_200, goodLive: 7_000, liveInPeriod: 7_000, kgDay: (7_000 / 86_400) * 948.5 },
  ])("$label", ({ n, goodSeconds, goodLive, liveInPeriod, kgDay }) => {
    const row = report.runs.find((r) => r.runNumber === n)!;
    expect(row.goodSeconds).toBe(goodSeconds);
    expect(row.goodLiveSeconds).toBeCloseTo(goodLive, 9);
    expect(row.liveSecondsInPeriod).toBeCloseTo(liveInPeriod, 9);
    expect(row.exposureKgDay).toBeCloseTo(kgDay, 9);
  });

  it("carries each run's own start, end, duration and DAQ live time beside the arithmetic", () => {
    const row = report.runs.find((r) => r.runNumber === 2)!;
    expect([row.runStart, row.runEnd, row.windowStart, row.windowEnd]).toEqual([iso(18), iso(22), iso(18), iso(20)]);
    expect(row.runDurationSeconds).toBe(4 * 3600); // 4 h run
    expect(row.daqLiveSeconds).toBe(14_000);
    expect(row.windowSeconds).toBe(2 * 3600); // the part inside the period
  });

  it("shows caution time per run without removing it", () => {
    const row = report.runs.find((r) => r.runNumber === 1)!;
    expect(row.cautionIntervals).toEqual([{ start: iso(6), end: iso(8) }]);
    expect(row.goodIntervals).toEqual([{ start: iso(0), end: iso(4) }, { start: iso(5), end: iso(10) }]);
  });

  it("totals: calibration run not counted, open and no-live-time runs listed apart", () => {
    expect(report.totals.runs).toBe(2);
    // by hand: 320.625 + 76.846064814… kg·day
    expect(report.totals.exposureKgDay).toBeCloseTo(320.625 + (7_000 / 86_400) * 948.5, 9);
    expect(report.openRuns).toEqual([
      { runNumber: 5, runType: "science", runStart: iso(12), state: "no live time" },
      { runNumber: 4, runType: "science", runStart: iso(19), state: "running" },
    ]);
  });

  it("previews the proposed excluding flags only", () => {
    // by hand: 30 min more excluded in run 2: 14 000 × 1.5/4 = 5 250 s, i.e. 1 750 s less good live;
    // change = −1 750 / 86 400 × 948.5 = −19.211516203… kg·day
    expect(report.preview?.proposedExcludingFlags).toBe(1);
    expect(report.preview?.changeKgDay).toBeCloseTo(-(1_750 / 86_400) * 948.5, 9);
    expect(report.preview?.goodLiveSeconds).toBeCloseTo(29_160 + 5_250, 9);
  });

  it("without proposals the preview equals the current exposure", () => {
    const { report: r } = computePeriodReport(period, { ...inputs, proposed: [] }, { preview: true });
    expect(r.preview).toMatchObject({ proposedExcludingFlags: 0, changeKgDay: 0 });
  });
});

describe("which runs listed apart belong to a period", () => {
  const p = { name: "p", startMs: at(10), endMs: at(20), runTypes: ["science"] };
  const openAt = (h: number): ExposureRun => ({ number: 9, type: "science", startMs: at(h), endMs: null, liveSeconds: 0, targetMassKg: 950 });
  it.each([
    // an open run covers its start up to now (by definition of "still running")
    { label: "open run that started inside the period, now later", run: openAt(12), now: at(30), end: undefined, reaches: true },
    { label: "open run that started before the period, now inside it", run: openAt(5), now: at(15), end: undefined, reaches: true },
    { label: "open run that started before a period lying wholly after now", run: openAt(5), now: at(8), end: undefined, reaches: false },
    { label: "open run starting after the period", run: openAt(21), now: at(30), end: undefined, reaches: false },
    { label: "closed without live time, its real span ends before the period", run: openAt(5), now: at(30), end: at(9), reaches: false },
    { label: "closed without live time, its real span overlaps the period", run: openAt(5), now: at(30), end: at(11), reaches: true },
  ])("$label", ({ run, now, end, reaches }) => {
    expect(listedApartReaches(run, p, now, end)).toBe(reaches);
  });
});

describe("chart helpers", () => {
  it.each([
    { label: "fewer points than the limit are kept as they are", n: 5, max: 10, expected: [1, 2, 3, 4, 5] },
    // last of each bucket of 2.5: indices round(2.5)−1=2, round(5)−1=4, round(7.5)−1=7, 10−1=9
    { label: "thinning keeps the last point of each bucket and the very last point", n: 10, max: 4, expected: [3, 5, 8, 10] },
  ])("$label", ({ n, max, expected }) => {
    expect(thinPoints(Array.from({ length: n }, (_, i) => i + 1), max)).toEqual(expected);
  });

  const curve = { t: [100, 200, 300], kgDay: [1, 3, 6] };
  it.each([
    { label: "before the first step", t: 50, v: 0 },
    { label: "exactly on a step", t: 200, v: 3 },
    { label: "between steps", t: 250, v: 3 },
    { label: "after the last step", t: 999, v: 6 },
  ])("step curve value $label", ({ t, v }) => {
    expect(valueAt(curve, t)).toBe(v); // read off the step curve by hand
  });

  it("aligns two periods by days since start; the shorter stops (null) after its end", () => {
    const [grid, a, b] = alignByDay(
      { startSec: 0, lengthDays: 2, curve: { t: [86_400, 172_800], kgDay: [10, 20] } },
      { startSec: 1_000_000, lengthDays: 1, curve: { t: [1_000_000 + 43_200], kgDay: [5] } },
      4,
    );
    // grid of 4 steps over 2 days: 0, 0.5, 1, 1.5, 2 d
    expect(grid).toEqual([0, 0.5, 1, 1.5, 2]);
    expect(a).toEqual([0, 0, 10, 10, 20]);
    expect(b).toEqual([0, 5, 5, null, null]);
  });
});

describe("the preview recomputes only the runs the proposed flags touch", () => {
  // Reference: the same ledger recomputed in full by lib/exposure with confirmed + proposed flags.
  let seed = 7;
  const rnd = () => ((seed = (seed * 16_807) % 2_147_483_647) / 2_147_483_647);
  const ledgerRuns: ExposureRun[] = Array.from({ length: 400 }, (_, i) => ({
    number: 1000 + i, type: i % 7 === 0 ? "calibration" : "science", startMs: at(i), endMs: at(i + 0.9), liveSeconds: 3000 * rnd(), targetMassKg: i % 50 === 0 ? 948.5 : 950,
  }));
  const flagAt = (verdict: "exclude" | "caution"): ExposureFlag => {
    const s = at(rnd() * 400);
    return { startMs: s, endMs: s + rnd() * 3 * H, verdict };
  };
  const conf = Array.from({ length: 60 }, () => flagAt(rnd() < 0.8 ? "exclude" : "caution"));
  const prop = Array.from({ length: 25 }, () => flagAt(rnd() < 0.8 ? "exclude" : "caution"));
  const dq = { name: "ref", startMs: at(10), endMs: at(390), runTypes: ["science"] };

  it("gives the full recompute's exposure and good live time", () => {
    const current = computePeriodExposure(ledgerRuns, conf, dq);
    const full = computePeriodExposure(ledgerRuns, [...conf, ...prop.filter((f) => f.verdict === "exclude")], dq);
    const quick = previewTotals(sortRunsByStart(ledgerRuns), { confirmed: conf, proposed: prop }, dq, current);
    expect(quick.proposedExcludingFlags).toBe(prop.filter((f) => f.verdict === "exclude").length);
    expect(quick.exposureKgDay).toBeCloseTo(full.totals.exposureKgDay, 8);
    expect(quick.goodLiveSeconds).toBeCloseTo(full.totals.goodLiveSeconds, 8);
    expect(full.totals.exposureKgDay).toBeLessThan(current.totals.exposureKgDay); // the proposals do remove time
  });
});

describe("ISO times in the report", () => {
  it.each([
    { label: "an ordinary instant", ms: Date.UTC(2032, 4, 1, 13, 5, 9, 42) },
    { label: "midnight", ms: Date.UTC(2032, 0, 1) },
    { label: "the last millisecond of a leap day", ms: Date.UTC(2032, 1, 29, 23, 59, 59, 999) },
    { label: "before 1970 (negative time value)", ms: Date.UTC(1969, 11, 31, 23, 0, 0, 5) },
    { label: "a fractional millisecond is dropped", ms: Date.UTC(2032, 4, 1) + 0.75 },
  ])("writes $label exactly as Date#toISOString (ECMAScript reference)", ({ ms }) => {
    expect(fastIso(ms)).toBe(new Date(ms).toISOString());
  });
});
