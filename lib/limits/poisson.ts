/**
 * Poisson building blocks in log space, so that large backgrounds do not underflow.
 *
 * The CDF is summed here rather than taken from @stdlib/math-base-special-gammainc (0.3.1): that
 * function's large-shape branch is off by about 1–2 % for shapes above ~950 near x ≈ shape
 * (e.g. Q(1001, 1001)), which would move a classical limit for n = 1000 by 0.2 events.
 */
import gammaln from "@stdlib/math-base-special-gammaln";

// ln k! for k = 0, 1, ...; grown on demand because the FC scan asks for the same k many times.
const lnFactorials: number[] = [0];

/** ln(k!) for a non-negative integer k (cached). */
export function lnFactorial(k: number): number {
  for (let j = lnFactorials.length; j <= k; j++) lnFactorials.push(gammaln(j + 1));
  return lnFactorials[k] ?? gammaln(k + 1);
}

/** ln P(N = k | mean s); s = 0 puts all probability on k = 0. */
export function logPoissonPmf(k: number, s: number): number {
  if (s === 0) return k === 0 ? 0 : -Infinity;
  return k * Math.log(s) - s - lnFactorial(k);
}

/** P(N = k | mean s). */
export function poissonPmf(k: number, s: number): number {
  return Math.exp(logPoissonPmf(k, s));
}

/**
 * ln P(N ≤ n | mean s), summed in log space relative to the largest term. Terms more than
 * 40 standard deviations (+50) from the peak are below e^-800 of it and are skipped, so the cost is
 * O(√s) whatever n is.
 */
export function logPoissonCdf(n: number, s: number): number {
  if (s === 0) return 0;
  const peak = Math.floor(s);
  const reach = 40 * Math.sqrt(s) + 50;
  const top = Math.min(n, peak);
  const from = Math.max(0, Math.floor(top - reach));
  const to = Math.min(n, Math.ceil(peak + reach));
  const ref = logPoissonPmf(top, s);
  let sum = 0;
  for (let k = from; k <= to; k++) sum += Math.exp(logPoissonPmf(k, s) - ref);
  return ref + Math.log(sum);
}
