/**
 * Input checks shared by every limit calculator. Each throws LimitInputError with the offending field.
 */
import { LimitInputError } from "./errors";
import type { LimitMethod } from "./types";

/** Largest observed count accepted: keeps every sum over counts bounded (FC acceptance, Bayes CDFs). */
export const MAX_OBSERVED = 100_000;

/**
 * Largest n + b the Feldman–Cousins construction accepts: its cost grows with the width of the
 * Poisson acceptance, about √(n + b) terms per signal value scanned.
 */
export const MAX_FC_TOTAL = 200_000;

/** The methods computeLimit understands, in the order the UI lists them. */
export const LIMIT_METHODS: readonly LimitMethod[] = ["fc", "classical", "bayes"];

function shown(value: unknown): string {
  return typeof value === "number" ? String(value) : JSON.stringify(value) ?? String(value);
}

/** Checks an observed count: a non-negative integer no larger than MAX_OBSERVED. */
export function assertObserved(n: unknown): asserts n is number {
  if (typeof n !== "number" || !Number.isInteger(n) || n < 0) {
    throw new LimitInputError("observed", `must be a non-negative integer (got ${shown(n)})`);
  }
  if (n > MAX_OBSERVED) {
    throw new LimitInputError("observed", `must be at most ${MAX_OBSERVED} (got ${n})`);
  }
}

/** Checks an expected background: a finite number ≥ 0 (`field` lets grid entries report as "backgrounds"). */
export function assertBackground(b: unknown, field: "background" | "backgrounds" = "background"): asserts b is number {
  if (typeof b !== "number" || !Number.isFinite(b) || b < 0) {
    throw new LimitInputError(field, `must be a finite number ≥ 0 (got ${shown(b)})`);
  }
}

/** Checks a confidence level: strictly between 0 and 1. */
export function assertConfidenceLevel(cl: unknown): asserts cl is number {
  if (typeof cl !== "number" || !Number.isFinite(cl) || cl <= 0 || cl >= 1) {
    throw new LimitInputError("cl", `must be a number strictly between 0 and 1 (got ${shown(cl)})`);
  }
}

/** Checks a method name against LIMIT_METHODS. */
export function assertMethod(method: unknown): asserts method is LimitMethod {
  if (typeof method !== "string" || !(LIMIT_METHODS as readonly string[]).includes(method)) {
    throw new LimitInputError("method", `must be one of ${LIMIT_METHODS.join(", ")} (got ${shown(method)})`);
  }
}

/** Checks a signal acceptance (efficiency): in (0, 1]. */
export function assertAcceptance(acceptance: unknown): asserts acceptance is number {
  if (typeof acceptance !== "number" || !Number.isFinite(acceptance) || acceptance <= 0 || acceptance > 1) {
    throw new LimitInputError("acceptance", `must be in (0, 1] (got ${shown(acceptance)})`);
  }
}

/** Checks an exposure in kg·day: finite and > 0. */
export function assertExposure(exposureKgDay: unknown): asserts exposureKgDay is number {
  if (typeof exposureKgDay !== "number" || !Number.isFinite(exposureKgDay) || exposureKgDay <= 0) {
    throw new LimitInputError("exposure", `must be a finite number of kg·day > 0 (got ${shown(exposureKgDay)})`);
  }
}
