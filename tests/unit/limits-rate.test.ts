import { describe, expect, it } from "vitest";
import { KG_DAY_PER_TONNE_YEAR, backgroundGrid, computeLimit, rateUpper, upperCurve } from "@/lib/limits";

describe("rate upper limit", () => {
  it("1 t·yr is 365 250 kg·day (common practice: 1000 kg × 365.25 d)", () => {
    expect(KG_DAY_PER_TONNE_YEAR).toBe(365_250);
  });

  it.each([
    // Quillon, 950 kg fiducial × 100 live days, 50 % acceptance, μ_up = 2.3026:
    // 2.3026 / (0.5 × 95 000) = 4.8476e-5 /(kg·day) and × 365 250 = 17.706 /(t·yr) (hand arithmetic).
    { label: "Quillon 100 d", mu: 2.3026, acc: 0.5, exposure: 95_000, perKgDay: 4.8476e-5, perTonneYear: 17.706 },
    // Quillon-Ge, 12.25 kg × 200 d = 2450 kg·day, 80 % acceptance, μ_up = 3.89:
    // 3.89 / 1960 = 1.98469e-3 /(kg·day) and × 365 250 = 724.91 /(t·yr) (hand arithmetic).
    { label: "Quillon-Ge 200 d", mu: 3.89, acc: 0.8, exposure: 2450, perKgDay: 1.98469e-3, perTonneYear: 724.91 },
    // Exactly one tonne·year at full acceptance: the per-t·yr rate is μ_up itself (definition of the unit).
    { label: "1 t·yr, acceptance 1", mu: 2.44, acc: 1, exposure: 365_250, perKgDay: 2.44 / 365_250, perTonneYear: 2.44 },
  ])("$label", ({ mu, acc, exposure, perKgDay, perTonneYear }) => {
    const r = rateUpper(mu, acc, exposure);
    expect(r.perKgDay / perKgDay).toBeCloseTo(1, 4);
    expect(r.perTonneYear / perTonneYear).toBeCloseTo(1, 4);
  });

  it.each([
    { label: "acceptance 0", mu: 2.3, acc: 0, exposure: 100, field: "acceptance" },
    { label: "acceptance 1.2", mu: 2.3, acc: 1.2, exposure: 100, field: "acceptance" },
    { label: "exposure 0", mu: 2.3, acc: 0.5, exposure: 0, field: "exposure" },
    { label: "exposure -5", mu: 2.3, acc: 0.5, exposure: -5, field: "exposure" },
    { label: "exposure Infinity", mu: 2.3, acc: 0.5, exposure: Infinity, field: "exposure" },
    { label: "upper NaN", mu: NaN, acc: 0.5, exposure: 100, field: "upper" },
  ])("$label is a typed error", ({ mu, acc, exposure, field }) => {
    expect(() => rateUpper(mu, acc, exposure)).toThrow(expect.objectContaining({ name: "LimitInputError", field }));
  });
});

describe("computeLimit dispatches to each method", () => {
  it.each([
    { label: "classical n=0 b=0 90%", method: "classical", n: 0, b: 0, cl: 0.9, upper: 2.3026 }, // −ln 0.1 (analytic)
    { label: "fc n=0 b=0 90%", method: "fc", n: 0, b: 0, cl: 0.9, upper: 2.44 }, // FC 1998 Table IV (recalled)
    { label: "bayes n=0 b=5 90%", method: "bayes", n: 0, b: 5, cl: 0.9, upper: 2.3026 }, // −ln 0.1 (analytic)
  ] as const)("$label", ({ method, n, b, cl, upper }) => {
    const r = computeLimit(method, n, b, cl);
    expect(r).toMatchObject({ method, observed: n, background: b, cl, lower: 0 });
    expect(Math.abs((r.upper ?? NaN) - upper)).toBeLessThanOrEqual(0.005);
  });
});

describe("upper-end curve over a background grid", () => {
  it("backgroundGrid gives evenly spaced points without accumulated rounding", () => {
    expect(backgroundGrid(0, 1, 0.1)).toEqual([0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1]);
  });

  it("FC curve for n = 0 follows the 90 % table row", () => {
    // FC 1998 Table IV, n = 0 (recalled): b = 0, 1, 3, 5 → 2.44, 1.61, 1.08, 0.98.
    const curve = upperCurve("fc", 0, 0.9, [0, 1, 3, 5]);
    expect(curve.map((p) => p.background)).toEqual([0, 1, 3, 5]);
    [2.44, 1.61, 1.08, 0.98].forEach((u, i) => expect(Math.abs((curve[i]?.upper ?? NaN) - u)).toBeLessThanOrEqual(0.005));
  });

  it("classical curve turns to null where the limit comes out negative", () => {
    // s(n=2, 90 %) = 5.32 (PDG table): μ_up = 5.32 − b, positive below b = 5.32 only.
    const curve = upperCurve("classical", 2, 0.9, [0, 5, 6]);
    expect(curve[0]?.upper ?? NaN).toBeCloseTo(5.3223, 3);
    expect(curve[1]?.upper ?? NaN).toBeCloseTo(0.3223, 3);
    expect(curve[2]?.upper).toBeNull();
  });

  it.each([
    { label: "empty grid", grid: [] as number[] },
    { label: "negative background", grid: [0, -1] },
    { label: "NaN background", grid: [NaN] },
  ])("$label is a typed error", ({ grid }) => {
    expect(() => upperCurve("bayes", 1, 0.9, grid)).toThrow(expect.objectContaining({ field: "backgrounds" }));
  });
});
