/**
 * The Feldman–Cousins confidence belt for a Poisson count n with known background b
 * (Phys. Rev. D 57, 3873 (1998)): the ordering ratio, the acceptance interval for one signal value μ,
 * and where two counts swap rank.
 */
import { poissonPmf } from "./poisson";

/**
 * ln R(k) = ln[ P(k | μ + b) / P(k | μ̂ + b) ] with μ̂ = max(0, k − b), the best physical signal for k.
 * The k! cancels: ln R = k ln(s / m) − s + m with s = μ + b and m = max(b, k).
 */
export function logOrderingRatio(k: number, mu: number, b: number): number {
  const s = mu + b;
  const m = Math.max(b, k);
  return (k === 0 ? 0 : k * Math.log(s / m)) - s + m;
}

/** Inclusive range of counts [low, high] accepted at one μ, and the probability it holds. */
export interface AcceptanceInterval {
  low: number;
  high: number;
  probability: number;
}

/**
 * Acceptance interval at signal μ: counts are taken in decreasing R until their probability reaches CL.
 * R is unimodal in k (ln R rises for k ≤ b, then has slope ln(s/k)), so instead of sorting all k the
 * interval starts at the peak and grows one count at a time towards the side with the larger R.
 * At μ = 0 the counts k ≤ b tie at R = 1; the peak is taken at the largest of them and ties go left,
 * which is the order the ranks have for μ just above 0.
 */
export function acceptanceInterval(mu: number, b: number, cl: number): AcceptanceInterval {
  const s = mu + b;
  const f = Math.floor(s);
  let low = logOrderingRatio(f + 1, mu, b) > logOrderingRatio(f, mu, b) ? f + 1 : f;
  let high = low;
  let probability = poissonPmf(low, s);
  let rLeft = low > 0 ? logOrderingRatio(low - 1, mu, b) : -Infinity;
  let rRight = logOrderingRatio(high + 1, mu, b);
  while (probability < cl) {
    if (rRight > rLeft) {
      const p = poissonPmf(high + 1, s);
      // Only reachable for a CL within rounding of 1: nothing left that could add probability.
      if (p === 0 && low === 0) break;
      high += 1;
      probability += p;
      rRight = logOrderingRatio(high + 1, mu, b);
    } else if (low - 1 <= b) {
      const run = takeFlatRun(low, rRight, mu, b, probability, cl);
      low = run.low;
      probability += run.probability;
      rLeft = low > 0 ? logOrderingRatio(low - 1, mu, b) : -Infinity;
    } else {
      low -= 1;
      probability += poissonPmf(low, s);
      rLeft = low > 0 ? logOrderingRatio(low - 1, mu, b) : -Infinity;
    }
  }
  return { low, high, probability };
}

/**
 * Takes, in one go, the counts below `low` that outrank the next count on the right. For k ≤ b,
 * ln R(k) = k ln(s/b) − μ, so they are exactly the k above (rRight + μ) / ln(s/b) (all of them at
 * μ = 0, where they tie at R = 1). With a large b and small μ there can be ~b of them, almost all of
 * negligible probability: their probabilities fall towards smaller k (ratio k/s < 1), so summing stops
 * once the terms no longer count, while the interval still extends over all of them.
 */
function takeFlatRun(
  low: number,
  rRight: number,
  mu: number,
  b: number,
  have: number,
  cl: number,
): { low: number; probability: number } {
  const s = mu + b;
  const slope = Math.log(s / b);
  let stop = slope > 0 ? Math.max(0, Math.floor((rRight + mu) / slope) + 1) : 0;
  // Guard the closed form against rounding at the boundary.
  while (stop > 0 && logOrderingRatio(stop - 1, mu, b) > rRight) stop -= 1;
  while (stop < low - 1 && !(logOrderingRatio(stop, mu, b) > rRight)) stop += 1;
  let probability = 0;
  for (let k = low - 1; k >= stop; k--) {
    const p = poissonPmf(k, s);
    probability += p;
    if (have + probability >= cl) return { low: k, probability };
    if (p < 1e-18 * (have + probability)) break;
  }
  return { low: Math.min(stop, low - 1), probability };
}

/** Whether count n lies in the acceptance interval at signal μ. */
export function isAccepted(n: number, mu: number, b: number, cl: number): boolean {
  const { low, high } = acceptanceInterval(mu, b, cl);
  return low <= n && n <= high;
}

/**
 * Signal μ at which count c (> n) overtakes n in rank, i.e. R(c) = R(n); for fixed b this has the
 * closed form ln(μ + b) = [c ln m_c − m_c − n ln m_n + m_n] / (c − n), m_k = max(b, k).
 * Above it c always ranks ahead of n, since d/dμ [ln R(c) − ln R(n)] = (c − n)/(μ + b) > 0.
 * The result is strictly decreasing in b; it is 0 once c ≤ b (then c outranks n for every μ > 0).
 */
export function rankSwapSignal(c: number, n: number, b: number): number {
  const mc = Math.max(b, c);
  const mn = Math.max(b, n);
  const numerator = c * Math.log(mc) - mc - (n === 0 ? 0 : n * Math.log(mn)) + mn;
  return Math.max(0, Math.exp(numerator / (c - n)) - b);
}
