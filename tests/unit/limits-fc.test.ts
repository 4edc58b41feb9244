import { describe, expect, it } from "vitest";
import jStat from "jstat";
import { fc, fcEdges } from "@/lib/limits";
import { acceptanceInterval } from "@/lib/limits/fc-belt";

/**
 * Straightforward Feldman–Cousins construction used as an independent reference: Poisson terms from
 * jstat's ln Γ (its own pdf overflows past k ≈ 150),
 * every count 0..kMax ranked by a full sort at each μ of a fixed grid, edges read off as the first and
 * last grid μ whose acceptance holds n. No background-monotonicity rule.
 */
function referenceEdges(n: number, b: number, cl: number, muFrom: number, muTo: number, step: number) {
  const kMax = Math.ceil(muTo + b + 12 * Math.sqrt(muTo + b + 1) + 20);
  let lower: number | null = null;
  let upper: number | null = null;
  for (let i = 0; muFrom + i * step <= muTo + 1e-12; i++) {
    const mu = muFrom + i * step;
    if (referenceAccepts(n, mu, b, cl, kMax)) {
      lower ??= mu;
      upper = mu;
    }
  }
  return { lower, upper };
}

function lnPoisson(k: number, s: number): number {
  return s === 0 ? (k === 0 ? 0 : -Infinity) : k * Math.log(s) - s - jStat.gammaln(k + 1);
}

function referenceAcceptance(mu: number, b: number, cl: number, kMax: number): number[] {
  const ranked = Array.from({ length: kMax + 1 }, (_, k) => ({
    k,
    p: Math.exp(lnPoisson(k, mu + b)),
    r: Math.exp(lnPoisson(k, mu + b) - lnPoisson(k, Math.max(0, k - b) + b)),
  })).sort((x, y) => y.r - x.r);
  const taken: number[] = [];
  let sum = 0;
  for (const { k, p } of ranked) {
    if (sum >= cl) break;
    taken.push(k);
    sum += p;
  }
  return taken;
}

function referenceAccepts(n: number, mu: number, b: number, cl: number, kMax: number): boolean {
  return referenceAcceptance(mu, b, cl, kMax).includes(n);
}

// Feldman & Cousins, Phys. Rev. D 57, 3873 (1998), Table IV (90 % C.L.), b = 0 column
// (recalled values, as widely reproduced; an independent construction reproduces them).
const TABLE_IV_B0: [number, number][] = [
  [0.0, 2.44], [0.11, 4.36], [0.53, 5.91], [1.1, 7.42], [1.47, 8.6], [1.84, 9.99],
  [2.21, 11.47], [3.56, 12.53], [3.96, 13.99], [4.36, 15.3], [5.5, 16.5],
];

describe("FC Table IV, 90 %, b = 0 column", () => {
  it.each(TABLE_IV_B0.map(([lower, upper], n) => ({ label: `n=${n}`, n, lower, upper })))(
    "$label → [$lower, $upper]",
    ({ n, lower, upper }) => {
      const r = fc(n, 0, 0.9);
      expect(Math.abs(r.lower - lower)).toBeLessThanOrEqual(0.005); // two-decimal table value
      expect(Math.abs((r.upper ?? NaN) - upper)).toBeLessThanOrEqual(0.005);
      expect(r.kind).toBe(n === 0 ? "upper-limit" : "interval");
    },
  );
});

const ROW_B = [0, 0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4, 5];
// FC 1998 Table IV (90 %) and Table VI (95 %), n = 0 row (recalled values, as widely reproduced).
const ROW_90 = [2.44, 1.94, 1.61, 1.33, 1.26, 1.18, 1.08, 1.06, 1.01, 0.98];
const ROW_95 = [3.09, 2.63, 2.33, 2.05, 1.78, 1.78, 1.63, 1.63, 1.57, 1.54];
const rowCases = [
  ...ROW_90.map((upper, i) => ({ label: `90% b=${ROW_B[i]}`, b: ROW_B[i] ?? NaN, cl: 0.9, upper })),
  ...ROW_95.map((upper, i) => ({ label: `95% b=${ROW_B[i]}`, b: ROW_B[i] ?? NaN, cl: 0.95, upper })),
];

describe("FC Tables IV and VI, n = 0 row (needs the background-monotonicity rule)", () => {
  it.each(rowCases)("$label → [0, $upper]", ({ b, cl, upper }) => {
    const r = fc(0, b, cl);
    expect(r.lower).toBe(0);
    // 90 % b = 2: the supremum is 1.2652, reached as b' → 2.324 from above; the paper's finite μ/b'
    // grids land just below it and print 1.26, so this entry needs the ±0.01 of its own rounding.
    const tol = cl === 0.9 && b === 2 ? 0.01 : 0.005;
    expect(Math.abs((r.upper ?? NaN) - upper)).toBeLessThanOrEqual(tol);
  });
});

describe("FC Table IV, other entries", () => {
  it.each([
    { label: "n=10 b=0.5", n: 10, b: 0.5, lower: 5.0, upper: 16.0 }, // FC 1998 Table IV (recalled)
    { label: "n=6 b=3", n: 6, b: 3, lower: 0.15, upper: 8.47 }, // FC 1998 Table IV (recalled)
  ])("$label → [$lower, $upper]", ({ n, b, lower, upper }) => {
    const r = fc(n, b, 0.9);
    expect(Math.abs(r.lower - lower)).toBeLessThanOrEqual(0.005);
    expect(Math.abs((r.upper ?? NaN) - upper)).toBeLessThanOrEqual(0.005);
  });
});

describe("FC plain construction against an independent sort-based construction (0.001 grid)", () => {
  const cases = [
    { label: "n=3 b=1.2 90%", n: 3, b: 1.2, cl: 0.9, to: 9 },
    { label: "n=0 b=2 90%", n: 0, b: 2, cl: 0.9, to: 3 },
    { label: "n=5 b=2.5 95%", n: 5, b: 2.5, cl: 0.95, to: 12 },
    { label: "n=2 b=0.5 68.27%", n: 2, b: 0.5, cl: 0.6827, to: 6 },
    { label: "n=4 b=3 99.9%", n: 4, b: 3, cl: 0.999, to: 14 },
  ];
  it.each(cases)("$label", ({ n, b, cl, to }) => {
    const ref = referenceEdges(n, b, cl, 0, to, 0.001);
    const e = fcEdges(n, b, cl);
    // The reference grid resolves edges to 0.001.
    expect(Math.abs(e.lower - (ref.lower ?? NaN))).toBeLessThanOrEqual(0.0011);
    expect(Math.abs(e.plainUpper - (ref.upper ?? NaN))).toBeLessThanOrEqual(0.0011);
  }, 30_000);

  it("the raised upper end at n=0, b=2 is attained by the plain construction at a larger background", () => {
    const e = fcEdges(0, 2, 0.9);
    const atLargerB = referenceEdges(0, 2.33, 0.9, 0, 2, 0.001); // just past the island's birth at b' ≈ 2.324
    expect(e.plainUpper).toBeLessThan(1.1);
    expect(atLargerB.upper ?? NaN).toBeGreaterThan(e.plainUpper + 0.1);
    expect(e.upper - (atLargerB.upper ?? NaN)).toBeGreaterThanOrEqual(0);
    expect(e.upper - (atLargerB.upper ?? NaN)).toBeLessThanOrEqual(0.005);
  });
});

describe("FC acceptance interval against a full sort", () => {
  const cases = [
    { label: "μ=0 b=0", mu: 0, b: 0, cl: 0.9 },
    { label: "μ=0.7 b=3.6", mu: 0.7, b: 3.6, cl: 0.9 },
    { label: "μ=1.0 b=3.6", mu: 1.0, b: 3.6, cl: 0.9 },
    { label: "μ=2.5 b=0.5", mu: 2.5, b: 0.5, cl: 0.95 },
    { label: "μ=12 b=7", mu: 12, b: 7, cl: 0.6827 },
    { label: "μ=40 b=10", mu: 40, b: 10, cl: 0.999 },
    { label: "μ=0 b=7.5 (counts k ≤ b tie at R = 1)", mu: 0, b: 7.5, cl: 0.9 },
    // Large b, small μ: ~2000 counts below b outrank the upper tail with negligible probability.
    { label: "μ=0.5 b=2000", mu: 0.5, b: 2000, cl: 0.9 },
    { label: "μ=30 b=2000", mu: 30, b: 2000, cl: 0.95 },
  ];
  it.each(cases)("$label", ({ mu, b, cl }) => {
    const ref = referenceAcceptance(mu, b, cl, Math.ceil(mu + b + 20 * Math.sqrt(mu + b + 1) + 50)).sort((x, y) => x - y);
    const got = acceptanceInterval(mu, b, cl);
    expect([got.low, got.high]).toEqual([ref[0], ref[ref.length - 1]]);
    expect(got.probability).toBeGreaterThanOrEqual(cl);
  });
});

describe("FC edge cases", () => {
  it.each([
    { label: "n=0 b=20", n: 0, b: 20, max: 1.5 },
    { label: "n=2 b=15", n: 2, b: 15, max: 2.5 },
  ])("$label: background far above the count still gives a small positive upper end", ({ n, b, max }) => {
    const r = fc(n, b, 0.9);
    expect(r.kind).toBe("upper-limit");
    expect(r.upper ?? NaN).toBeGreaterThan(0);
    expect(r.upper ?? NaN).toBeLessThan(max); // bounded by the n = 0, large-b level of the tables (~1)
  });

  it.each([
    { label: "n=100 b=0 90%", n: 100, b: 0, cl: 0.9, from: 70, to: 135 },
    { label: "n=100 b=50 68.27%", n: 100, b: 50, cl: 0.6827, from: 30, to: 72 },
  ])("$label matches the independent construction (0.005 grid)", ({ n, b, cl, from, to }) => {
    const ref = referenceEdges(n, b, cl, from, to, 0.005);
    const e = fcEdges(n, b, cl);
    expect(Math.abs(e.lower - (ref.lower ?? NaN))).toBeLessThanOrEqual(0.006);
    expect(Math.abs(e.upper - (ref.upper ?? NaN))).toBeLessThanOrEqual(0.006);
  }, 30_000);
});

describe("FC upper end is non-increasing in b", () => {
  const grid = Array.from({ length: 41 }, (_, i) => i * 0.25);
  it.each([0, 1, 2, 3, 4, 5].map((n) => ({ label: `n=${n}`, n })))("$label on b = 0…10 step 0.25", ({ n }) => {
    const uppers = grid.map((b) => fc(n, b, 0.9).upper ?? NaN);
    for (let i = 1; i < uppers.length; i++) expect(uppers[i]).toBeLessThanOrEqual((uppers[i - 1] ?? NaN) + 1e-9);
  });
});
