/**
 * Confidence-level choices offered by the limits pages, and reading a typed percentage.
 */
import { LimitInputError } from "../limits";

/** The confidence levels offered in selectors, in the order shown (68.27 % is the one-sigma level). */
export const CL_CHOICES: readonly number[] = [0.9, 0.95, 0.6827, 0.99];

/** The default confidence level and method of the limits pages. */
export const DEFAULT_CL = 0.9;

/**
 * Reads a typed confidence level in percent ("90", "90 %", "68.27%", "99,5") as a fraction. Throws
 * LimitInputError("cl") unless it is a number strictly between 0 and 100.
 */
export function parseClPercent(text: string): number {
  const cleaned = text.trim().replace(/\s*%$/, "").replace(",", ".");
  const value = cleaned === "" ? NaN : Number(cleaned);
  if (!Number.isFinite(value) || value <= 0 || value >= 100) {
    throw new LimitInputError("cl", `type a percentage strictly between 0 and 100, e.g. 90 or 68.27 (got "${text}")`);
  }
  // Percent to fraction without binary noise: 68.27 / 100 is 0.6827000000000001 otherwise.
  return Number((value / 100).toPrecision(12));
}

/** Whether a confidence level is one of the offered choices (compared to 1e-9). */
export function isClChoice(cl: number): boolean {
  return CL_CHOICES.some((c) => Math.abs(c - cl) < 1e-9);
}
