import { describe, expect, it } from "vitest";
import { computeLimit } from "@/lib/limits";
import { combinePeriods, combinedLimitView, type CombinablePeriod } from "@/lib/limits-view";

const period = (id: number, over: Partial<CombinablePeriod>): CombinablePeriod => ({
  id, name: `P${id}`, blind: false, observed: 1, background: 0.5, acceptance: 0.8, exposureKgDay: 100, ...over,
});

describe("combinePeriods", () => {
  it.each([
    {
      label: "two periods",
      periods: [period(1, { observed: 2, background: 1.3, acceptance: 0.82, exposureKgDay: 1000 }), period(2, { observed: 1, background: 0.7, acceptance: 0.8, exposureKgDay: 500 })],
      // n = 2 + 1 = 3; b = 1.3 + 0.7 = 2.0; Σ acc × exp = 0.82 × 1000 + 0.8 × 500 = 820 + 400 = 1220 kg·day (hand arithmetic).
      n: 3, b: 2.0, accExp: 1220, included: [1, 2], leftOut: [] as number[],
    },
    {
      label: "blind and unrecorded periods stay out",
      periods: [
        period(1, { observed: 2, background: 1.3, acceptance: 0.82, exposureKgDay: 1000 }),
        period(2, { blind: true, observed: null, background: 1.1 }),
        period(3, { observed: null, background: null }),
        period(4, { observed: 4, background: null }),
        period(5, { observed: 4, background: 1, exposureKgDay: null }),
      ],
      // Only period 1 counts: n = 2, b = 1.3, Σ acc × exp = 0.82 × 1000 = 820 (hand arithmetic).
      n: 2, b: 1.3, accExp: 820, included: [1], leftOut: [2, 3, 4, 5],
    },
    {
      label: "b sums without binary noise",
      periods: [period(1, { background: 0.1 }), period(2, { background: 0.2 })],
      // 0.1 + 0.2 = 0.3 (decimal arithmetic; plain doubles give 0.30000000000000004).
      n: 2, b: 0.3, accExp: 160, included: [1, 2], leftOut: [],
    },
    { label: "nothing at all", periods: [], n: 0, b: 0, accExp: 0, included: [], leftOut: [] },
  ])("$label", ({ periods, n, b, accExp, included, leftOut }) => {
    const combo = combinePeriods(periods);
    expect(combo.observed).toBe(n);
    expect(combo.background).toBe(b);
    expect(combo.acceptanceExposureKgDay).toBeCloseTo(accExp, 9);
    expect(combo.included.map((p) => p.id)).toEqual(included);
    expect(combo.leftOut.map((p) => p.id)).toEqual(leftOut);
  });

  it("says why each period is left out", () => {
    const combo = combinePeriods([
      period(2, { blind: true, observed: null }),
      period(3, { observed: null }),
      period(4, { background: null }),
      period(5, { exposureKgDay: null }),
    ]);
    expect(combo.leftOut.map((p) => p.why)).toEqual(["blind", "no count recorded", "no background recorded", "exposure cannot be computed"]);
  });
});

describe("combinedLimitView", () => {
  it("treats the combination as one counting experiment over Σ acceptance × exposure", () => {
    const combo = combinePeriods([
      period(1, { observed: 2, background: 1.3, acceptance: 0.82, exposureKgDay: 1000 }),
      period(2, { observed: 1, background: 0.7, acceptance: 0.8, exposureKgDay: 500 }),
    ]);
    const view = combinedLimitView(combo, "fc", 0.9);
    if (view.state !== "computed") throw new Error(`expected computed, got ${view.state}`);
    // FC 1998 Table IV (90 %), n = 3, b = 2.0 → μ_up = 5.42 (from memory); 5.42 / 1220 = 4.443e-3 (hand arithmetic).
    expect(view.result.upper!).toBeCloseTo(5.42, 2);
    expect(view.rate!.upperPerKgDay).toBeCloseTo(4.443e-3, 5);
    // The same limit as asking lib/limits for (3, 2.0) directly (no extra factor applied).
    expect(view.result.upper).toBe(computeLimit("fc", 3, 2.0, 0.9).upper);
  });

  it("with no period that can take part, it waits", () => {
    expect(combinedLimitView(combinePeriods([period(1, { blind: true })]), "fc", 0.9).state).toBe("awaiting");
  });
});
