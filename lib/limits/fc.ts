/**
 * Feldman–Cousins unified interval for a Poisson count n with known background b.
 */
import { isAccepted, logOrderingRatio, rankSwapSignal } from "./fc-belt";
import { bisectBoundary, bisectRoot, expandBracket } from "./root";
import type { LimitResult } from "./types";
import { MAX_FC_TOTAL, assertBackground, assertConfidenceLevel, assertObserved } from "./validate";
import { LimitInputError } from "./errors";

/** Edges of one FC interval; plainUpper is the upper end before the background-monotonicity rule. */
export interface FcEdges {
  lower: number;
  upper: number;
  plainUpper: number;
}

// Edges are bisected to this width in μ; quoted values are good to 1e-6 or better.
const EDGE_TOL = 1e-7;

/**
 * Signal range outside which n cannot be accepted, for this b or any larger one. With c the first
 * count past n (away from the peak) ranked below n, n is accepted only if P(N ≤ n) + P(N ≥ c) > 1 − CL;
 * both tails are bounded by Chernoff terms that are at most R(n), so R(n) > (1 − CL)/2 is necessary.
 * Above μ = n − b the largest R(n) over backgrounds ≥ b is the one at b itself.
 */
export function fcSignalWindow(n: number, b: number, cl: number): [number, number] {
  const lnThreshold = Math.log((1 - cl) / 2);
  const g = (mu: number) => logOrderingRatio(n, mu, b) - lnThreshold;
  const peak = Math.max(0, n - b); // R(n) = 1 here, its maximum
  const lo = g(0) > 0 ? 0 : bisectRoot(g, 0, peak, 1e-12);
  const hi = bisectRoot(g, peak, expandBracket(g, peak, peak + 1 + Math.sqrt(n + b)), 1e-12);
  return [Math.max(0, lo - 1e-9), hi + 1e-9];
}

/** The plain construction for one b: scan μ coarsely, then bisect the first and last accepted points. */
function plainEdges(n: number, b: number, cl: number, window: [number, number]): [number, number] {
  const [muMin, muMax] = window;
  // The published tables used a 0.005 step in μ; accepted stretches widen like √(n + b).
  const step = 0.005 * Math.max(1, Math.sqrt(n + b) / 2);
  const accepted = (mu: number) => isAccepted(n, mu, b, cl);
  let lower: number | null = null;
  let upper: number | null = null;
  let prevMu = muMin;
  let prevIn = accepted(muMin);
  if (prevIn) lower = muMin;
  for (let i = 1; ; i++) {
    const mu = Math.min(muMin + i * step, muMax);
    const inside = accepted(mu);
    if (inside && !prevIn && lower === null) lower = bisectBoundary(accepted, prevMu, mu, EDGE_TOL)[1];
    if (!inside && prevIn) upper = bisectBoundary(accepted, prevMu, mu, EDGE_TOL)[0];
    prevMu = mu;
    prevIn = inside;
    if (mu >= muMax) break;
  }
  // n is the most probable count at μ = max(0, n − b), so the scan always finds an accepted stretch.
  if (lower === null || upper === null) throw new Error(`fc: no accepted signal found for n=${n}, b=${b}`);
  return [lower, upper];
}

/**
 * Makes the upper end non-increasing in b, as in the published tables (FC section IV.B): the quoted
 * upper end for (n, b) is the supremum of the plain upper ends over backgrounds b' ≥ b.
 * Why this rule: for small n and b ≳ 2 the plain upper end drops and jumps back as b grows, because
 * the accepted signals for n pick up an island: just below the swap point τ_c(b') where count c
 * overtakes n, the counts outranking n are n+1 … c−1, and once their probability falls below CL
 * n is accepted right up to τ_c. Such islands are born as a single point and τ_c falls with b', so
 * their highest point is where they are born. Taking max over b' ≥ b with these births reproduces the
 * printed 90 % row for n = 0 (1.26 at b = 2 from the island born at b' ≈ 2.32, 1.08 at b = 3 from
 * b' ≈ 3.45, 1.01 at b = 4, 0.98 at b = 5) and the 95 % row; the plain upper ends there are 1.08,
 * 0.95, 0.85 and 0.77. Taking min over b' ≤ b instead would only lower values that are already too low.
 *
 * For each c, "n accepted just below τ_c(b')" is false and then true as b' grows from b (the
 * probability of n+1 … c−1 at the swap point is unimodal in the total mean, which grows with b'), so the
 * birth is found by bisection in b'. Births recur about once per unit of b' with falling heights; the
 * search covers b' ≤ b + 2 + √b, which holds at least the next two.
 */
function monotoneUpper(n: number, b: number, cl: number, plainUpper: number, muMax: number): number {
  const reach = b + 2 + Math.sqrt(b);
  let best = plainUpper;
  for (let c = Math.max(n, Math.floor(b)) + 1; c < Number.MAX_SAFE_INTEGER; c++) {
    if (rankSwapSignal(c, n, reach) > muMax) break; // every later c swaps above any acceptable μ
    const atB = rankSwapSignal(c, n, b);
    if (!(atB > best)) continue;
    const acceptedBelowSwap = (bp: number) => {
      const tau = rankSwapSignal(c, n, bp);
      return tau > 0 && isAccepted(n, tau * (1 - 1e-10) - 1e-12, bp, cl);
    };
    let birth: number;
    if (acceptedBelowSwap(b)) {
      birth = b;
    } else {
      // Past the background where τ_c falls to `best` this c cannot raise the result.
      const stop = rankSwapSignal(c, n, reach) >= best
        ? reach
        : bisectBoundary((bp) => rankSwapSignal(c, n, bp) > best, b, reach, 1e-9)[0];
      if (!acceptedBelowSwap(stop)) continue;
      birth = bisectBoundary(acceptedBelowSwap, b, stop, 1e-10)[1];
    }
    best = Math.max(best, rankSwapSignal(c, n, birth));
  }
  return best;
}

/** Lower and upper ends of the FC interval (upper made non-increasing in b), plus the plain upper end. */
export function fcEdges(n: number, b: number, cl: number): FcEdges {
  assertObserved(n);
  assertBackground(b);
  assertConfidenceLevel(cl);
  if (n + b > MAX_FC_TOTAL) {
    throw new LimitInputError("background", `Feldman–Cousins needs observed + background ≤ ${MAX_FC_TOTAL} (got ${n + b})`);
  }
  const window = fcSignalWindow(n, b, cl);
  const [lower, plainUpper] = plainEdges(n, b, cl, window);
  return { lower, upper: monotoneUpper(n, b, cl, plainUpper, window[1]), plainUpper };
}

/** Feldman–Cousins interval as a LimitResult: an upper limit when the lower end is 0, else two-sided. */
export function fc(n: number, b: number, cl: number): LimitResult {
  const { lower, upper } = fcEdges(n, b, cl);
  return {
    method: "fc",
    observed: n,
    background: b,
    cl,
    kind: lower > 0 ? "interval" : "upper-limit",
    lower,
    upper,
  };
}
