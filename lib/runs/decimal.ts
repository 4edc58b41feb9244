/**
 * Exact decimals (masses in kg) as canonical strings: no binary floating point between the request and the
 * DECIMAL column, so 948.5 kg stays 948.5 kg.
 */
import { RunInputError } from "./errors";

const DECIMAL = /^(\d+)(?:\.(\d+))?$/;

/** Canonical form of a decimal string: no leading zeros, no trailing fractional zeros ("0950.500" → "950.5"). */
export function canonicalDecimal(text: string): string {
  const m = DECIMAL.exec(text.trim());
  if (!m) throw new RunInputError("decimal", `"${text}" is not a plain decimal number`);
  const whole = (m[1] ?? "0").replace(/^0+(?=\d)/, "");
  const frac = (m[2] ?? "").replace(/0+$/, "");
  return frac ? `${whole}.${frac}` : whole;
}

/**
 * Parse a positive mass in kg given as a number or a decimal string into canonical form; refuses more fractional
 * digits than the column keeps (scale) or more whole digits than it can hold, instead of rounding silently.
 */
export function parsePositiveDecimal(value: unknown, field: string, scale: number, wholeDigits: number): string {
  const text = typeof value === "number" && Number.isFinite(value) ? String(value) : typeof value === "string" ? value.trim() : null;
  if (text === null) throw new RunInputError(field, "must be a decimal number (e.g. 948.5)");
  const m = DECIMAL.exec(text);
  if (!m) throw new RunInputError(field, `must be a plain positive decimal number in kg (got "${text}")`);
  const canonical = canonicalDecimal(text);
  const [whole = "0", frac = ""] = canonical.split(".");
  if (frac.length > scale) throw new RunInputError(field, `has more than ${scale} decimal places (got ${canonical})`);
  if (whole.length > wholeDigits) throw new RunInputError(field, `is too large (at most ${wholeDigits} digits before the point)`);
  if (/^0(\.0*)?$/.test(canonical)) throw new RunInputError(field, "must be greater than 0 kg");
  return canonical;
}
