import { describe, expect, it } from "vitest";
import { chartBackgrounds, CL_CHOICES, isClChoice, parseClPercent, upperCurveData, CURVE_STEPS } from "@/lib/limits-view";
import { countingPatchFromForm, limitRequestSchema } from "@/components/limits/inputs";

describe("parseClPercent", () => {
  it.each([
    // Percent / 100 (definition).
    { label: "90", text: "90", cl: 0.9 },
    { label: "90 %", text: "90 %", cl: 0.9 },
    { label: "68.27%", text: "68.27%", cl: 0.6827 },
    { label: "decimal comma 99,5", text: "99,5", cl: 0.995 },
    { label: "padded", text: "  95 ", cl: 0.95 },
  ])("$label → $cl", ({ text, cl }) => {
    expect(parseClPercent(text)).toBe(cl);
  });

  it.each([
    { label: "100", text: "100" },
    { label: "0", text: "0" },
    { label: "negative", text: "-5" },
    { label: "empty", text: "" },
    { label: "words", text: "ninety" },
  ])("$label is a typed error on field cl", ({ text }) => {
    expect(() => parseClPercent(text)).toThrow(expect.objectContaining({ name: "LimitInputError", field: "cl" }));
  });

  it("offers 90, 95, 68.27 and 99 % (the levels the limits brief asks for)", () => {
    expect(CL_CHOICES).toEqual([0.9, 0.95, 0.6827, 0.99]);
    expect(isClChoice(0.6827)).toBe(true);
    expect(isClChoice(0.8)).toBe(false);
  });
});

describe("chart backgrounds: 0 … max(2b, 5), recorded b included", () => {
  it.each([
    // max(2 × 1.3, 5) = 5 (hand arithmetic); 1.3 is not on the 5/60 grid, so it is added.
    { label: "b = 1.3", b: 1.3, to: 5, count: CURVE_STEPS + 2 },
    // max(2 × 4, 5) = 8; 4 = 30 × 8/60 lies on the grid.
    { label: "b = 4", b: 4, to: 8, count: CURVE_STEPS + 1 },
    { label: "no b", b: null, to: 5, count: CURVE_STEPS + 1 },
  ])("$label", ({ b, to, count }) => {
    const grid = chartBackgrounds(b);
    expect(grid[0]).toBe(0);
    expect(grid.at(-1)).toBeCloseTo(to, 9);
    expect(grid).toHaveLength(count);
    if (b !== null) expect(grid).toContain(b);
    expect([...grid].sort((x, y) => x - y)).toEqual(grid);
  });

  it("marks the curve at the recorded b only, on the FC value there", () => {
    const curve = upperCurveData("fc", 0, 0.9, 0);
    // FC 1998 Table IV (90 %), n = 0, b = 0 → 2.44 (from memory).
    expect(curve.marker[0]).toBeCloseTo(2.44, 2);
    expect(curve.marker.filter((v) => v !== null)).toHaveLength(1);
  });

  it("classical curve has gaps where there is no limit", () => {
    // n = 0: classical μ_up = 2.3026 − b ≤ 0 for b ≥ 2.3026 (analytic), so the last point (b = 5) is a gap.
    const curve = upperCurveData("classical", 0, 0.9, null);
    expect(curve.upper.at(-1)).toBeNull();
    expect(curve.upper[0]).toBeCloseTo(2.3026, 4);
  });
});

describe("request and form parsing", () => {
  it.each([
    { label: "cl = 1", body: { n: 3, b: 1.2, cl: 1, method: "fc" }, field: "cl" },
    { label: "n = -1", body: { n: -1, b: 1.2, cl: 0.9, method: "fc" }, field: "n" },
    { label: "n = 2.5", body: { n: 2.5, b: 1.2, cl: 0.9, method: "fc" }, field: "n" },
    { label: "b missing", body: { n: 3, cl: 0.9, method: "fc" }, field: "b" },
    { label: "method unknown", body: { n: 3, b: 1.2, cl: 0.9, method: "cls" }, field: "method" },
  ])("POST body: $label names $field", ({ body, field }) => {
    const parsed = limitRequestSchema.safeParse(body);
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues[0]?.path).toEqual([field]);
  });

  it.each([
    { label: "full form", f: { observed: "2", background: "1.3", backgroundNote: " model v3 ", clPercent: "90", method: "fc" }, patch: { observed: 2, background: 1.3, backgroundNote: "model v3", cl: 0.9, method: "fc" } },
    { label: "blind form (count not submitted)", f: { background: "1,1", backgroundNote: "model", clPercent: "95 %", method: "bayes" }, patch: { background: 1.1, backgroundNote: "model", cl: 0.95, method: "bayes" } },
    { label: "emptied fields clear", f: { observed: "", background: "", backgroundNote: "  " }, patch: { observed: null, background: null, backgroundNote: null } },
  ])("form: $label", ({ f, patch }) => {
    expect(countingPatchFromForm(f)).toEqual({ ok: true, patch });
  });

  it.each([
    { label: "count 2.5", f: { observed: "2.5" }, field: "observed" },
    { label: "count abc", f: { observed: "abc" }, field: "observed" },
    { label: "negative background", f: { background: "-1" }, field: "background" },
    { label: "CL 100 %", f: { clPercent: "100" }, field: "cl" },
    { label: "method unknown", f: { method: "neyman" }, field: "method" },
  ])("form refuses $label on $field", ({ f, field }) => {
    expect(countingPatchFromForm(f)).toMatchObject({ ok: false, field });
  });
});
