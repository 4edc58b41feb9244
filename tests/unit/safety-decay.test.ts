import { describe, it, expect } from "vitest";
import {
  activityAt,
  activitySeries,
  activityWithUncertainty,
  dateActivityReachesMs,
  decayConstant,
  fractionRemaining,
  timeToFractionS,
  type SourceReference,
} from "@/lib/safety/decay";
import { getNuclide } from "@/lib/safety/nuclides";
import { SafetyInputError } from "@/lib/safety/errors";

const YEAR_S = 365.25 * 86_400; // Julian year (IAU)
const HOUR_S = 3_600;
const cs137 = getNuclide("Cs-137"); // 30.08(9) y, ENSDF via NuDat 3 (from memory)
const co60 = getNuclide("Co-60"); // 5.2714(5) y, ENSDF via NuDat 3 (from memory)

describe("fraction remaining, 2^(−t/T½)", () => {
  it.each([
    // 2^(−10/30.08) = exp(−0.230437) = 0.794188 → 79.42 % (decay law; half-life ENSDF/NuDat, from memory)
    { label: "Cs-137 after 10 y", elapsedS: 10 * YEAR_S, halfLifeS: cs137.halfLifeS, expected: 0.79419, digits: 5 },
    // 2^(−5/5.2714) = exp(−0.657461) = 0.518166 → 51.82 % (decay law; half-life ENSDF/NuDat, from memory)
    { label: "Co-60 after 5 y", elapsedS: 5 * YEAR_S, halfLifeS: co60.halfLifeS, expected: 0.51817, digits: 5 },
    { label: "one half-life", elapsedS: 100, halfLifeS: 100, expected: 0.5, digits: 12 }, // definition of half-life
    { label: "three half-lives", elapsedS: 300, halfLifeS: 100, expected: 0.125, digits: 12 }, // (1/2)^3
    { label: "no time", elapsedS: 0, halfLifeS: 100, expected: 1, digits: 12 }, // 2^0
    { label: "one half-life back", elapsedS: -100, halfLifeS: 100, expected: 2, digits: 12 }, // 2^1, back-calculation
  ])("$label → $expected", ({ elapsedS, halfLifeS, expected, digits }) => {
    expect(fractionRemaining(elapsedS, halfLifeS)).toBeCloseTo(expected, digits);
  });

  it("decay constant is ln 2 / T½ (Rn-220: 0.693147/55.6 s = 0.0124667 /s; decay law)", () => {
    expect(decayConstant(55.6)).toBeCloseTo(0.0124667, 7);
  });
});

describe("activity from a certificate", () => {
  const certificate: SourceReference = {
    a0Bq: 370_000, // 10 µCi, an invented Kestrin Deep Site Cs-137 check source
    refMs: Date.UTC(2015, 0, 1),
    halfLifeS: cs137.halfLifeS,
    halfLifeSigmaS: cs137.halfLifeSigmaS,
  };

  it.each([
    // 2015-01-01 → 2025-01-01 is 3653 d (leap days 2016, 2020, 2024; Gregorian calendar):
    // 370 000 × 2^(−3653/(30.08 × 365.25)) = 293 840.4 Bq (decay law)
    { label: "ten calendar years later", atMs: Date.UTC(2025, 0, 1), expected: 293_840.4, digits: 1 },
    { label: "on the reference date", atMs: Date.UTC(2015, 0, 1), expected: 370_000, digits: 6 }, // 2^0
    // one half-life before the reference: twice the certificate value (definition of half-life)
    { label: "one half-life before", atMs: Date.UTC(2015, 0, 1) - cs137.halfLifeS * 1000, expected: 740_000, digits: 4 },
  ])("$label", ({ atMs, expected, digits }) => {
    expect(activityAt(certificate, atMs)).toBeCloseTo(expected, digits);
  });

  it("propagates the half-life uncertainty to first order", () => {
    const atMs = certificate.refMs + 10 * YEAR_S * 1000;
    const { activityBq, sigmaBq } = activityWithUncertainty(certificate, atMs);
    // σA/A = ln2 · Δt · σT / T² = 0.693147 × 10 × 0.09 / 30.08² = 6.8947e-4 (first-order propagation)
    expect(sigmaBq / activityBq).toBeCloseTo(6.8947e-4, 8);
    // Independent check: central difference of A over T½ ± σ, through the plain decay law.
    const up = activityAt({ ...certificate, halfLifeS: cs137.halfLifeS + cs137.halfLifeSigmaS }, atMs);
    const down = activityAt({ ...certificate, halfLifeS: cs137.halfLifeS - cs137.halfLifeSigmaS }, atMs);
    expect(sigmaBq).toBeCloseTo((up - down) / 2, 1);
  });

  it("adds a certificate uncertainty in quadrature", () => {
    const atMs = certificate.refMs + 10 * YEAR_S * 1000;
    const { activityBq, sigmaBq } = activityWithUncertainty({ ...certificate, a0SigmaBq: 0.03 * 370_000 }, atMs);
    // sqrt(0.03² + 0.00068947²) = 0.0300079 (quadrature sum of independent relative uncertainties)
    expect(sigmaBq / activityBq).toBeCloseTo(0.0300079, 7);
  });

  it("has no half-life contribution on the reference date (Δt = 0 in ∂A/∂T½)", () => {
    expect(activityWithUncertainty(certificate, certificate.refMs).sigmaBq).toBe(0);
  });
});

describe("decay waits", () => {
  it.each([
    // log2(100) × 1.83 h = 6.643856 × 1.83 h = 12.158 h (decay law; Kr-83m 1.83 h, ENSDF/NuDat, from memory)
    { label: "Kr-83m to 1 %", id: "Kr-83m", fraction: 0.01, expectedS: 12.15826 * HOUR_S, digits: 0 },
    // log2(1000) × 55.6 s = 9.965784 × 55.6 s = 554.10 s (decay law; Rn-220 55.6 s, ENSDF/NuDat, from memory)
    { label: "Rn-220 to 0.1 %", id: "Rn-220", fraction: 0.001, expectedS: 554.10, digits: 2 },
    { label: "to one half", id: "Rb-83", fraction: 0.5, expectedS: 86.2 * 86_400, digits: 3 }, // definition of half-life
    { label: "no wait for fraction 1", id: "Kr-83m", fraction: 1, expectedS: 0, digits: 9 }, // log2(1) = 0
  ])("$label", ({ id, fraction, expectedS, digits }) => {
    expect(timeToFractionS(fraction, getNuclide(id).halfLifeS)).toBeCloseTo(expectedS, digits);
  });

  it("finds the date a source reaches a limit (1 MBq → 0.25 MBq takes two half-lives; decay law)", () => {
    const ref: SourceReference = { a0Bq: 1e6, refMs: Date.UTC(2020, 5, 1), halfLifeS: co60.halfLifeS };
    expect(dateActivityReachesMs(ref, 0.25e6)).toBeCloseTo(ref.refMs + 2 * co60.halfLifeS * 1000, 0);
  });
});

describe("activity series for charts", () => {
  it("halves at each step when the points are one half-life apart (decay law)", () => {
    const na22 = getNuclide("Na-22");
    const ref: SourceReference = { a0Bq: 8e5, refMs: Date.UTC(2022, 0, 1), halfLifeS: na22.halfLifeS };
    const end = ref.refMs + 4 * na22.halfLifeS * 1000;
    const series = activitySeries(ref, ref.refMs, end, 5);
    expect(series).toHaveLength(5);
    expect(series[0]?.tMs).toBe(ref.refMs);
    expect(series[4]?.tMs).toBe(end);
    // 8e5 × (1, 1/2, 1/4, 1/8, 1/16)
    const expected = [8e5, 4e5, 2e5, 1e5, 5e4];
    series.forEach((p, i) => expect(p.activityBq).toBeCloseTo(expected[i] as number, 4));
  });
});

describe("bad input is a typed error", () => {
  const ok: SourceReference = { a0Bq: 1000, refMs: 0, halfLifeS: 100 };
  it.each([
    { label: "negative activity", run: () => activityAt({ ...ok, a0Bq: -1 }, 0), code: "NEGATIVE", field: "a0Bq" },
    { label: "zero half-life", run: () => activityAt({ ...ok, halfLifeS: 0 }, 0), code: "NOT_POSITIVE", field: "halfLifeS" },
    { label: "NaN date", run: () => activityAt(ok, Number.NaN), code: "NOT_FINITE", field: "atMs" },
    { label: "negative half-life σ", run: () => activityWithUncertainty({ ...ok, halfLifeSigmaS: -1 }, 0), code: "NEGATIVE", field: "halfLifeSigmaS" },
    { label: "fraction 0", run: () => timeToFractionS(0, 100), code: "OUT_OF_RANGE", field: "fraction" },
    { label: "fraction above 1", run: () => timeToFractionS(1.5, 100), code: "OUT_OF_RANGE", field: "fraction" },
    { label: "one-point series", run: () => activitySeries(ok, 0, 10, 1), code: "OUT_OF_RANGE", field: "points" },
    { label: "fractional point count", run: () => activitySeries(ok, 0, 10, 2.5), code: "NOT_INTEGER", field: "points" },
    { label: "series ending before it starts", run: () => activitySeries(ok, 10, 10, 3), code: "BAD_ORDER", field: "endMs" },
    { label: "zero limit", run: () => dateActivityReachesMs(ok, 0), code: "NOT_POSITIVE", field: "limitBq" },
    { label: "empty source never reaches a limit", run: () => dateActivityReachesMs({ ...ok, a0Bq: 0 }, 1), code: "NOT_POSITIVE", field: "a0Bq" },
  ])("$label → $code on $field", ({ run, code, field }) => {
    expect(run).toThrow(SafetyInputError);
    expect(run).toThrow(expect.objectContaining({ code, field }));
  });
});
