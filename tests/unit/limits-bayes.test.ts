import { describe, expect, it } from "vitest";
import { bayes } from "@/lib/limits";

/**
 * Reference by direct numerical integration: the unnormalised flat-prior posterior
 * (μ + b)^n e^{−(μ + b)} on μ ≥ 0 is integrated with the trapezoid rule on a fine grid, and the
 * CL quantile is read off by linear interpolation of the running integral.
 */
function integratedUpper(n: number, b: number, cl: number): number {
  const s0 = Math.max(n, b);
  const muMax = Math.max(n - b, 0) + 30 * Math.sqrt(s0 + 1) + 40;
  const steps = 400_000;
  const h = muMax / steps;
  // Logs relative to the posterior's maximum keep n = 100 from overflowing.
  const peak = Math.max(n, b);
  const lnPeak = n === 0 ? -peak : n * Math.log(peak) - peak;
  const density = (mu: number) => {
    const s = mu + b;
    return Math.exp((n === 0 ? 0 : n * Math.log(s)) - s - lnPeak);
  };
  const running = new Float64Array(steps + 1);
  let prev = density(0);
  for (let i = 1; i <= steps; i++) {
    const cur = density(i * h);
    running[i] = (running[i - 1] ?? 0) + 0.5 * h * (prev + cur);
    prev = cur;
  }
  const goal = cl * (running[steps] ?? NaN);
  let i = 1;
  while ((running[i] ?? Infinity) < goal) i++;
  const a = running[i - 1] ?? NaN;
  const c = running[i] ?? NaN;
  return (i - 1 + (goal - a) / (c - a)) * h;
}

describe("Bayesian upper limit, n = 0", () => {
  // With n = 0 the b-dependence cancels: 1 − CL = e^{−μ}, so μ_up = −ln(1 − CL) for every b (analytic).
  it.each([
    { label: "b=0 90%", b: 0, cl: 0.9, upper: 2.302585 },
    { label: "b=3 90%", b: 3, cl: 0.9, upper: 2.302585 },
    { label: "b=20 90%", b: 20, cl: 0.9, upper: 2.302585 },
    { label: "b=800 90% (P(N=0|b) underflows doubles)", b: 800, cl: 0.9, upper: 2.302585 },
    { label: "b=1.5 95%", b: 1.5, cl: 0.95, upper: 2.995732 },
    { label: "b=4 99.9%", b: 4, cl: 0.999, upper: 6.907755 },
  ])("$label → $upper", ({ b, cl, upper }) => {
    expect(bayes(0, b, cl).upper).toBeCloseTo(upper, 6);
  });
});

describe("Bayesian upper limit against numerical integration of the posterior", () => {
  it.each([
    { label: "n=1 b=0 90%", n: 1, b: 0, cl: 0.9 },
    { label: "n=3 b=1.2 90%", n: 3, b: 1.2, cl: 0.9 },
    { label: "n=5 b=2.5 95%", n: 5, b: 2.5, cl: 0.95 },
    { label: "n=2 b=15 90%", n: 2, b: 15, cl: 0.9 },
    { label: "n=10 b=4 68.27%", n: 10, b: 4, cl: 0.6827 },
    { label: "n=4 b=1 99.9%", n: 4, b: 1, cl: 0.999 },
    { label: "n=100 b=80 90%", n: 100, b: 80, cl: 0.9 },
  ])("$label", ({ n, b, cl }) => {
    const r = bayes(n, b, cl);
    expect(r.kind).toBe("upper-limit");
    expect(r.lower).toBe(0);
    expect(Math.abs((r.upper ?? NaN) - integratedUpper(n, b, cl))).toBeLessThan(1e-3);
  });
});
