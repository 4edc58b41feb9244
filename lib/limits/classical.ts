/**
 * Classical (Neyman) upper limit for a Poisson count with known background.
 */
import { logPoissonCdf } from "./poisson";
import { bisectRoot, expandBracket } from "./root";
import type { LimitResult } from "./types";
import { assertBackground, assertConfidenceLevel, assertObserved } from "./validate";

/**
 * Total mean s at which P(N ≤ n | s) = 1 − CL, i.e. s = ½ χ²⁻¹(CL; 2n + 2). Solved on the log CDF,
 * which falls monotonically from 0 at s = 0, so bisection cannot miss; working with ln(1 − CL) keeps
 * precision for CL close to 1.
 */
export function classicalTotalMean(n: number, cl: number): number {
  assertObserved(n);
  assertConfidenceLevel(cl);
  const target = Math.log1p(-cl);
  const f = (s: number) => logPoissonCdf(n, s) - target;
  const hi = expandBracket(f, 0, n + 2 + 3 * Math.sqrt(n + 1));
  return bisectRoot(f, 0, hi, 1e-13);
}

/**
 * Neyman upper limit μ_up = s − b. When that is ≤ 0 (fewer events than the background predicts) the
 * construction excludes every signal including none, so the result is marked "no-limit" with upper null.
 */
export function classical(n: number, b: number, cl: number): LimitResult {
  assertObserved(n);
  assertBackground(b);
  assertConfidenceLevel(cl);
  const base = { method: "classical" as const, observed: n, background: b, cl, lower: 0 };
  const muUp = classicalTotalMean(n, cl) - b;
  if (muUp > 0) return { ...base, kind: "upper-limit", upper: muUp };
  return {
    ...base,
    kind: "no-limit",
    upper: null,
    rawUpper: muUp,
    note:
      `classical upper limit comes out at ${muUp.toFixed(3)} events (≤ 0): ${n} observed is below what the ` +
      `background of ${b} predicts, so this is not a limit on the signal; quote the fc or bayes result instead`,
  };
}
