/**
 * One entry point for all three constructions, and the μ_up-versus-background curve for the chart.
 */
import { bayes } from "./bayes";
import { classical } from "./classical";
import { fc } from "./fc";
import { LimitInputError } from "./errors";
import type { LimitMethod, LimitResult } from "./types";
import { assertBackground, assertConfidenceLevel, assertMethod, assertObserved } from "./validate";

const CALCULATORS: Record<LimitMethod, (n: number, b: number, cl: number) => LimitResult> = {
  classical,
  fc,
  bayes,
};

/** Computes a limit on the signal mean with the named method; throws LimitInputError on bad input. */
export function computeLimit(method: LimitMethod, n: number, b: number, cl: number): LimitResult {
  assertMethod(method);
  return CALCULATORS[method](n, b, cl);
}

/** One point of an upper-end-versus-background curve; upper is null where the method gives no limit. */
export interface UpperCurvePoint {
  background: number;
  upper: number | null;
}

/** Largest number of background values one curve request may ask for (keeps the chart endpoint cheap). */
export const MAX_CURVE_POINTS = 2000;

/** Upper end of the interval for fixed n and CL at each background in `backgrounds` (in the given order). */
export function upperCurve(method: LimitMethod, n: number, cl: number, backgrounds: readonly number[]): UpperCurvePoint[] {
  assertMethod(method);
  assertObserved(n);
  assertConfidenceLevel(cl);
  if (!Array.isArray(backgrounds) || backgrounds.length === 0) {
    throw new LimitInputError("backgrounds", "must be a non-empty list of backgrounds");
  }
  if (backgrounds.length > MAX_CURVE_POINTS) {
    throw new LimitInputError("backgrounds", `at most ${MAX_CURVE_POINTS} points (got ${backgrounds.length})`);
  }
  for (const b of backgrounds) assertBackground(b, "backgrounds");
  return backgrounds.map((b) => ({ background: b, upper: CALCULATORS[method](n, b, cl).upper }));
}

/** Evenly spaced backgrounds from `from` to `to` inclusive with the given step (a convenience for the chart). */
export function backgroundGrid(from: number, to: number, step: number): number[] {
  assertBackground(from, "backgrounds");
  assertBackground(to, "backgrounds");
  if (!(typeof step === "number" && Number.isFinite(step) && step > 0) || to < from) {
    throw new LimitInputError("backgrounds", `need from ≤ to and a step > 0 (got ${from}..${to} step ${step})`);
  }
  const count = Math.floor((to - from) / step + 1e-9) + 1;
  if (count > MAX_CURVE_POINTS) {
    throw new LimitInputError("backgrounds", `at most ${MAX_CURVE_POINTS} points (got ${count})`);
  }
  // Index-based so that 0.1-style steps do not accumulate rounding.
  return Array.from({ length: count }, (_, i) => Number((from + i * step).toPrecision(12)));
}
