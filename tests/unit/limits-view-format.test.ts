import { describe, expect, it } from "vitest";
import {
  acceptanceText,
  clLabel,
  events,
  grouped,
  kgDayText,
  limitTag,
  muInterval,
  rateText,
  sci,
  superscript,
  tagged,
} from "@/lib/limits-view";

describe("sci: three significant digits, plain between 0.01 and 999", () => {
  it.each([
    // Scientific notation with Unicode superscripts, ×10ⁿ (common practice, SI Brochure §5.4.1 style).
    { label: "4.88e-3 (the worked rate below)", value: 4.88e-3, text: "4.88 × 10⁻³" },
    { label: "1782.42 events/(t·yr)", value: 1782.42, text: "1.78 × 10³" },
    { label: "0.0488 stays plain", value: 0.0488, text: "0.0488" },
    { label: "2.4359 rounds to 2.44", value: 2.4359, text: "2.44" },
    { label: "significant trailing zero kept", value: 0.05, text: "0.0500" },
    { label: "999.6 rounds up into 10³", value: 999.6, text: "1.00 × 10³" },
    { label: "0.00999 → 10⁻³ branch", value: 0.00999, text: "9.99 × 10⁻³" },
    { label: "1.2e-12", value: 1.2e-12, text: "1.20 × 10⁻¹²" },
    { label: "zero", value: 0, text: "0" },
    { label: "negative uses a true minus", value: -0.25, text: "−0.250" },
    { label: "NaN is a dash, never 'NaN'", value: NaN, text: "—" },
    { label: "Infinity is a dash", value: Infinity, text: "—" },
  ])("$label", ({ value, text }) => {
    expect(sci(value)).toBe(text);
  });

  it.each([
    { label: "2 digits, 2.7e-3 (the example in the limits brief)", value: 2.7e-3, sig: 2, text: "2.7 × 10⁻³" },
    { label: "2 digits, 178 falls back from e-notation", value: 178, sig: 2, text: "180" },
  ])("$label", ({ value, sig, text }) => {
    expect(sci(value, sig)).toBe(text);
  });

  it.each([
    { label: "−3", exponent: -3, text: "⁻³" },
    { label: "12", exponent: 12, text: "¹²" },
    { label: "0", exponent: 0, text: "⁰" },
  ])("superscript $label", ({ exponent, text }) => {
    expect(superscript(exponent)).toBe(text);
  });
});

describe("confidence levels and tags", () => {
  it.each([
    // Percent = fraction × 100 (definition); 68.27 % is the one-sigma level (common practice).
    { label: "90 %", cl: 0.9, text: "90 %" },
    { label: "95 %", cl: 0.95, text: "95 %" },
    { label: "68.27 %", cl: 0.6827, text: "68.27 %" },
    { label: "99 %", cl: 0.99, text: "99 %" },
    { label: "typed 99.5 %", cl: 0.995, text: "99.5 %" },
  ])("clLabel $label", ({ cl, text }) => {
    expect(clLabel(cl)).toBe(text);
  });

  it.each([
    { label: "FC 90", method: "fc" as const, cl: 0.9, text: "FC 90 % CL" },
    { label: "classical 95", method: "classical" as const, cl: 0.95, text: "Classical 95 % CL" },
    { label: "Bayes 68.27", method: "bayes" as const, cl: 0.6827, text: "Bayesian 68.27 % CL" },
  ])("limitTag $label", ({ method, cl, text }) => {
    expect(limitTag(method, cl)).toBe(text);
  });

  it("tags a rate the way the page prints it (format of the limits brief)", () => {
    expect(tagged(rateText(0, 2.7e-3, "events/(kg·day)"), "fc", 0.9)).toBe("≤ 2.70 × 10⁻³ events/(kg·day) · FC 90 % CL");
  });
});

describe("events, intervals, exposure and acceptance", () => {
  it.each([
    // Two decimals, as FC 1998 Tables II–IV quote their ends (from memory).
    { label: "upper limit", lower: 0, upper: 2.435915, text: "[0.00, 2.44] events" },
    { label: "two-sided", lower: 5.50108, upper: 16.50047, text: "[5.50, 16.50] events" },
  ])("muInterval $label", ({ lower, upper, text }) => {
    expect(muInterval(lower, upper)).toBe(text);
  });

  it.each([
    { label: "one-sided rate", lower: 0, upper: 4.88e-3, text: "≤ 4.88 × 10⁻³ events/(kg·day)" },
    { label: "two-sided rate", lower: 1.1e-4, upper: 3.3e-4, text: "[1.10 × 10⁻⁴, 3.30 × 10⁻⁴] events/(kg·day)" },
  ])("rateText $label", ({ lower, upper, text }) => {
    expect(rateText(lower, upper, "events/(kg·day)")).toBe(text);
  });

  it.each([
    // Thousands grouped with a narrow no-break space (SI Brochure §5.4.4, common practice).
    { label: "grouped 12345.6", value: 12345.6, digits: 3, text: "12\u202f345.600" },
    { label: "grouped 999", value: 999, digits: 0, text: "999" },
    { label: "grouped −1234.5", value: -1234.5, digits: 1, text: "−1\u202f234.5" },
    { label: "grouped NaN", value: NaN, digits: 2, text: "—" },
  ])("$label", ({ value, digits, text }) => {
    expect(grouped(value, digits)).toBe(text);
  });

  it("kgDayText carries the unit", () => {
    // 950 kg × 12.5 d = 11 875 kg·day (hand arithmetic).
    expect(kgDayText(950 * 12.5)).toBe("11\u202f875.000 kg·day");
  });

  it.each([
    { label: "0.82", value: 0.82, text: "0.82" },
    { label: "1", value: 1, text: "1" },
    { label: "0.123456 to 4 digits", value: 0.123456, text: "0.1235" },
  ])("acceptanceText $label", ({ value, text }) => {
    expect(acceptanceText(value)).toBe(text);
  });

  it("events() of a non-finite number is a dash", () => {
    expect(events(NaN)).toBe("—");
  });
});
