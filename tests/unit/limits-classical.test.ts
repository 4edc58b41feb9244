import { describe, expect, it } from "vitest";
import jStat from "jstat";
import { classical, classicalTotalMean } from "@/lib/limits";

// Particle Data Group, Review of Particle Physics, "Statistics" section, table of Poisson upper limits
// for n observed with b = 0 (from memory; the same numbers follow from s = ½ χ²⁻¹(CL; 2n + 2)).
const PDG_90 = [2.3, 3.89, 5.32, 6.68, 7.99, 9.27, 10.53, 11.77, 12.99, 14.21, 15.41];
const PDG_95 = [3.0, 4.74, 6.3, 7.75, 9.15, 10.51, 11.84, 13.15, 14.43, 15.71, 16.96];

const pdgCases = [
  ...PDG_90.map((upper, n) => ({ label: `PDG 90% n=${n}`, n, cl: 0.9, upper })),
  ...PDG_95.map((upper, n) => ({ label: `PDG 95% n=${n}`, n, cl: 0.95, upper })),
];

describe("classical upper limit, b = 0, against the PDG table", () => {
  it.each(pdgCases)("$label → $upper", ({ n, cl, upper }) => {
    const r = classical(n, 0, cl);
    expect(r.kind).toBe("upper-limit");
    expect(r.lower).toBe(0);
    // Table values are printed to two decimals.
    expect(Math.abs((r.upper ?? NaN) - upper)).toBeLessThanOrEqual(0.005);
  });
});

// Independent reference library: jstat's chi-square inverse, μ_up = ½ χ²⁻¹(CL; 2(n+1)) − b.
const jstatCases = [
  { label: "n=0 b=0 90%", n: 0, b: 0, cl: 0.9 },
  { label: "n=3 b=1.2 90%", n: 3, b: 1.2, cl: 0.9 },
  { label: "n=5 b=2.5 95%", n: 5, b: 2.5, cl: 0.95 },
  { label: "n=12 b=4 68.27%", n: 12, b: 4, cl: 0.6827 },
  { label: "n=7 b=0.3 99.9%", n: 7, b: 0.3, cl: 0.999 },
  { label: "n=100 b=30 90%", n: 100, b: 30, cl: 0.9 },
  { label: "n=1000 b=200 95%", n: 1000, b: 200, cl: 0.95 },
];

describe("classical upper limit against jstat's chi-square quantile", () => {
  it.each(jstatCases)("$label", ({ n, b, cl }) => {
    const reference = jStat.chisquare.inv(cl, 2 * (n + 1)) / 2 - b; // jstat (npm), independent implementation
    expect(classical(n, b, cl).upper).toBeCloseTo(reference, 5);
  });

  it.each(jstatCases)("$label: the defining tail probability P(N ≤ n | s) is 1 − CL", ({ n, cl }) => {
    const s = classicalTotalMean(n, cl);
    // P(N ≤ n | s) = 1 − F_χ²(2s; 2n + 2) (common practice identity), evaluated with jstat's χ² CDF.
    expect(1 - jStat.chisquare.cdf(2 * s, 2 * (n + 1))).toBeCloseTo(1 - cl, 7);
  });
});

describe("classical upper limit when the background exceeds what was seen", () => {
  const cases = [
    // s(0, 90%) = 2.303 < 20 and s(2, 90%) = 5.322 < 15 (PDG table above), so s − b is negative.
    { label: "n=0 b=20", n: 0, b: 20, raw: 2.3026 - 20 },
    { label: "n=2 b=15", n: 2, b: 15, raw: 5.3223 - 15 },
  ];
  it.each(cases)("$label gives no limit, flagged with a note", ({ n, b, raw }) => {
    const r = classical(n, b, 0.9);
    expect(r.kind).toBe("no-limit");
    expect(r.upper).toBeNull();
    expect(r.rawUpper).toBeCloseTo(raw, 3);
    expect(r.note).toMatch(/not a limit/);
  });
});
