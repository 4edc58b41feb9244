import { describe, it, expect } from "vitest";
import {
  BQ_PER_CURIE,
  bqToCurie,
  bqToMicroCurie,
  curieToBq,
  formatBq,
  formatCurie,
  formatSignificant,
  microCurieToBq,
} from "@/lib/safety/activity-units";
import { SafetyInputError } from "@/lib/safety/errors";

describe("curie conversions (1 Ci = 3.7e10 Bq exactly, by definition)", () => {
  it("uses the defined value of the curie", () => {
    expect(BQ_PER_CURIE).toBe(37_000_000_000); // definition of the curie
  });

  it.each([
    { label: "1 µCi", microCurie: 1, bq: 37_000 }, // 1 µCi = 37 kBq (definition of the curie)
    { label: "10 µCi", microCurie: 10, bq: 370_000 }, // 10 × 37 kBq
    { label: "1 mCi", microCurie: 1_000, bq: 3.7e7 }, // 1 mCi = 37 MBq (definition of the curie)
    { label: "0.5 µCi", microCurie: 0.5, bq: 18_500 }, // 0.5 × 37 kBq
  ])("$label = $bq Bq", ({ microCurie, bq }) => {
    expect(microCurieToBq(microCurie)).toBeCloseTo(bq, 6);
    expect(bqToMicroCurie(bq)).toBeCloseTo(microCurie, 9);
  });

  it("1 MBq is 27.027 µCi (1e6 / 37 000; definition of the curie)", () => {
    expect(bqToMicroCurie(1e6)).toBeCloseTo(27.027027, 6);
  });

  it("converts whole curies both ways (1 Ci = 3.7e10 Bq, definition)", () => {
    expect(curieToBq(2)).toBe(7.4e10);
    expect(bqToCurie(3.7e10)).toBe(1);
  });
});

describe("significant-figure formatting", () => {
  it.each([
    { label: "pads to three figures", x: 37, sig: 3, text: "37.0" },
    { label: "rounds into the next decade", x: 9.996, sig: 3, text: "10.0" },
    { label: "small value", x: 0.012345, sig: 3, text: "0.0123" },
    { label: "large value without exponent", x: 123_456, sig: 3, text: "123000" },
    { label: "zero", x: 0, sig: 3, text: "0.00" },
    { label: "negative", x: -2.5, sig: 2, text: "-2.5" },
    { label: "a millionth keeps fixed notation", x: 1.234e-6, sig: 3, text: "0.00000123" },
    { label: "far below a millionth uses an exponent", x: 4.56e-7, sig: 3, text: "4.56e-7" },
    { label: "beyond toFixed's range (a gas weeks after reference)", x: 1e-105, sig: 3, text: "1.00e-105" },
  ])("$label: $x → $text", ({ x, sig, text }) => {
    // Expected strings follow the usual significant-figure rounding (common practice).
    expect(formatSignificant(x, sig)).toBe(text);
  });
});

describe("activity formatting", () => {
  it.each([
    // Expected strings: SI prefixes k = 1e3, M = 1e6, G = 1e9 (SI brochure), three significant figures.
    { label: "below a kBq", bq: 999, text: "999 Bq" },
    { label: "rounds up into kBq", bq: 999.96, text: "1.00 kBq" },
    { label: "1 µCi in Bq units", bq: 37_000, text: "37.0 kBq" },
    { label: "MBq", bq: 1.2345e6, text: "1.23 MBq" },
    { label: "1 Ci in Bq units", bq: 3.7e10, text: "37.0 GBq" },
    { label: "beyond GBq stays in GBq", bq: 5e12, text: "5000 GBq" },
    { label: "sub-becquerel", bq: 0.5, text: "0.500 Bq" },
    { label: "zero", bq: 0, text: "0.00 Bq" },
    { label: "a decayed short-lived gas", bq: 3.2e-120, text: "3.20e-120 Bq" },
  ])("$label: $bq Bq → $text", ({ bq, text }) => {
    expect(formatBq(bq)).toBe(text);
  });

  it("honours a requested number of figures (37 kBq at 2 figures → 37 kBq)", () => {
    expect(formatBq(37_000, 2)).toBe("37 kBq");
  });

  it.each([
    // 1 Ci = 3.7e10 Bq (definition); prefixes n, µ, m (SI brochure).
    { label: "1 µCi", bq: 37_000, text: "1.00 µCi" },
    { label: "1 mCi", bq: 3.7e7, text: "1.00 mCi" },
    { label: "74 MBq", bq: 7.4e7, text: "2.00 mCi" },
    { label: "370 Bq", bq: 370, text: "10.0 nCi" },
    { label: "1 Ci", bq: 3.7e10, text: "1.00 Ci" },
    { label: "just under 1 mCi rounds up", bq: 36_999_000, text: "1.00 mCi" }, // 999.97 µCi at 3 figures
  ])("$label → $text", ({ bq, text }) => {
    expect(formatCurie(bq)).toBe(text);
  });
});

describe("bad input is a typed error", () => {
  it.each([
    { label: "negative activity", run: () => formatBq(-1), code: "NEGATIVE", field: "bq" },
    { label: "NaN activity", run: () => formatCurie(Number.NaN), code: "NOT_FINITE", field: "bq" },
    { label: "zero significant figures", run: () => formatBq(10, 0), code: "OUT_OF_RANGE", field: "sigFigs" },
    { label: "fractional significant figures", run: () => formatSignificant(10, 2.5), code: "NOT_INTEGER", field: "sigFigs" },
    { label: "infinite µCi", run: () => microCurieToBq(Infinity), code: "NOT_FINITE", field: "microCurie" },
  ])("$label → $code", ({ run, code, field }) => {
    expect(run).toThrow(SafetyInputError);
    expect(run).toThrow(expect.objectContaining({ code, field }));
  });
});
