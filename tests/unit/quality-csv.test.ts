import { describe, it, expect } from "vitest";
import { csvField, csvLine, EXPOSURE_CSV_COLUMNS, exportFileName, exposureCsv, goodRunList, goodRunsCsv, intervalsField } from "@/components/exposure/csv";
import { computePeriodReport } from "@/components/exposure/compute";
import { days, fixed, kgDay, signed, tonneYear } from "@/components/exposure/format";
import type { ReportPeriod } from "@/components/exposure/report";

describe("CSV fields and lines (RFC 4180)", () => {
  it.each([
    { label: "plain text stays bare", value: "science", csv: "science" },
    { label: "a comma forces quotes (RFC 4180 §2.6)", value: "Science run A, part 1", csv: '"Science run A, part 1"' },
    { label: "quotes are doubled inside quotes (RFC 4180 §2.7)", value: 'the "good" runs', csv: '"the ""good"" runs"' },
    { label: "a line break forces quotes (RFC 4180 §2.6)", value: "line one\nline two", csv: '"line one\nline two"' },
    // shortest round-trip form of a double (ECMAScript Number::toString)
    { label: "a number in round-trip form", value: 76.84606481481481, csv: "76.84606481481481" },
    { label: "null is an empty field", value: null, csv: "" },
  ])("$label", ({ value, csv }) => {
    expect(csvField(value)).toBe(csv);
  });

  it("refuses a non-finite number instead of writing NaN", () => {
    expect(() => csvField(Number.NaN)).toThrow(TypeError);
  });

  it("ends a record with CRLF (RFC 4180 §2.1)", () => {
    expect(csvLine(["a", 1, null, "b,c"])).toBe('a,1,,"b,c"\r\n');
  });
});

// A 10 h run with 9 h live on 950 kg and a 1 h excluding flag: good live 29 160 s, 320.625 kg·day (by hand).
const H = 3_600_000;
const T0 = Date.UTC(2032, 4, 1);
const iso = (h: number) => new Date(T0 + h * H).toISOString();
const period: ReportPeriod = { id: 42, name: "Science run A, hand check", startAt: iso(0), endAt: iso(24), runTypes: ["science"], signalAcceptance: 0.82, blind: false };
const { report } = computePeriodReport(period, {
  runs: [
    { number: 7, type: "science", startMs: T0, endMs: T0 + 10 * H, liveSeconds: 32_400, targetMassKg: 950 },
    { number: 8, type: "science", startMs: T0 + 12 * H, endMs: T0 + 13 * H, liveSeconds: 3_600, targetMassKg: 950 },
    { number: 9, type: "science", startMs: T0 + 20 * H, endMs: null, liveSeconds: 0, targetMassKg: 950 },
  ],
  withoutLiveTime: new Map(),
  confirmed: [
    { startMs: T0 + 4 * H, endMs: T0 + 5 * H, verdict: "exclude" },
    { startMs: T0 + 12 * H, endMs: T0 + 13 * H, verdict: "exclude" },
  ],
  proposed: [],
});

describe("exposure CSV", () => {
  const lines = exposureCsv(report).split("\r\n");

  it("starts with the header row", () => {
    expect(lines[0]).toBe(EXPOSURE_CSV_COLUMNS.join(","));
  });

  it("writes one run line with every step of the arithmetic", () => {
    // by hand: duration 36 000 s, window 36 000 s, good 32 400 s, live 32 400 s → good live 29 160 s, lost 3 240 s, 320.625 kg·day
    expect(lines[1]).toBe(`run,7,science,${iso(0)},${iso(10)},36000,32400,${iso(0)},${iso(10)},36000,32400,32400,29160,3240,950,320.625,,`);
  });

  it("lists the open run apart and ends with the totals line and a final CRLF", () => {
    expect(lines[3]).toBe(`open,9,science,${iso(20)},,,,,,,,,,,,,,`);
    // totals by hand: live 36 000 s, good live 29 160 s, lost 6 840 s, 320.625 kg·day = 320.625 / 365 250 t·yr
    expect(lines[4]).toBe(`total,,science,,,,,${iso(0)},${iso(24)},,,36000,29160,6840,,320.625,${320.625 / 365_250},2`);
    expect(lines[5]).toBe("");
    expect(lines).toHaveLength(6);
  });

  it("good-run list: run 8 is fully excluded, so only run 7 remains, with its two good pieces", () => {
    const list = goodRunList(report);
    expect(list.map((g) => g.runNumber)).toEqual([7]);
    expect(goodRunsCsv(list)).toBe(`run_number,good_intervals_utc,good_live_s\r\n7,${iso(0)}/${iso(4)} ${iso(5)}/${iso(10)},29160\r\n`);
  });

  it("writes ISO 8601 intervals as start/end (ISO 8601-1 §5.5.2)", () => {
    expect(intervalsField([{ start: "2032-05-01T00:00:00.000Z", end: "2032-05-01T01:00:00.000Z" }])).toBe("2032-05-01T00:00:00.000Z/2032-05-01T01:00:00.000Z");
  });

  it.each([
    { label: "spaces and punctuation become dashes", name: "Science run B (post-repair)", id: 3, file: "exposure-science-run-b-post-repair-3.csv" },
    { label: "a name without letters still gives a name", name: "→→", id: 9, file: "exposure-period-9.csv" },
  ])("file name: $label", ({ name, id, file }) => {
    expect(exportFileName(name, id, "exposure", "csv")).toBe(file);
  });
});

describe("number formatting on the exposure pages", () => {
  it.each([
    // SI brochure (BIPM, 9th ed., §5.4.4): digits grouped in threes with a thin space
    { label: "groups thousands with a narrow space", got: fixed(1234567.891, 2), want: "1\u202f234\u202f567.89" },
    { label: "kg·day to three decimals", got: kgDay(320.625), want: "320.625 kg·day" },
    { label: "tonne·year to five decimals (365 250 kg·day = 1 t·yr)", got: tonneYear(365_250 / 365_250), want: "1.00000 t·yr" },
    { label: "days from seconds (86 400 s = 1 d)", got: days(129_600), want: "1.5000 d" },
    { label: "a drop is signed with a true minus", got: signed(-35.625, 3), want: "−35.625" },
    { label: "no change is shown as ±0", got: signed(-0.0001, 3), want: "±0.000" },
    { label: "non-finite values show a dash, never NaN", got: fixed(Number.NaN, 2), want: "—" },
  ])("$label", ({ got, want }) => {
    expect(got).toBe(want);
  });
});
