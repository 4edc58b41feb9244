/**
 * What the limits pages and the period-limit API show for one period (or a combination of periods): the μ
 * interval from lib/limits and the rate interval μ / (acceptance × exposure). Server and client both call
 * this, so a number on the page and the same number from the API come from the same code.
 */
import { LimitInputError, computeLimit, rateUpper, type LimitField, type LimitMethod, type LimitResult } from "../limits";

/** The inputs of one period's limit; observed is null when not recorded, and always null while blind. */
export interface PeriodLimitInput {
  blind: boolean;
  observed: number | null;
  background: number | null;
  /** Signal acceptance (0–1] of the period. */
  acceptance: number;
  /** The period's exposure in kg·day, or null when the ledger could not compute it. */
  exposureKgDay: number | null;
}

/** Rate interval in both reporting units; lower is 0 for a one-sided limit. */
export interface RateInterval {
  lowerPerKgDay: number;
  upperPerKgDay: number;
  lowerPerTonneYear: number;
  upperPerTonneYear: number;
}

/** What to show for a period: blind, waiting for inputs, refused by the calculator, or computed. */
export type LimitView =
  | { state: "blind" }
  | { state: "awaiting"; missing: Array<"observed" | "background"> }
  | { state: "refused"; field: LimitField; reason: string }
  | {
      state: "computed";
      result: LimitResult;
      /** Null when there is no upper end (classical "no-limit") or no usable exposure; see rateNote. */
      rate: RateInterval | null;
      rateNote: string | null;
    };

/** The text shown when a blind period's count and limit are withheld. */
export const BLIND_TEXT = "Blind — count hidden until unblinding";

/**
 * Rate interval for a computed result over acceptance × exposure, or the plain-words reason there is none.
 * The acceptance is checked by lib/limits (it must be in (0, 1]); combined periods pass acceptance 1 with
 * Σ acceptance × exposure as the exposure.
 */
export function rateOf(
  result: LimitResult,
  acceptance: number,
  exposureKgDay: number | null,
): { rate: RateInterval | null; rateNote: string | null } {
  if (result.upper === null) return { rate: null, rateNote: null };
  if (exposureKgDay === null) return { rate: null, rateNote: "no rate: the exposure of this period cannot be computed (see the exposure page)" };
  if (exposureKgDay <= 0) return { rate: null, rateNote: "no rate yet: the period has no good live time, so no exposure" };
  if (!(acceptance > 0)) return { rate: null, rateNote: "no rate: the signal acceptance is 0 (set it on the period)" };
  try {
    const up = rateUpper(result.upper, acceptance, exposureKgDay);
    const low = rateUpper(result.lower, acceptance, exposureKgDay);
    return {
      rate: { lowerPerKgDay: low.perKgDay, upperPerKgDay: up.perKgDay, lowerPerTonneYear: low.perTonneYear, upperPerTonneYear: up.perTonneYear },
      rateNote: null,
    };
  } catch (err) {
    if (err instanceof LimitInputError) return { rate: null, rateNote: `no rate: ${err.field} ${err.reason}` };
    throw err;
  }
}

/** Runs the chosen construction on (n, b), turning the calculator's typed refusals into a "refused" view. */
export function limitFor(
  observed: number,
  background: number,
  method: LimitMethod,
  cl: number,
): { ok: true; result: LimitResult } | { ok: false; field: LimitField; reason: string } {
  try {
    return { ok: true, result: computeLimit(method, observed, background, cl) };
  } catch (err) {
    if (err instanceof LimitInputError) return { ok: false, field: err.field, reason: err.reason };
    throw err;
  }
}

/** The view of one period's limit with the given method and CL. A blind period never reaches the calculator. */
export function periodLimitView(input: PeriodLimitInput, method: LimitMethod, cl: number): LimitView {
  if (input.blind) return { state: "blind" };
  const missing: Array<"observed" | "background"> = [];
  if (input.observed === null) missing.push("observed");
  if (input.background === null) missing.push("background");
  if (input.observed === null || input.background === null) return { state: "awaiting", missing };
  const limit = limitFor(input.observed, input.background, method, cl);
  if (!limit.ok) return { state: "refused", field: limit.field, reason: limit.reason };
  return { state: "computed", result: limit.result, ...rateOf(limit.result, input.acceptance, input.exposureKgDay) };
}

/**
 * A period's stored counting as the pages may see it: the observed count is dropped while the period is
 * blind, so it never leaves the server (not even inside page data).
 */
export function visibleInput(p: {
  blind: boolean;
  observedCount: number | null;
  expectedBackground: number | null;
  signalAcceptance: number;
  exposureKgDay: number | null;
}): PeriodLimitInput {
  return {
    blind: p.blind,
    observed: p.blind ? null : p.observedCount,
    background: p.expectedBackground,
    acceptance: p.signalAcceptance,
    exposureKgDay: p.exposureKgDay,
  };
}
