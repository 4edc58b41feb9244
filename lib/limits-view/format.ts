/**
 * Text for the limits pages: numbers with their units, and the method and confidence level that go beside
 * every computed number ("≤ 2.7 × 10⁻³ events/(kg·day) · FC 90 % CL"). The same on server and client.
 */
import type { LimitMethod } from "../limits";

/** Short method names used in tags beside numbers. */
export const METHOD_SHORT: Record<LimitMethod, string> = { fc: "FC", classical: "Classical", bayes: "Bayesian" };

/** Full method names used in selectors and headings. */
export const METHOD_LONG: Record<LimitMethod, string> = {
  fc: "Feldman–Cousins (unified)",
  classical: "Classical (Neyman)",
  bayes: "Bayesian (flat prior)",
};

/** Rate units, as printed after a rate. */
export const RATE_UNIT = { perKgDay: "events/(kg·day)", perTonneYear: "events/(t·yr)" } as const;

const SUPERSCRIPT: Record<string, string> = {
  "0": "⁰", "1": "¹", "2": "²", "3": "³", "4": "⁴", "5": "⁵", "6": "⁶", "7": "⁷", "8": "⁸", "9": "⁹", "-": "⁻",
};

/** An integer written in superscript digits, e.g. −3 → "⁻³". */
export function superscript(exponent: number): string {
  return String(exponent).split("").map((c) => SUPERSCRIPT[c] ?? c).join("");
}

/**
 * A number to `sig` significant digits: plain between 0.01 and 999 (e.g. "2.44", "0.0488"), otherwise as
 * "4.88 × 10⁻³". "—" when not finite, so a missing value never prints as NaN.
 */
export function sci(value: number, sig = 3): string {
  if (!Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const sign = value < 0 ? "−" : "";
  const [mantissa = "0", exp = "0"] = Math.abs(value).toExponential(sig - 1).split("e");
  const exponent = Number(exp);
  if (exponent >= -2 && exponent <= 2) {
    // toPrecision keeps significant trailing zeros ("0.0500"); it only switches to e-notation when sig ≤ exponent.
    const plain = Math.abs(value).toPrecision(sig);
    return sign + (plain.includes("e") ? String(Number(plain)) : plain);
  }
  return `${sign}${mantissa} × 10${superscript(exponent)}`;
}

/** A confidence level as a percentage, e.g. 0.9 → "90 %", 0.6827 → "68.27 %". */
export function clLabel(cl: number): string {
  return `${Number((cl * 100).toFixed(4))} %`;
}

/** The tag that follows every computed number, e.g. "FC 90 % CL". */
export function limitTag(method: LimitMethod, cl: number): string {
  return `${METHOD_SHORT[method]} ${clLabel(cl)} CL`;
}

/** Events with two decimals, as the published limit tables quote them, e.g. 2.435 → "2.44". */
export function events(value: number): string {
  return Number.isFinite(value) ? value.toFixed(2) : "—";
}

/** The μ interval, e.g. "[0.00, 2.44] events". */
export function muInterval(lower: number, upper: number): string {
  return `[${events(lower)}, ${events(upper)}] events`;
}

/** A rate bound or interval with its unit: "≤ 4.88 × 10⁻³ events/(kg·day)" or "[1.2 × 10⁻⁴, 4.88 × 10⁻³] events/(kg·day)". */
export function rateText(lower: number, upper: number, unit: string): string {
  return lower > 0 ? `[${sci(lower)}, ${sci(upper)}] ${unit}` : `≤ ${sci(upper)} ${unit}`;
}

/** A number followed by its tag, e.g. "≤ 4.88 × 10⁻³ events/(kg·day) · FC 90 % CL". */
export function tagged(text: string, method: LimitMethod, cl: number): string {
  return `${text} · ${limitTag(method, cl)}`;
}

const GROUP = "\u202f";

/** `value` with `digits` decimals and thousands grouped by a narrow space, e.g. 12345.6 → "12 345.600"; "—" when not finite. */
export function grouped(value: number, digits: number): string {
  if (!Number.isFinite(value)) return "—";
  const [whole = "0", frac] = Math.abs(value).toFixed(digits).split(".");
  const sign = value < 0 && Number(value.toFixed(digits)) !== 0 ? "−" : "";
  return `${sign}${whole.replace(/\B(?=(\d{3})+(?!\d))/g, GROUP)}${frac !== undefined ? `.${frac}` : ""}`;
}

/** An exposure with its unit, e.g. "12 345.600 kg·day". */
export function kgDayText(value: number): string {
  return `${grouped(value, 3)} kg·day`;
}

/** A signal acceptance as a plain fraction to four significant digits, e.g. 0.82 → "0.82". */
export function acceptanceText(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(4))) : "—";
}
