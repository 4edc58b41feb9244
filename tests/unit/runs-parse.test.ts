import { describe, expect, it } from "vitest";
import {
  conditionsFromText,
  decodeCursor,
  encodeCursor,
  parseCloseRequest,
  parseConfigRequest,
  parseInstant,
  parseListQuery,
  parseOpenRequest,
  RunInputError,
  utcFromFormInput,
} from "@/lib/runs";

/** The field a parse is refused on, or null when it is accepted. */
function refusedOn(fn: () => unknown): string | null {
  try {
    fn();
    return null;
  } catch (err) {
    if (err instanceof RunInputError) return err.field;
    throw err;
  }
}

const VALID_OPEN = { number: 41_234, type: "science", start: "2026-11-03T12:00:00Z" };

describe("parseOpenRequest", () => {
  it("accepts the minimal request and fills the defaults", () => {
    expect(parseOpenRequest(VALID_OPEN)).toEqual({
      number: 41_234,
      type: "science",
      startMs: Date.UTC(2026, 10, 3, 12), // ECMAScript Date.UTC for 2026-11-03T12:00Z
      detector: "Quillon", // the default detector of the DAQ API
      conditions: {},
      targetMassOverrideKg: null,
    });
  });

  it.each([
    { label: "override as decimal text keeps its digits", value: "948.50", expected: "948.5" }, // trailing zero dropped, value exact
    { label: "override as a JSON number", value: 12.25, expected: "12.25" },
    { label: "four decimals (the column's scale)", value: "949.1234", expected: "949.1234" },
  ])("$label", ({ value, expected }) => {
    expect(parseOpenRequest({ ...VALID_OPEN, targetMassOverrideKg: value }).targetMassOverrideKg).toBe(expected);
  });

  it.each([
    { label: "unknown run type", body: { ...VALID_OPEN, type: "physics" }, field: "type" },
    { label: "missing type", body: { number: 1, start: VALID_OPEN.start }, field: "type" },
    { label: "missing start", body: { number: 1, type: "science" }, field: "start" },
    { label: "start without a zone", body: { ...VALID_OPEN, start: "2026-11-03T12:00:00" }, field: "start" },
    { label: "start in seconds, not ms, of year 2100+", body: { ...VALID_OPEN, start: 5_000_000_000_000 }, field: "start" }, // 5e12 ms ≈ year 2128
    { label: "fractional milliseconds", body: { ...VALID_OPEN, start: 1.5 }, field: "start" },
    { label: "run number 0", body: { ...VALID_OPEN, number: 0 }, field: "number" },
    { label: "run number 1.5", body: { ...VALID_OPEN, number: 1.5 }, field: "number" },
    { label: "run number as text", body: { ...VALID_OPEN, number: "41234" }, field: "number" },
    { label: "run number beyond 32 bits", body: { ...VALID_OPEN, number: 2_147_483_648 }, field: "number" }, // INT max 2^31 − 1 (MariaDB docs)
    { label: "unknown detector", body: { ...VALID_OPEN, detector: "Quillon-2" }, field: "detector" },
    { label: "misspelt field", body: { ...VALID_OPEN, condition: {} }, field: "condition" },
    { label: "nested condition value", body: { ...VALID_OPEN, conditions: { hv: { kv: 16 } } }, field: "conditions.hv" },
    { label: "zero override", body: { ...VALID_OPEN, targetMassOverrideKg: 0 }, field: "targetMassOverrideKg" },
    { label: "negative override", body: { ...VALID_OPEN, targetMassOverrideKg: "-1" }, field: "targetMassOverrideKg" },
    { label: "five decimals would be rounded", body: { ...VALID_OPEN, targetMassOverrideKg: "948.12345" }, field: "targetMassOverrideKg" },
    { label: "not an object", body: [VALID_OPEN], field: "body" },
  ])("refuses $label", ({ body, field }) => {
    expect(refusedOn(() => parseOpenRequest(body))).toBe(field);
  });
});

describe("parseCloseRequest", () => {
  const base = { end: "2026-11-03T13:00:00.000Z", liveSeconds: 3474.5, deadSeconds: 120, triggerCount: 26_000 };
  it("defaults the status to ended and keeps live time to the millisecond", () => {
    expect(parseCloseRequest({ ...base, liveSeconds: 3474.12345 })).toEqual({
      endMs: Date.UTC(2026, 10, 3, 13), // ECMAScript Date.UTC
      liveSeconds: 3474.123, // rounded to the DECIMAL(14,3) column's millisecond
      deadSeconds: 120,
      triggerCount: 26_000,
      status: "ended",
    });
  });
  it.each([
    { label: "status running", body: { ...base, status: "running" }, field: "status" },
    { label: "negative trigger count", body: { ...base, triggerCount: -1 }, field: "triggerCount" },
    { label: "fractional trigger count", body: { ...base, triggerCount: 1.5 }, field: "triggerCount" },
    { label: "live time as text", body: { ...base, liveSeconds: "3474" }, field: "liveSeconds" },
    { label: "missing dead time", body: { end: base.end, liveSeconds: 1, triggerCount: 1 }, field: "deadSeconds" },
    { label: "missing end", body: { liveSeconds: 1, deadSeconds: 1, triggerCount: 1 }, field: "end" },
  ])("refuses $label", ({ body, field }) => {
    expect(refusedOn(() => parseCloseRequest(body))).toBe(field);
  });
});

describe("parseConfigRequest", () => {
  it("keeps the fiducial mass as an exact decimal", () => {
    const c = parseConfigRequest({ detector: "Quillon", name: "Quillon after grid repair", targetMaterial: "xenon", fiducialMassKg: "948.5", effectiveFrom: 0 });
    expect(c.fiducialMassKg).toBe("948.5");
    expect(c.effectiveFromMs).toBe(0); // the epoch
  });
  it.each([
    { label: "mass missing", body: { detector: "Quillon", name: "x y", targetMaterial: "xenon", effectiveFrom: 0 }, field: "fiducialMassKg" },
    { label: "name too short", body: { detector: "Quillon", name: "x", targetMaterial: "xenon", fiducialMassKg: 1, effectiveFrom: 0 }, field: "name" },
    { label: "detector unknown", body: { detector: "Kestrel", name: "xy", targetMaterial: "xenon", fiducialMassKg: 1, effectiveFrom: 0 }, field: "detector" },
  ])("refuses $label", ({ body, field }) => {
    expect(refusedOn(() => parseConfigRequest(body))).toBe(field);
  });
});

describe("parseInstant", () => {
  it.each([
    { label: "Z", text: "2026-03-01T12:00:00Z", ms: Date.UTC(2026, 2, 1, 12) },
    { label: "+02:00 offset", text: "2026-03-01T12:00:00+02:00", ms: Date.UTC(2026, 2, 1, 10) }, // ISO 8601: local = UTC + offset
    { label: "milliseconds kept", text: "2026-03-01T12:00:00.123Z", ms: Date.UTC(2026, 2, 1, 12, 0, 0, 123) },
    { label: "no seconds", text: "2026-03-01T12:00Z", ms: Date.UTC(2026, 2, 1, 12) },
    { label: "29 February of a leap year", text: "2028-02-29T00:00:00Z", ms: Date.UTC(2028, 1, 29) }, // 2028 is divisible by 4, not by 100 (Gregorian rule)
  ])("reads $label", ({ text, ms }) => {
    expect(parseInstant(text, "start")).toBe(ms);
  });
  it.each([
    { label: "not a calendar date", value: "2026-02-30T12:00:00Z" },
    { label: "29 February of a common year", value: "2026-02-29T12:00:00Z" }, // 2026 is not divisible by 4 (Gregorian rule)
    { label: "hour 24", value: "2026-03-01T24:00:00Z" }, // ISO 8601-1:2019 drops 24:00; refused here (common practice)
    { label: "a date only", value: "2026-03-01" },
    { label: "negative ms", value: -1 },
    { label: "null", value: null },
  ])("refuses $label", ({ value }) => {
    expect(refusedOn(() => parseInstant(value, "start"))).toBe("start");
  });
});

describe("parseListQuery", () => {
  it.each([
    { label: "limit 200 is the largest page", q: "limit=200", field: null },
    { label: "limit 201", q: "limit=201", field: "limit" },
    { label: "limit 0", q: "limit=0", field: "limit" },
    { label: "to before from", q: "from=2026-11-05&to=2026-11-04", field: "to" },
    { label: "unknown status", q: "status=paused", field: "status" },
    { label: "a made-up cursor", q: "cursor=abc", field: "cursor" },
  ])("$label", ({ q, field }) => {
    expect(refusedOn(() => parseListQuery(new URLSearchParams(q)))).toBe(field);
  });
  it("reads a date-only bound as that day's UTC midnight and defaults the limit", () => {
    const q = parseListQuery(new URLSearchParams("from=2026-11-05&type=calibration"));
    expect(q).toMatchObject({ fromMs: Date.UTC(2026, 10, 5), toMs: null, type: "calibration", limit: 50 });
  });
  it("round-trips a cursor", () => {
    const c = { startMs: Date.UTC(2026, 10, 5, 7, 20), id: 4711 };
    expect(decodeCursor(encodeCursor(c))).toEqual(c);
  });
});

describe("form helpers", () => {
  it("reads conditions one per line, numbers as numbers", () => {
    expect(conditionsFromText("drift field [kV/cm] = 0.23\n\nsource: Cs-137\ncathode voltage [kV] = -16.1")).toEqual({
      "drift field [kV/cm]": 0.23,
      source: "Cs-137",
      "cathode voltage [kV]": -16.1,
    });
  });
  it.each([
    { label: "no separator", text: "drift field 0.23" },
    { label: "no value", text: "source =" },
    { label: "a name twice", text: "a = 1\na = 2" },
  ])("refuses conditions with $label", ({ text }) => {
    expect(refusedOn(() => conditionsFromText(text))).toBe("conditions");
  });
  it.each([
    { label: "datetime-local with seconds", value: "2026-11-03T12:00:05", expected: "2026-11-03T12:00:05Z" },
    { label: "datetime-local without seconds", value: "2026-11-03T12:00", expected: "2026-11-03T12:00:00Z" },
    { label: "already zoned", value: "2026-11-03T12:00:00+01:00", expected: "2026-11-03T12:00:00+01:00" },
    { label: "empty", value: " ", expected: undefined },
  ])("form time: $label", ({ value, expected }) => {
    expect(utcFromFormInput(value)).toBe(expected);
  });
});
