/**
 * Small, dependency-free root finders. Bisection is slow but cannot be fooled by the flat or
 * step-shaped functions the limit constructions produce.
 */

/** Root of a continuous f on [lo, hi] where f(lo) and f(hi) differ in sign, to absolute tolerance tol. */
export function bisectRoot(f: (x: number) => number, lo: number, hi: number, tol = 1e-12): number {
  let flo = f(lo);
  const fhi = f(hi);
  if (flo === 0) return lo;
  if (fhi === 0) return hi;
  if (Math.sign(flo) === Math.sign(fhi)) throw new Error(`bisectRoot: [${lo}, ${hi}] does not bracket a root`);
  for (let i = 0; i < 400 && hi - lo > tol * Math.max(1, Math.abs(lo)); i++) {
    const mid = 0.5 * (lo + hi);
    const fmid = f(mid);
    if (fmid === 0) return mid;
    if (Math.sign(fmid) === Math.sign(flo)) {
      lo = mid;
      flo = fmid;
    } else {
      hi = mid;
    }
  }
  return 0.5 * (lo + hi);
}

/** Doubles hi (from a positive start) until f(hi) differs in sign from f(lo); returns that hi. */
export function expandBracket(f: (x: number) => number, lo: number, hi: number): number {
  const slo = Math.sign(f(lo));
  let width = Math.max(hi - lo, 1e-3);
  for (let i = 0; i < 200; i++) {
    const x = lo + width;
    if (Math.sign(f(x)) !== slo) return x;
    width *= 2;
  }
  throw new Error("expandBracket: no sign change found");
}

/**
 * For a predicate that differs at lo and hi, narrows to the change point: returns [a, b] with
 * pred(a) === pred(lo), pred(b) !== pred(lo) and b − a ≤ tol.
 */
export function bisectBoundary(pred: (x: number) => boolean, lo: number, hi: number, tol: number): [number, number] {
  const atLo = pred(lo);
  for (let i = 0; i < 400 && hi - lo > tol; i++) {
    const mid = 0.5 * (lo + hi);
    if (pred(mid) === atLo) lo = mid;
    else hi = mid;
  }
  return [lo, hi];
}
