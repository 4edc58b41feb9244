import { describe, expect, it } from "vitest";
import type { LimitResult } from "@/lib/limits";
import { BLIND_TEXT, periodLimitView, rateOf, visibleInput, type PeriodLimitInput } from "@/lib/limits-view";

const upperOnly = (upper: number, lower = 0): LimitResult => ({ method: "fc", observed: 0, background: 0, cl: 0.9, kind: lower > 0 ? "interval" : "upper-limit", lower, upper });

describe("rate conversion rate_up = μ_up / (acceptance × exposure)", () => {
  it.each([
    // μ_up = 2.44 (FC 1998 Table IV, n = 0, b = 0, from memory), acceptance 0.5, 1000 kg·day:
    // 2.44 / (0.5 × 1000) = 4.88e-3 events/(kg·day); × 365 250 kg·day per t·yr = 1782.42 events/(t·yr) (hand arithmetic).
    { label: "worked case 2.44 / (0.5 × 1000)", upper: 2.44, lower: 0, acc: 0.5, exposure: 1000, perKgDay: 4.88e-3, perTonneYear: 1782.42, lowKgDay: 0 },
    // Quillon-Ge, 12.25 kg × 40 d = 490 kg·day at acceptance 0.8 → 392 kg·day; μ = [5.50, 16.50] (FC Table IV n = 10,
    // b = 0, from memory): 16.50 / 392 = 0.0420918, 5.50 / 392 = 0.0140306; × 365 250 = 15 374.0 (hand arithmetic).
    { label: "two-sided interval", upper: 16.5, lower: 5.5, acc: 0.8, exposure: 490, perKgDay: 0.0420918, perTonneYear: 15374.0, lowKgDay: 0.0140306 },
  ])("$label", ({ upper, lower, acc, exposure, perKgDay, perTonneYear, lowKgDay }) => {
    const { rate, rateNote } = rateOf(upperOnly(upper, lower), acc, exposure);
    expect(rateNote).toBeNull();
    expect(rate!.upperPerKgDay / perKgDay).toBeCloseTo(1, 5);
    expect(rate!.upperPerTonneYear / perTonneYear).toBeCloseTo(1, 5);
    if (lowKgDay === 0) expect(rate!.lowerPerKgDay).toBe(0);
    else expect(rate!.lowerPerKgDay / lowKgDay).toBeCloseTo(1, 5);
  });

  it.each([
    { label: "exposure unknown", acc: 0.5, exposure: null, note: /cannot be computed/ },
    { label: "exposure 0 (no good live time)", acc: 0.5, exposure: 0, note: /no good live time/ },
    { label: "acceptance 0", acc: 0, exposure: 1000, note: /acceptance is 0/ },
    { label: "acceptance above 1 (lib/limits refuses it)", acc: 1.5, exposure: 1000, note: /acceptance must be in \(0, 1\]/ },
  ])("no rate when $label, with the reason in words", ({ acc, exposure, note }) => {
    const { rate, rateNote } = rateOf(upperOnly(2.44), acc, exposure);
    expect(rate).toBeNull();
    expect(rateNote).toMatch(note);
  });
});

const base: PeriodLimitInput = { blind: false, observed: 0, background: 0, acceptance: 0.5, exposureKgDay: 1000 };

describe("periodLimitView", () => {
  it("blind: nothing is computed, whatever the inputs", () => {
    expect(periodLimitView({ ...base, blind: true, observed: 5 }, "fc", 0.9)).toEqual({ state: "blind" });
    // The wording the page and API use (limits brief).
    expect(BLIND_TEXT).toBe("Blind — count hidden until unblinding");
  });

  it.each([
    { label: "no n", input: { ...base, observed: null }, missing: ["observed"] },
    { label: "no b", input: { ...base, background: null }, missing: ["background"] },
    { label: "neither", input: { ...base, observed: null, background: null }, missing: ["observed", "background"] },
  ])("awaiting when $label", ({ input, missing }) => {
    expect(periodLimitView(input, "fc", 0.9)).toEqual({ state: "awaiting", missing });
  });

  it.each([
    // FC 1998 Table IV (90 %), from memory: n=0 b=0 → 2.44; n=3 b=2.0 → 5.42.
    { label: "FC n=0 b=0", method: "fc" as const, n: 0, b: 0, upper: 2.44 },
    { label: "FC n=3 b=2", method: "fc" as const, n: 3, b: 2, upper: 5.42 },
    // Classical n=0: μ_up = −ln(0.1) − b = 2.3026 − b (analytic).
    { label: "classical n=0 b=0.3", method: "classical" as const, n: 0, b: 0.3, upper: 2.0026 },
  ])("computed $label: μ and rate agree", ({ method, n, b, upper }) => {
    const view = periodLimitView({ ...base, observed: n, background: b }, method, 0.9);
    if (view.state !== "computed") throw new Error(`expected computed, got ${view.state}`);
    expect(view.result.upper!).toBeCloseTo(upper, 2);
    // rate = μ_up / (0.5 × 1000 kg·day) (definition).
    expect(view.rate!.upperPerKgDay).toBeCloseTo(view.result.upper! / 500, 12);
  });

  it("classical no-limit keeps the note and gives no rate", () => {
    // Classical n=0, b=3: 2.3026 − 3 = −0.697 ≤ 0 (analytic), so no limit.
    const view = periodLimitView({ ...base, observed: 0, background: 3 }, "classical", 0.9);
    if (view.state !== "computed") throw new Error("expected computed");
    expect(view.result.kind).toBe("no-limit");
    expect(view.result.note).toMatch(/not a limit on the signal/);
    expect(view.rate).toBeNull();
    expect(view.rateNote).toBeNull();
  });

  it("a calculator refusal becomes a 'refused' view naming the field", () => {
    // lib/limits caps Feldman–Cousins at n + b ≤ 200 000 (MAX_FC_TOTAL).
    const view = periodLimitView({ ...base, observed: 100, background: 250_000 }, "fc", 0.9);
    expect(view).toMatchObject({ state: "refused", field: "background" });
  });
});

describe("visibleInput withholds n while blind", () => {
  it.each([
    { label: "blind with a stored n", blind: true, stored: 7, shown: null },
    { label: "not blind", blind: false, stored: 7, shown: 7 },
    { label: "not blind, nothing stored", blind: false, stored: null, shown: null },
  ])("$label", ({ blind, stored, shown }) => {
    const v = visibleInput({ blind, observedCount: stored, expectedBackground: 1.1, signalAcceptance: 0.8, exposureKgDay: 10 });
    expect(v.observed).toBe(shown);
    expect(v.background).toBe(1.1);
  });
});
