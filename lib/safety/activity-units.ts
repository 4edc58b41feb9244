// Activity units and display. The curie is defined as exactly 3.7e10 Bq, so conversions are exact
// up to floating point; formatting picks a prefix so the mantissa reads naturally (1 to 999).

import { requireFinite, requireInteger, requireNonNegative, SafetyInputError } from "./errors";

/** Becquerels in one curie (exact, by definition). */
export const BQ_PER_CURIE = 3.7e10;

/** Converts Bq to Ci. */
export function bqToCurie(bq: number): number {
  return requireFinite(bq, "bq") / BQ_PER_CURIE;
}

/** Converts Ci to Bq. */
export function curieToBq(ci: number): number {
  return requireFinite(ci, "ci") * BQ_PER_CURIE;
}

/** Converts Bq to µCi (1 µCi = 37 kBq). */
export function bqToMicroCurie(bq: number): number {
  return (requireFinite(bq, "bq") / BQ_PER_CURIE) * 1e6;
}

/** Converts µCi to Bq (1 µCi = 37 kBq). */
export function microCurieToBq(microCurie: number): number {
  return (requireFinite(microCurie, "microCurie") * BQ_PER_CURIE) / 1e6;
}

function checkSigFigs(sigFigs: number): void {
  requireInteger(sigFigs, "sigFigs");
  if (sigFigs < 1 || sigFigs > 15) throw new SafetyInputError("OUT_OF_RANGE", "sigFigs", `must be 1 to 15, got ${sigFigs}`);
}

/** Formats `x` with `sigFigs` significant figures in plain (never exponent) notation, e.g. 37 → "37.0". */
export function formatSignificant(x: number, sigFigs = 3): string {
  requireFinite(x, "x");
  checkSigFigs(sigFigs);
  if (x === 0) return (0).toFixed(Math.max(0, sigFigs - 1));
  // Round first: 9.996 at 3 figures becomes 10.0, which changes how many decimals are needed.
  const rounded = Number(x.toPrecision(sigFigs));
  const magnitude = Math.floor(Math.log10(Math.abs(rounded)));
  // Very small or very large values (a short-lived gas weeks after its reference date) read better, and stay
  // within toFixed's 0–100 digit range, in exponent form.
  if (magnitude < -6 || magnitude >= 21) return rounded.toExponential(sigFigs - 1);
  return rounded.toFixed(Math.max(0, sigFigs - 1 - magnitude));
}

interface Prefix {
  factor: number;
  label: string;
}

// Largest first; the first prefix whose factor the value reaches is used.
const BQ_PREFIXES: readonly Prefix[] = [
  { factor: 1e9, label: "GBq" },
  { factor: 1e6, label: "MBq" },
  { factor: 1e3, label: "kBq" },
  { factor: 1, label: "Bq" },
];

const CI_PREFIXES: readonly Prefix[] = [
  { factor: 1, label: "Ci" },
  { factor: 1e-3, label: "mCi" },
  { factor: 1e-6, label: "µCi" },
  { factor: 1e-9, label: "nCi" },
];

function formatWithPrefix(value: number, sigFigs: number, prefixes: readonly Prefix[]): string {
  // Choose the prefix on the rounded value so 999.96 Bq shows as "1.00 kBq", not "1000 Bq".
  const rounded = value === 0 ? 0 : Number(value.toPrecision(sigFigs));
  const smallest = prefixes[prefixes.length - 1] as Prefix;
  const prefix = prefixes.find((p) => rounded >= p.factor) ?? smallest;
  return `${formatSignificant(rounded / prefix.factor, sigFigs)} ${prefix.label}`;
}

/** Formats an activity in Bq as Bq, kBq, MBq or GBq with `sigFigs` significant figures. */
export function formatBq(bq: number, sigFigs = 3): string {
  requireNonNegative(bq, "bq");
  checkSigFigs(sigFigs);
  return formatWithPrefix(bq, sigFigs, BQ_PREFIXES);
}

/** Formats an activity given in Bq as nCi, µCi, mCi or Ci with `sigFigs` significant figures. */
export function formatCurie(bq: number, sigFigs = 3): string {
  requireNonNegative(bq, "bq");
  checkSigFigs(sigFigs);
  return formatWithPrefix(bq / BQ_PER_CURIE, sigFigs, CI_PREFIXES);
}
