/**
 * Bayesian upper limit with a flat prior on μ ≥ 0 and known background (Helene, NIM 212 (1983) 319).
 */
import { logPoissonCdf } from "./poisson";
import { bisectRoot, expandBracket } from "./root";
import { classicalTotalMean } from "./classical";
import type { LimitResult } from "./types";
import { assertBackground, assertConfidenceLevel, assertObserved } from "./validate";

/**
 * Solves 1 − CL = P(N ≤ n | μ + b) / P(N ≤ n | b) for μ. The ratio falls from 1 at μ = 0, and at the
 * zero-background classical value s₀ it is at most 1 − CL because P(X + B ≤ n) ≤ P(X ≤ n)·P(B ≤ n)
 * for independent Poisson X, B; so [0, s₀] brackets the root (for n = 0 it is the root itself, and
 * rounding can leave f(s₀) a hair above 0, hence the widening).
 */
export function bayesUpper(n: number, b: number, cl: number): number {
  assertObserved(n);
  assertBackground(b);
  assertConfidenceLevel(cl);
  const target = Math.log1p(-cl);
  const lnDenominator = logPoissonCdf(n, b);
  const f = (mu: number) => logPoissonCdf(n, mu + b) - lnDenominator - target;
  const s0 = classicalTotalMean(n, cl);
  const hi = f(s0) < 0 ? s0 : expandBracket(f, 0, s0 * (1 + 1e-6) + 1e-9);
  return bisectRoot(f, 0, hi, 1e-12);
}

/** Flat-prior Bayesian upper limit as a LimitResult (lower is always 0). */
export function bayes(n: number, b: number, cl: number): LimitResult {
  const upper = bayesUpper(n, b, cl);
  return { method: "bayes", observed: n, background: b, cl, kind: "upper-limit", lower: 0, upper };
}
